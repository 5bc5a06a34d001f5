import { useMemo } from "react";
import { scaleBand, scaleLinear } from "d3";
import { AxisLeft } from "@/components/charts/axes";
import { ChartFrame, DataTable } from "@/components/charts/chart-frame";
import { DEFAULT_MARGINS, innerSize } from "@/components/charts/margins";
import { seriesColor } from "@/components/charts/palette";
import { useChartWidth } from "@/components/charts/use-chart-width";
import { formatInteger } from "@/lib/format";
import { lossAxisDomain } from "../lib/loss-axis-domain";

/** One horizon's projected loss: its percentiles ("p5" … "p95") and mean. */
export interface LossAtHorizon {
  year: number;
  summary: Record<string, number>;
}

const compact = new Intl.NumberFormat("en-GB", { notation: "compact", maximumFractionDigits: 1 });

/**
 * Projected average annual loss by horizon: for each horizon a thin 5–95 % bar, a wider
 * 17–83 % bar and a median tick, with the baseline AAL (today's view) as a dashed line, so the
 * change and its uncertainty read at a glance. The loss axis spans the bands and today's AAL
 * rather than starting at zero (said in the axis label, with a break mark), so a narrow band
 * of large losses keeps its shape. Plain data in, nothing fetched.
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
  // The axis spans the data and today's AAL (not from zero), so the bands have height.
  const { y, fromZero } = useMemo(() => {
    const values = horizons.flatMap((h) => [h.summary.p5, h.summary.p50, h.summary.p95]).filter((v): v is number => v !== undefined);
    if (baselineAal !== undefined && baselineAal !== null) values.push(baselineAal);
    const scale = scaleLinear().domain(lossAxisDomain(values).domain).range([innerHeight, 0]).nice();
    return { y: scale, fromZero: scale.domain()[0]! <= 0 };
  }, [horizons, baselineAal, innerHeight]);
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
    <ChartFrame
      title={title}
      description={`Median tick, 17–83 % (wide) and 5–95 % (thin) bars at each horizon; dashed line: today's AAL.${fromZero ? "" : " The loss axis spans the projections and today's AAL: it does not start at zero."}`}
      table={table}
    >
      <div ref={ref} className="w-full">
        <svg width={width} height={height} role="img" aria-label={`${title}: projected average annual loss by horizon (${currency})`} className="block overflow-visible">
          <g transform={`translate(${m.left},${m.top})`}>
            <AxisLeft scale={y} width={innerWidth} label={fromZero ? `Average annual loss (${currency})` : `AAL (${currency}), axis not from 0`} format={(v) => compact.format(v)} />
            <line x2={innerWidth} y1={innerHeight} y2={innerHeight} stroke="var(--pl-line-strong)" />
            {!fromZero && (
              // The usual broken-axis mark: two short slashes where the axis would go on to zero.
              <path data-testid="axis-break" d={`M-5,${innerHeight - 2} l10,-5 M-5,${innerHeight + 3} l10,-5`} stroke="var(--pl-muted)" strokeWidth={1.2} fill="none" />
            )}
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
