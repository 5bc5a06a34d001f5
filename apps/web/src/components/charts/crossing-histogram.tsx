import { useMemo } from "react";
import { scaleLinear } from "d3";
import { formatProbability, formatProbabilityTenths } from "@/lib/format";
import { AxisBottom, AxisLeft } from "./axes";
import { ChartFrame, DataTable } from "./chart-frame";
import { DEFAULT_MARGINS, innerSize } from "./margins";
import { useChartWidth } from "./use-chart-width";

export interface CrossingBin {
  from: number;
  to: number;
  /** Share of members (0–1) whose first crossing falls in [from, to). */
  share: number;
}

/** First-crossing years of one threshold, as the histogram draws them. */
export interface CrossingDistribution {
  threshold: number;
  /** e.g. { p5: 2031, p17: 2036, p50: 2044, p83: 2061, p95: null } (null = not crossed by the end). */
  percentiles: Record<string, number | null>;
  /** Share of members (0–1) that never cross within the pathway. */
  never: number;
  /** Last year of the pathway: "never" means "not by this year". */
  lastYear?: number;
  /** The histogram's bars: one per year when the engine reports per-year shares, otherwise spread between percentiles. */
  bins: CrossingBin[];
  /** Where the bars come from, said under the chart. */
  binSource: "per-year" | "percentiles";
}

/**
 * Histogram of first-crossing years rebuilt from the reported percentiles: the members
 * between two consecutive percentile years fill that interval evenly (so each bar's area
 * is its share). Intervals whose end is "never" belong to the never-crossing share.
 * The fallback when the result has no per-year first-crossing shares.
 */
export function crossingBins(percentiles: Record<string, number | null>): CrossingBin[] {
  const points = Object.entries(percentiles)
    .map(([k, v]) => ({ p: Number(k.slice(1)) / 100, year: v }))
    .filter((e) => Number.isFinite(e.p))
    .sort((a, b) => a.p - b.p);
  const bins: CrossingBin[] = [];
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1]!;
    const b = points[i]!;
    if (a.year === null || b.year === null) continue;
    bins.push({ from: a.year, to: b.year, share: b.p - a.p });
  }
  return bins;
}

/** One bar per year from per-year first-crossing shares (aligned with `years`); years nobody crosses in are left out. */
export function crossingBinsPerYear(years: number[], shares: number[]): CrossingBin[] {
  return years.flatMap((year, i) => (shares[i] ? [{ from: year, to: year + 1, share: shares[i] }] : []));
}

/** Whole percents, tenths below 1 % ("< 0.1 %" for a vanishing share, never scientific notation). */
const percent = (share: number) => (share > 0 && share < 0.01 ? formatProbabilityTenths(share) : formatProbability(share));

/**
 * First-crossing years as a histogram (members in % per year), and beside it, apart and on
 * its own 0–100 % scale, the share of members that never cross: a share of all members is
 * not a rate per year, so it never shares the histogram's axis.
 */
