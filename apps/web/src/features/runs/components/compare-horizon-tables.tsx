import type { PathwayResult } from "@plumeline/contracts";
import { Table, Td, Th } from "@/components/ui/table";
import { formatProbability } from "@/lib/format";
import { compareHorizons, formatSigned } from "../lib/compare-table";

/**
 * One table per shared horizon, one row per run (by name), the first run as the reference:
 * median and 5–95 width in K and the chance of exceeding each threshold, each with its
 * difference from the reference (K, or percentage points for chances).
 */
export function CompareHorizonTables({ runs }: { runs: Array<{ label: string; pathway: PathwayResult }> }) {
  const horizons = compareHorizons(runs);
  if (horizons.length === 0)
    return <p className="text-sm text-muted">The runs share no horizon year, so there is no table to set side by side.</p>;
  return (
    <section aria-label="Horizons compared" className="flex flex-col gap-4">
      <p className="text-xs text-muted">
        Differences are against the reference run, {runs[0]!.label} (first row): median and 5–95 width in K, chances in percentage points
        (pp). Differences smaller than the Monte Carlo precision of each run (see each run's horizon table) are noise.
      </p>
      {horizons.map((h) => (
        <Table key={h.year}>
          <caption className="caption-top pb-1 text-left text-sm font-semibold text-ink">Warming in {h.year}</caption>
          <thead>
            <tr>
              <Th>Run</Th>
              <Th>Pathway</Th>
              <Th numeric>Median (K)</Th>
              <Th numeric>Δ median</Th>
              <Th numeric>5–95 width (K)</Th>
              <Th numeric>Δ width</Th>
              {h.thresholds.map((t) => (
                <Th key={t} numeric>
                  Chance &gt; {t}&nbsp;K
                </Th>
              ))}
              {h.thresholds.map((t) => (
                <Th key={`d${t}`} numeric>
                  Δ chance &gt; {t}&nbsp;K
                </Th>
              ))}
            </tr>
          </thead>
          <tbody>
            {h.rows.map((r) => (
              <tr key={r.runLabel + r.pathwayName}>
                <th scope="row" className="border-b border-line px-3 py-2 text-left text-sm font-medium text-ink">
                  {r.runLabel}
                  {r.reference && " "}
                  {r.reference && <span className="ml-1 text-xs font-normal text-muted">(reference)</span>}
                </th>
                <Td>{r.pathwayName}</Td>
                <Td numeric className="font-semibold text-ink">
                  {r.median.toFixed(2)}
                </Td>
                <Td numeric>{r.medianDiff === null ? "–" : formatSigned(r.medianDiff, 2)}</Td>
                <Td numeric>{r.width.toFixed(2)}</Td>
                <Td numeric>{r.widthDiff === null ? "–" : formatSigned(r.widthDiff, 2)}</Td>
                {h.thresholds.map((t) => (
                  <Td key={t} numeric>
                    {formatProbability(r.exceedance[t])}
                  </Td>
                ))}
                {h.thresholds.map((t) => (
                  <Td key={`d${t}`} numeric>
                    {r.exceedanceDiffPp === null ? "–" : formatSigned(r.exceedanceDiffPp[t]!, 1, "pp")}
                  </Td>
                ))}
              </tr>
            ))}
          </tbody>
        </Table>
      ))}
    </section>
  );
}
