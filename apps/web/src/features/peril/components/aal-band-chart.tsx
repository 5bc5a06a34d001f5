import { useMemo } from "react";
import { max, scaleBand, scaleLinear } from "d3";
import { AxisLeft } from "@/components/charts/axes";
import { ChartFrame, DataTable } from "@/components/charts/chart-frame";
import { DEFAULT_MARGINS, innerSize } from "@/components/charts/margins";
import { seriesColor } from "@/components/charts/palette";
import { useChartWidth } from "@/components/charts/use-chart-width";
import { formatInteger } from "@/lib/format";

/** One horizon's projected loss: its percentiles ("p5" … "p95") and mean. */
export interface LossAtHorizon {
  year: number;
  summary: Record<string, number>;
}

const compact = new Intl.NumberFormat("en-GB", { notation: "compact", maximumFractionDigits: 1 });

/**
 * Projected average annual loss by horizon: for each horizon a thin 5–95 % bar, a wider
 * 17–83 % bar and a median tick, with the baseline AAL (today's view) as a dashed line, so the
 * change and its uncertainty read at a glance. Plain data in, nothing fetched.
 */
export function AalBandChart({
  title,
  currency,
  baselineAal,
  horizons,
  height = 280,
}: {
  title: string;
  currency: string;
  /** Today's AAL from the portfolio, if known (drawn as the reference line). */
  baselineAal?: number | null;
  horizons: LossAtHorizon[];
  height?: number;
}) {
  const [ref, width] = useChartWidth<HTMLDivElement>();
  const m = { ...DEFAULT_MARGINS, left: 64 };
  const { innerWidth, innerHeight } = innerSize(width, height, m);
  const x = useMemo(
    () => scaleBand<string>().domain(horizons.map((h) => String(h.year))).range([0, innerWidth]).padding(0.35),
    [horizons, innerWidth],
  );
  const top = Math.max(max(horizons, (h) => h.summary.p95 ?? h.summary.p50 ?? 0) ?? 0, baselineAal ?? 0);
  const y = useMemo(() => scaleLinear().domain([0, top * 1.08 || 1]).range([innerHeight, 0]).nice(), [top, innerHeight]);
  const color = seriesColor(0);
  const keys = ["p5", "p17", "p50", "p83", "p95", "mean"];
  const table = (
    <DataTable
      caption={title}
      columns={["Horizon", ...keys.map((k) => (k === "mean" ? `mean (${currency})` : `${k.slice(1)} % (${currency})`))]}
      rows={horizons.map((h) => [h.year, ...keys.map((k) => formatInteger(h.summary[k]))])}
    />
  );
  return (
    <ChartFrame title={title} description="Median tick, 17–83 % (wide) and 5–95 % (thin) bars at each horizon; dashed line: today's AAL." table={table}>
      <div ref={ref} className="w-full">
        <svg width={width} height={height} role="img" aria-label={`${title}: projected average annual loss by horizon (${currency})`} className="block overflow-visible">
          <g transform={`translate(${m.left},${m.top})`}>
            <AxisLeft scale={y} width={innerWidth} label={`Average annual loss (${currency})`} format={(v) => compact.format(v)} />
            <line x2={innerWidth} y1={innerHeight} y2={innerHeight} stroke="var(--pl-line-strong)" />
            {horizons.map((h) => {
              const cx = (x(String(h.year)) ?? 0) + x.bandwidth() / 2;
              const s = h.summary;
              const bar = (lo: number | undefined, hi: number | undefined, w: number, opacity: number, name: string) =>
                lo === undefined || hi === undefined ? null : (
                  <rect data-band={name} x={cx - w / 2} width={w} y={y(hi)} height={Math.max(1, y(lo) - y(hi))} fill={color} fillOpacity={opacity} />
                );
              return (
                <g key={h.year} data-horizon={h.year}>
                  {bar(s.p5, s.p95, Math.max(4, x.bandwidth() * 0.25), 0.3, "p5-p95")}
                  {bar(s.p17, s.p83, Math.max(8, x.bandwidth() * 0.7), 0.45, "p17-p83")}
                  {s.p50 !== undefined && (
                    <line data-band="p50" x1={cx - x.bandwidth() / 2} x2={cx + x.bandwidth() / 2} y1={y(s.p50)} y2={y(s.p50)} stroke={color} strokeWidth={2.5} />
                  )}
                  <text x={cx} y={innerHeight + 17} textAnchor="middle" className="fill-muted text-[11px] num">
                    {h.year}
                  </text>
                </g>
              );
            })}
            {baselineAal !== undefined && baselineAal !== null && (
              <g data-testid="baseline-aal">
                <line x2={innerWidth} y1={y(baselineAal)} y2={y(baselineAal)} stroke="var(--pl-ink)" strokeOpacity={0.5} strokeDasharray="4 3" />
                <text x={innerWidth - 4} y={y(baselineAal) - 4} textAnchor="end" className="fill-muted text-[10px]">
                  today {compact.format(baselineAal)} {currency}
                </text>
              </g>
            )}
            <text x={innerWidth / 2} y={innerHeight + 36} textAnchor="middle" className="fill-muted text-[12px]">
              Horizon year
            </text>
          </g>
        </svg>
      </div>
    </ChartFrame>
  );
}
