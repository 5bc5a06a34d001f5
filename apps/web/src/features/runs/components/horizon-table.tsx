import type { PathwayResult } from "@plumeline/contracts";
import { Table, Td, Th } from "@/components/ui/table";
import { PercentileNote } from "@/components/ui/percentile-note";
import { formatProbability, percentileHeading } from "@/lib/format";
import { percentileKeys } from "../lib/result-adapters";

/**
 * Warming percentiles at each horizon, with the Monte Carlo precision of each percentile
 * (distribution-free 95 % order-statistic interval) under the value, then exceedance
 * probabilities and the committed-warming median.
 */
export function HorizonTable({ pathway, unit = "K" }: { pathway: PathwayResult; unit?: string }) {
  const first = pathway.horizons[0];
  if (!first) return <p className="text-sm text-muted">This run has no horizons.</p>;
  const keys = percentileKeys(first.temperature);
  const thresholds = Object.keys(first.exceedance).sort((a, b) => Number(a) - Number(b));
  return (
    <>
      <Table>
        <caption className="sr-only">Warming percentiles at the horizons for {pathway.name}</caption>
        <thead>
          <tr>
            <Th>Horizon</Th>
            {keys.map((k) => (
              <Th key={k} numeric>
                {percentileHeading(k)} ({unit})
              </Th>
            ))}
            {thresholds.map((t) => (
              <Th key={t} numeric>
                Chance &gt; {t}&nbsp;{unit}
              </Th>
            ))}
            <Th numeric>Committed, median ({unit})</Th>
          </tr>
        </thead>
        <tbody>
          {pathway.horizons.map((h) => (
            <tr key={h.year}>
              <Th scope="row" className="text-sm normal-case tracking-normal text-ink">
                {h.year}
              </Th>
              {keys.map((k) => {
                const ci = h.precision[k];
                return (
                  <Td key={k} numeric className={k === "p50" ? "font-semibold text-ink" : undefined}>
                    {h.temperature[k]?.toFixed(2) ?? "–"}
                    {ci && (
                      <span className="block text-[10px] font-normal text-faint" title="95 % Monte Carlo interval of this percentile (order statistics)">
                        ±{(((ci[1] - ci[0]) / 2) as number).toFixed(2)}
                      </span>
                    )}
                  </Td>
                );
              })}
              {thresholds.map((t) => (
                <Td key={t} numeric>
                  {formatProbability(h.exceedance[t])}
                </Td>
              ))}
              <Td numeric>{h.committed.p50?.toFixed(2) ?? "–"}</Td>
            </tr>
          ))}
        </tbody>
      </Table>
      <PercentileNote>
        Chance &gt; T: share of members warmer than T in that year. Committed: further warming (median) if forcing stayed at that
        year's level — the equilibrium warming F/λ minus the warming since the pathway start (both measured from the pathway's first year).
      </PercentileNote>
    </>
  );
}
