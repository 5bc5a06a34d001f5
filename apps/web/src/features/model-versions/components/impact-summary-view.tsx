import type { ImpactPathway, ImpactSide, ModelVersionImpact, PercentileSet, SpreadChange } from "@plumeline/contracts";
import { Table, Td, Th } from "@/components/ui/table";
import { cx } from "@/components/ui/cx";
import { formatInteger, formatKelvin, formatProbability } from "@/lib/format";
import { exceedanceHalfWidth, shiftNoise, widestMedianHalfWidth } from "../lib/impact-precision";
import { MaterialityFirings } from "./materiality-firings";

const label = (side: ImpactSide) => `${side.version.name} v${side.version.versionNumber}`;
const signed = (v: number, digits = 2) => `${v > 0 ? "+" : v < 0 ? "−" : "±"}${Math.abs(v).toFixed(digits)}`;
const band = (set: PercentileSet | undefined) =>
  set ? `${formatKelvin(set.p50)} (${formatKelvin(set.p5)}–${formatKelvin(set.p95)})` : "–";

/**
 * A difference, highlighted when it is larger than the preview's Monte Carlo noise. A change
 * that rounds to zero at the shown precision is no change: it reads "±0.00" in grey, never a
 * red "+0.00" that a reviewer would take for a warming.
 */
function Shift({ value: raw, noise, unit, digits = 2 }: { value: number; noise: number | null; unit: string; digits?: number }) {
  const value = Number(raw.toFixed(digits)) === 0 ? 0 : raw;
  const beyond = value !== 0 && (noise === null || Math.abs(value) > noise);
  return (
    <span
      className={cx("num rounded px-1 whitespace-nowrap", beyond && value > 0 && "bg-danger-soft font-semibold text-danger", beyond && value < 0 && "bg-ok-soft font-semibold text-ok", !beyond && "text-muted")}
      title={noise === null ? undefined : beyond ? `Larger than the preview noise (±${noise.toFixed(digits)} ${unit})` : `Within the preview noise (±${noise.toFixed(digits)} ${unit})`}
    >
      {signed(value, digits)} {unit}
      {value === 0 ? <span className="sr-only"> (no change)</span> : !beyond && <span className="sr-only"> (within preview noise)</span>}
    </span>
  );
}

function HorizonTable({ impact, pathway }: { impact: ModelVersionImpact; pathway: ImpactPathway }) {
  const againstByYear = new Map(pathway.against.map((h) => [h.year, h]));
  return (
    <Table aria-label={`Warming at the horizons on ${pathway.pathway.name}`}>
      <caption className="mb-2 text-left text-sm text-muted">Warming at each horizon (K above the baseline): median (5–95 %)</caption>
      <thead>
        <tr>
          <Th>Year</Th>
          <Th numeric>{label(impact.against)}</Th>
          <Th numeric>{label(impact.version)}</Th>
          <Th numeric>Median shift</Th>
          <Th numeric>5–95 width change</Th>
        </tr>
      </thead>
      <tbody>
        {pathway.differences.map((d) => {
          const mine = pathway.version.find((h) => h.year === d.year);
          const noise = shiftNoise(pathway, d.year);
          return (
            <tr key={d.year}>
              <Td className="num">{d.year}</Td>
              <Td numeric className="whitespace-nowrap">{band(againstByYear.get(d.year)?.temperature)}</Td>
              <Td numeric className="whitespace-nowrap">{band(mine?.temperature)}</Td>
              <Td numeric>
                <Shift value={d.medianShift} noise={noise} unit="K" />
              </Td>
              <Td numeric>
                <Shift value={d.widthChange} noise={noise === null ? null : 2 * noise} unit="K" />
              </Td>
            </tr>
          );
        })}
      </tbody>
    </Table>
  );
}

function ExceedanceTable({ impact, pathway }: { impact: ModelVersionImpact; pathway: ImpactPathway }) {
  // Noise of a difference of two independent-looking proportions: √2 times one half-width (conservative; shared seed).
  const noise = exceedanceHalfWidth(impact.members) * Math.SQRT2;
  const againstByYear = new Map(pathway.against.map((h) => [h.year, h]));
  return (
    <Table aria-label={`Exceedance probabilities on ${pathway.pathway.name}`}>
      <caption className="mb-2 text-left text-sm text-muted">Probability that warming exceeds each threshold in the horizon year</caption>
      <thead>
        <tr>
          <Th>Year</Th>
          <Th numeric>Threshold</Th>
          <Th numeric>{label(impact.against)}</Th>
          <Th numeric>{label(impact.version)}</Th>
          <Th numeric>Change</Th>
        </tr>
      </thead>
      <tbody>
        {pathway.differences.flatMap((d) =>
          impact.thresholds.map((threshold) => {
            const key = String(threshold);
            const change = d.exceedance[key];
            return (
              <tr key={`${d.year}-${key}`}>
                <Td className="num">{d.year}</Td>
                <Td numeric>&gt; {threshold} K</Td>
                <Td numeric>{formatProbability(againstByYear.get(d.year)?.exceedance[key])}</Td>
                <Td numeric>{formatProbability(pathway.version.find((h) => h.year === d.year)?.exceedance[key])}</Td>
                <Td numeric>{change === undefined ? "–" : <Shift value={change * 100} noise={noise * 100} unit="pts" digits={1} />}</Td>
              </tr>
            );
          }),
        )}
      </tbody>
    </Table>
  );
}

