import type { RunResult } from "@plumeline/contracts";
import { FanChart, fanYDomain, type FanSeries } from "@/components/charts/fan-chart";
import { PercentileStrips, type PercentileStrip } from "@/components/charts/percentile-strips";
import { seriesColor } from "@/components/charts/palette";
import { compareAxis, compareYears } from "../lib/compare-baseline";
import { hasFanPercentiles, toFanSeries } from "../lib/result-adapters";
import { CompareHorizonTables } from "./compare-horizon-tables";

export interface CompareSide {
  /** The run's name: every row, chart and legend is labelled by it. */
  label: string;
  result: RunResult;
  pathwayId: string;
  /** From the run's manifest; unknown while it loads. */
  baseline?: [number, number];
}

/**
 * Two to four results on shared axes, the first as the reference: the horizon tables side by
 * side with each run's differences from the reference, one fan chart per run on the same
 * warming scale, all of them on one chart, and the shared horizons as percentile strips.
 */
export function CompareView({ sides }: { sides: CompareSide[] }) {
  const chosen = sides.map((s) => ({ ...s, pathway: s.result.pathways.find((p) => p.id === s.pathwayId) ?? s.result.pathways[0] }));
  if (chosen.some((s) => !s.pathway)) return <p className="text-sm text-muted">A chosen result holds no pathways.</p>;
  const ready = chosen as Array<(typeof chosen)[number] & { pathway: NonNullable<(typeof chosen)[number]["pathway"]> }>;
  if (!ready.every((s) => hasFanPercentiles(s.pathway.temperature)))
    return <p className="text-sm text-muted">Comparison needs the 5/17/50/83/95 percentiles in every result.</p>;
  const axis = compareAxis(...ready.map((s) => s.baseline));
  const [fromYear, toYear] = compareYears(ready.map((s) => ({ years: s.pathway.years, baseline: s.baseline })));
  const series: FanSeries[] = ready.map((s, i) => ({
    ...toFanSeries(s.pathway),
    id: `run-${i}`,
    name: `${s.label}: ${s.pathway.name}`,
    color: seriesColor(i),
  }));
  // On one chart the reference keeps filled bands; with one other run it is outlined (edges,
  // dashed median), with more only their medians are drawn, so the chart never becomes a tangle.
  const together = series.map((s, i) =>
    i === 0 ? s : { ...s, treatment: series.length === 2 ? ("outline" as const) : ("median" as const) },
  );
  const shared = fanYDomain(series, fromYear, toYear);
  const common = ready[0]!.pathway.horizons
    .map((h) => h.year)
    .filter((y) => ready.every((s) => s.pathway.horizons.some((h) => h.year === y)));
  const strips: PercentileStrip[] = common.flatMap((year) =>
    ready.map((s, i) => {
      const t = s.pathway.horizons.find((h) => h.year === year)!.temperature;
      return {
        id: `${year}-${i}`,
        label: `${year} · ${s.label}`,
        p5: t.p5!,
        p17: t.p17!,
        p50: t.p50!,
        p83: t.p83!,
        p95: t.p95!,
        color: seriesColor(i),
      };
    }),
  );
  return (
    <div className="flex flex-col gap-6">
      {axis.mismatch && (
        <p role="note" className="rounded-md border border-ember-400 bg-ember-50 px-3 py-2 text-sm text-ember-800">
          The runs measure warming from different baselines ({[...new Set(ready.map((s) => s.baseline!.join("–")))].join(" and ")}): equal
          heights on these charts are not equal warming. Compare runs made with the same baseline for figures to quote.
        </p>
      )}
      <CompareHorizonTables runs={ready.map((s) => ({ label: s.label, pathway: s.pathway }))} />
      <div className="grid gap-6 xl:grid-cols-2">
        {series.map((s) => (
          <FanChart
            key={s.id}
            title={s.name}
            series={[s]}
            yLabel={axis.label}
            unit="K"
            fromYear={fromYear}
            toYear={toYear}
            yDomain={shared}
            height={320}
          />
        ))}
      </div>
      <FanChart
        title="All on one chart"
        description={
          series.length === 2
            ? `${ready[0]!.label} (reference): filled bands, solid median. ${ready[1]!.label}: outlined bands, dashed median. Inner band 17–83 %, outer 5–95 % (dotted edge when outlined). Hover or use arrow keys to read a year.`
            : `${ready[0]!.label} (reference): filled bands, solid median; the other runs: their medians. Inner band 17–83 %, outer 5–95 %. Hover or use arrow keys to read a year.`
        }
        series={together}
        yLabel={axis.label}
        unit="K"
        fromYear={fromYear}
        toYear={toYear}
        yDomain={shared}
        height={340}
      />
      {strips.length > 0 && (
        <PercentileStrips
          title="Warming at the shared horizons"
          description={ready.map((s) => `${s.label}: ${s.pathway.name}`).join(" · ")}
          strips={strips}
          axisLabel={axis.label}
          series={ready.map((s, i) => ({ label: `${s.label}: ${s.pathway.name}`, color: seriesColor(i) }))}
        />
      )}
    </div>
  );
}
