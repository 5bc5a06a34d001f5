import { CLIMATE_INPUTS, CLIMATE_INPUT_UNITS, FORCING_AGENTS, RANGE_SHAPE_LABELS, type Distribution, type ModelSpec } from "@plumeline/contracts";
import { Table, Td, Th } from "@/components/ui/table";
import { formatFixed } from "@/lib/format";
import { inputLabel, SCALE_FACTOR_UNIT } from "@/lib/input-labels";
import { percentileValues } from "../lib/preview-percentiles";
import { DISTRIBUTION_TYPE_LABELS } from "../lib/distribution-fields";

/** Parameters as "key value" pairs; a range's shape by its full name (a split, two-piece law). */
function describeParameters(d: Distribution): string {
  const { type: _type, ...params } = d;
  return Object.entries(params)
    .map(([k, v]) => (d.type === "range" && k === "shape" ? `shape ${RANGE_SHAPE_LABELS[d.shape]}` : `${k} ${v}`))
    .join(", ");
}

/**
 * Read-only summary of every input: its distribution and its 5/17/50/83/95 values.
 * Names and distributions wrap (no minimum widths) so all five percentile columns fit in
 * the review page's main column at 1280–1440 px without a horizontal scroll.
 */
export function AssumptionsTable({ model }: { model: ModelSpec }) {
  const rows: Array<{ key: string; unit: string; d: Distribution }> = [
    ...CLIMATE_INPUTS.map((k) => ({ key: k, unit: CLIMATE_INPUT_UNITS[k], d: model.climate[k] })),
    ...FORCING_AGENTS.filter((a) => model.agents[a]).map((a) => ({ key: a, unit: SCALE_FACTOR_UNIT, d: model.agents[a]!.scale })),
  ];
  return (
    <Table>
      <thead>
        <tr>
          <Th>Input</Th>
          <Th>Distribution</Th>
          {[5, 17, 50, 83, 95].map((p) => (
            <Th key={p} numeric className="whitespace-nowrap">
              {p} %
            </Th>
          ))}
        </tr>
      </thead>
      <tbody>
        {rows.map(({ key, unit, d }) => (
          <tr key={key}>
            <Td>
              {inputLabel(key)} <span className="whitespace-nowrap text-xs text-muted">({unit})</span>
            </Td>
            <Td className="text-xs text-muted [overflow-wrap:anywhere]">
              <span className="text-ink">{DISTRIBUTION_TYPE_LABELS[d.type]}</span>
              <br />
              {describeParameters(d)}
            </Td>
            {percentileValues(d).map((v) => (
              <Td key={v.p} numeric className={v.p === 50 ? "whitespace-nowrap font-semibold" : "whitespace-nowrap"}>
                {formatFixed(v.value, Math.abs(v.value) >= 100 ? 1 : 3)}
              </Td>
            ))}
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
