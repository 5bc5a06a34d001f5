import { useMemo } from "react";
import { scaleLinear } from "d3";
import { AxisBottom, AxisLeft } from "./axes";
import { ChartFrame, DataTable } from "./chart-frame";
import { DEFAULT_MARGINS, innerSize } from "./margins";
import { useChartWidth } from "./use-chart-width";

/** First-crossing years of one threshold: percentile -> year (null = not crossed by the pathway's end). */
export interface CrossingDistribution {
  threshold: number;
  /** e.g. { p5: 2031, p17: 2036, p50: 2044, p83: 2061, p95: null } */
  percentiles: Record<string, number | null>;
  /** Share of members (0–1) that never cross within the pathway. */
  never: number;
}

export interface CrossingBin {
  from: number;
  to: number;
  /** Share of members (0–1) whose first crossing falls in [from, to]. */
  share: number;
}

/**
 * Histogram of first-crossing years rebuilt from the reported percentiles: the members
 * between two consecutive percentile years fill that interval evenly (so each bar's area
 * is its share). Intervals whose end is "never" belong to the never-crossing share.
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

export function CrossingHistogram({ title, crossing, unit = "K", height = 240 }: { title: string; crossing: CrossingDistribution; unit?: string; height?: number }) {
  const [ref, width] = useChartWidth<HTMLDivElement>();
  const m = { ...DEFAULT_MARGINS, right: 96 };
  const { innerWidth, innerHeight } = innerSize(width, height, m);
  const bins = crossingBins(crossing.percentiles);
  const years = Object.values(crossing.percentiles).filter((v): v is number => v !== null);
  const lo = years.length ? Math.min(...years) : 2000;
  const hi = years.length ? Math.max(...years) : 2100;
  const pad = Math.max(2, Math.round((hi - lo) * 0.08));
  const x = useMemo(() => scaleLinear().domain([lo - pad, hi + pad]).range([0, innerWidth]).nice(), [lo, hi, pad, innerWidth]);
  // Height = share per year, shown as % of members per year.
  const density = bins.map((b) => (b.share * 100) / Math.max(1, b.to - b.from));
  const y = useMemo(() => scaleLinear().domain([0, Math.max(0.5, ...density) * 1.1]).range([innerHeight, 0]).nice(), [density, innerHeight]);
  const neverBarH = Math.min(innerHeight, innerHeight * crossing.never);
  const p50 = crossing.percentiles.p50;

  return (
    <ChartFrame
      title={title}
      description={`First year the member's warming is above ${crossing.threshold} ${unit}. Bars spread the members between consecutive percentiles evenly over their years.`}
      table={
        <DataTable
          caption={title}
          columns={["Percentile", "First-crossing year"]}
          rows={[
            ...Object.entries(crossing.percentiles).map(([k, v]) => [`${k.slice(1)} %`, v === null ? "not crossed" : String(v)]),
            ["never crosses (share)", `${(crossing.never * 100).toFixed(1)} %`],
          ]}
        />
      }
    >
      <div ref={ref} className="w-full">
        <svg width={width} height={height} role="img" aria-label={`${title}: share of members per year against first-crossing year`}>
          <g transform={`translate(${m.left},${m.top})`}>
            <AxisLeft scale={y} width={innerWidth} label="Members (% per year)" ticks={4} />
            <AxisBottom scale={x} height={innerHeight} width={innerWidth} label="First-crossing year" ticks={Math.max(2, Math.floor(innerWidth / 80))} />
            {bins.map((b, i) => (
              <rect
                key={i}
                data-bin={`${b.from}-${b.to}`}
                x={x(b.from)}
                width={Math.max(1, x(b.to) - x(b.from) - 1)}
                y={y(density[i]!)}
                height={innerHeight - y(density[i]!)}
                fill="var(--pl-ember-400)"
                fillOpacity={i === 0 || i === bins.length - 1 ? 0.45 : 0.85}
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
            <g transform={`translate(${innerWidth + 24},0)`} data-testid="never-bar">
              <rect y={0} width={36} height={innerHeight} fill="var(--pl-surface-2)" />
              <rect y={innerHeight - neverBarH} width={36} height={neverBarH} fill="var(--pl-accent)" fillOpacity={0.55} />
              <text x={18} y={innerHeight + 17} textAnchor="middle" className="fill-muted text-[11px]">
                never
              </text>
              <text x={18} y={Math.max(12, innerHeight - neverBarH - 5)} textAnchor="middle" className="fill-ink text-[11px] num">
                {(crossing.never * 100).toFixed(0)}%
              </text>
            </g>
          </g>
        </svg>
      </div>
    </ChartFrame>
  );
}