export function CrossingHistogram({
  title,
  crossing,
  unit = "K",
  height = 240,
}: {
  title: string;
  crossing: CrossingDistribution;
  unit?: string;
  height?: number;
}) {
  const [ref, width] = useChartWidth<HTMLDivElement>();
  const m = { ...DEFAULT_MARGINS, right: 20 };
  const { innerWidth, innerHeight } = innerSize(width, height, m);
  const { bins } = crossing;
  const years = [...bins.flatMap((b) => [b.from, b.to]), ...Object.values(crossing.percentiles).filter((v): v is number => v !== null)];
  const lo = years.length ? Math.min(...years) : 2000;
  const hi = years.length ? Math.max(...years) : 2100;
  const pad = Math.max(2, Math.round((hi - lo) * 0.08));
  const x = useMemo(
    () =>
      scaleLinear()
        .domain([lo - pad, hi + pad])
        .range([0, innerWidth])
        .nice(),
    [lo, hi, pad, innerWidth],
  );
  // Height = share per year, shown as % of members per year.
  const density = bins.map((b) => (b.share * 100) / Math.max(1, b.to - b.from));
  const y = useMemo(
    () =>
      scaleLinear()
        .domain([0, Math.max(0.5, ...density) * 1.1])
        .range([innerHeight, 0])
        .nice(),
    [density, innerHeight],
  );
  const p50 = crossing.percentiles.p50;
  const by = crossing.lastYear ? ` by ${crossing.lastYear}` : "";
  const spread =
    crossing.binSource === "per-year"
      ? "One bar per year."
      : "Bars spread the members between consecutive percentiles evenly over their years.";

  return (
    <ChartFrame
      title={title}
      units="members (% per year); first-crossing year"
      legend={[
        { label: `First-crossing years (members in % per year)`, color: "var(--pl-ember-400)", kind: "swatch" },
        ...(p50 !== null && p50 !== undefined
          ? [{ label: `Median first-crossing year: ${p50}`, color: "var(--pl-ink)", dash: "3 3" }]
          : []),
        { label: `Never cross${by}: ${percent(crossing.never)} of all members`, color: "var(--pl-accent)", kind: "swatch" as const },
      ]}
      description={`First year the member's warming is above ${crossing.threshold} ${unit}. ${spread}`}
      table={
        <DataTable
          caption={title}
          columns={["Percentile", "First-crossing year"]}
          rows={[
            ...Object.entries(crossing.percentiles).map(([k, v]) => [`${k.slice(1)} %`, v === null ? "not crossed" : String(v)]),
            [`never crosses${by} (share of members)`, formatProbabilityTenths(crossing.never)],
          ]}
        />
      }
    >
      <div className="flex flex-wrap items-stretch gap-4 sm:flex-nowrap">
        <div ref={ref} className="min-w-0 flex-1">
          <svg width={width} height={height} role="img" aria-label={`${title}: members in % per year against first-crossing year`}>
            <g transform={`translate(${m.left},${m.top})`}>
              <AxisLeft scale={y} width={innerWidth} label="Members (% per year)" ticks={4} />
              <AxisBottom
                scale={x}
                height={innerHeight}
                width={innerWidth}
                label="First-crossing year"
                ticks={Math.max(2, Math.floor(innerWidth / 80))}
              />
              {bins.map((b, i) => (
                <rect
                  key={i}
                  data-bin={`${b.from}-${b.to}`}
                  x={x(b.from)}
                  width={Math.max(1, x(b.to) - x(b.from) - (crossing.binSource === "per-year" ? 0 : 1))}
                  y={y(density[i]!)}
                  height={innerHeight - y(density[i]!)}
                  fill="var(--pl-ember-400)"
                  fillOpacity={crossing.binSource === "percentiles" && (i === 0 || i === bins.length - 1) ? 0.45 : 0.85}
                />
              ))}
              {p50 !== null && p50 !== undefined && (
                <g>
                  <line x1={x(p50)} x2={x(p50)} y2={innerHeight} stroke="var(--pl-ink)" strokeDasharray="3 3" />
                  <text x={x(p50) + 4} y={10} className="fill-ink text-[11px] num">
                    median {p50}
                  </text>
                </g>
              )}
            </g>
          </svg>
        </div>
        <NeverShare share={crossing.never} by={by} />
      </div>
    </ChartFrame>
  );
}

/** The never-crossing share as a stat with its own 0–100 % gauge, set apart from the histogram. */
function NeverShare({ share, by }: { share: number; by: string }) {
  const clamped = Math.min(1, Math.max(0, share));
  return (
    <div data-testid="never-share" className="flex w-32 shrink-0 flex-col justify-center gap-1 border-l border-line pl-4">
      <p className="text-xs text-muted">Never cross{by}</p>
      <p className="num text-2xl font-semibold text-ink">{percent(share)}</p>
      <p className="text-xs text-muted">of all members</p>
      <div
        role="meter"
        aria-label={`Share of members that never cross${by}`}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={Math.round(clamped * 1000) / 10}
        className="mt-1 h-2 w-full overflow-hidden rounded-full bg-surface-2"
      >
        <div className="h-full rounded-full bg-accent/60" style={{ width: `${clamped * 100}%` }} />
      </div>
      <p className="num flex justify-between text-[10px] text-faint">
        <span>0</span>
        <span>100 %</span>
      </p>
    </div>
  );
}
