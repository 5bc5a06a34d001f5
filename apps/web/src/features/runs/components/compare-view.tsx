import type { RunResult } from "@plumeline/contracts";
import { FanChart, fanYDomain } from "@/components/charts/fan-chart";
import { PercentileStrips, type PercentileStrip } from "@/components/charts/percentile-strips";
import { seriesColor } from "@/components/charts/palette";
import { compareAxis } from "../lib/compare-baseline";
import { hasFanPercentiles, toFanSeries } from "../lib/result-adapters";

export interface CompareSide {
  label: string;
  result: RunResult;
  pathwayId: string;
  /** From the run's manifest; unknown while it loads. */
  baseline?: [number, number];
}

/**
 * Two results side by side on shared axes: the same warming scale on both fan charts, and
 * the horizons they have in common as percentile strips on one axis.
 */
export function CompareView({ a, b, fromYear = 1850 }: { a: CompareSide; b: CompareSide; fromYear?: number }) {
  const pa = a.result.pathways.find((p) => p.id === a.pathwayId) ?? a.result.pathways[0];
  const pb = b.result.pathways.find((p) => p.id === b.pathwayId) ?? b.result.pathways[0];
  if (!pa || !pb) return null;
  if (!hasFanPercentiles(pa.temperature) || !hasFanPercentiles(pb.temperature))
    return <p className="text-sm text-muted">Comparison needs the 5/17/50/83/95 percentiles in both results.</p>;
  const axis = compareAxis(a.baseline, b.baseline);
  const sa = { ...toFanSeries(pa), id: "a", name: `${a.label}: ${pa.name}`, color: seriesColor(0) };
  const sb = { ...toFanSeries(pb), id: "b", name: `${b.label}: ${pb.name}`, color: seriesColor(1) };
  // On one chart the right side is drawn as outlines with a dashed median, so the two
  // colours never blend and neither median hides the other.
  const sbOutlined = { ...sb, treatment: "outline" as const };
  const shared = fanYDomain([sa, sb], fromYear);
  const toYear = Math.min(sa.years.at(-1)!, sb.years.at(-1)!);
  const common = pa.horizons.map((h) => h.year).filter((y) => pb.horizons.some((h) => h.year === y));
  const strips: PercentileStrip[] = common.flatMap((year) =>
    [
      { side: "a", label: "left", p: pa, color: seriesColor(0) },
      { side: "b", label: "right", p: pb, color: seriesColor(1) },
    ].map(({ side, label, p, color }) => {
      const t = p.horizons.find((h) => h.year === year)!.temperature;
      return { id: `${year}-${side}`, label: `${year} · ${label}`, p5: t.p5!, p17: t.p17!, p50: t.p50!, p83: t.p83!, p95: t.p95!, color };
    }),
  );
  return (
    <div className="flex flex-col gap-6">
      {axis.mismatch && (
        <p role="note" className="rounded-md border border-ember-400 bg-ember-50 px-3 py-2 text-sm text-ember-800">
          The two runs measure warming from different baselines ({a.baseline!.join("–")} and {b.baseline!.join("–")}): equal heights on these charts are not equal
          warming. Compare runs made with the same baseline for figures to quote.
        </p>
      )}
      <div className="grid gap-6 xl:grid-cols-2">
        {[sa, sb].map((s) => (
          <FanChart key={s.id} title={s.name} series={[s]} yLabel={axis.label} unit="K" fromYear={fromYear} toYear={toYear} yDomain={shared} height={320} />
        ))}
      </div>
      <FanChart
        title="Both on one chart"
        description="Left: filled bands, solid median. Right: outlined bands, dashed median. Inner band 17–83 %, outer 5–95 % (dotted edge when outlined). Hover or use arrow keys to read a year."
        series={[sa, sbOutlined]}
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
          description={`Left: ${sa.name}. Right: ${sb.name}.`}
          strips={strips}
          axisLabel={axis.label}
        />
      )}
    </div>
  );
}