function SensitivityTable({ impact }: { impact: ModelVersionImpact }) {
  const rows: Array<[string, "ecs" | "tcr", SpreadChange]> = [
    ["Equilibrium climate sensitivity (ECS)", "ecs", impact.differences.ecs],
    ["Transient climate response (TCR)", "tcr", impact.differences.tcr],
  ];
  return (
    <Table aria-label="Implied climate sensitivity">
      <caption className="mb-2 text-left text-sm text-muted">Implied sensitivities of the sampled members (K): median (5–95 %)</caption>
      <thead>
        <tr>
          <Th>Quantity</Th>
          <Th numeric>{label(impact.against)}</Th>
          <Th numeric>{label(impact.version)}</Th>
          <Th numeric>Median shift</Th>
          <Th numeric>5–95 width change</Th>
        </tr>
      </thead>
      <tbody>
        {rows.map(([name, key, change]) => (
          <tr key={key}>
            <Td>{name}</Td>
            <Td numeric className="whitespace-nowrap">{band(impact.against.implied[key])}</Td>
            <Td numeric className="whitespace-nowrap">{band(impact.version.implied[key])}</Td>
            <Td numeric>
              <Shift value={change.medianShift} noise={null} unit="K" />
            </Td>
            <Td numeric>
              <Shift value={change.widthChange} noise={null} unit="K" />
            </Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}

/**
 * Side-by-side key outputs of a version and the version it is compared against, from one
 * preview answer (plain data, no fetching): which materiality thresholds fired; per pathway the
 * horizon warming and exceedance probabilities, each with the change; implied ECS/TCR (the
 * same on every pathway); what was run; and how precise such a preview is.
 */
export function ImpactSummaryView({ impact, changeClass }: { impact: ModelVersionImpact; changeClass?: "major" | "minor" | null }) {
  const medianPrecision = widestMedianHalfWidth(impact);
  const names = impact.pathways.map((p) => p.pathway.name).join(", ");
  return (
    <div className="flex flex-col gap-5">
      <p className="text-sm">
        <span className="font-medium">{label(impact.version)}</span> against <span className="font-medium">{label(impact.against)}</span> on{" "}
        {impact.pathways.length === 1 ? "" : `${impact.pathways.length} pathways: `}
        <span className="font-medium">{names}</span> · {formatInteger(impact.members)} members each · seed “{impact.seed}” ·{" "}
        {impact.sampling === "latin-hypercube" ? "Latin hypercube" : "Monte Carlo"} sampling
      </p>
      <MaterialityFirings fired={impact.materiality.fired} policy={impact.materiality.policy} changeClass={changeClass} />
      {impact.pathways.map((pathway) => (
        <section key={pathway.pathway.id} aria-label={`On ${pathway.pathway.name}`} className="flex flex-col gap-3">
          <h3 className="text-sm font-semibold text-ink">On {pathway.pathway.name}</h3>
          <HorizonTable impact={impact} pathway={pathway} />
          <ExceedanceTable impact={impact} pathway={pathway} />
        </section>
      ))}
      <SensitivityTable impact={impact} />
      <p className="rounded-md border border-line bg-surface-2 px-3 py-2 text-xs text-muted" role="note">
        A small preview ensemble, not a run: {formatInteger(impact.members)} members per version, one fixed seed, not stored — indicative only; the run is the
        record. Medians are known to about ±
        {medianPrecision === null ? "–" : medianPrecision.toFixed(2)} K (95 % order-statistic interval, widest horizon) and exceedance probabilities to about ±
        {(exceedanceHalfWidth(impact.members) * 100).toFixed(1)} points (95 %, binomial, worst case). Shifts within that noise are greyed; red is warmer or wider,
        green cooler or narrower. Start a full run for numbers to rely on.
        {impact.cached ? " Answer reused from an identical earlier preview." : ` Computed in ${impact.seconds.toFixed(1)} s.`}
      </p>
    </div>
  );
}
