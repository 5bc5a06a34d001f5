import { useMemo } from "react";
import { scaleBand, scaleLinear } from "d3";
import { AxisLeft } from "@/components/charts/axes";
import { ChartFrame, DataTable } from "@/components/charts/chart-frame";
import { DEFAULT_MARGINS, innerSize } from "@/components/charts/margins";
import { seriesColor } from "@/components/charts/palette";
import { useChartWidth } from "@/components/charts/use-chart-width";
import { formatMoney, moneyScale, moneyUnit, percentileHeading } from "@/lib/format";
import { lossAxisDomain } from "../lib/loss-axis-domain";
import { medianChange } from "../lib/median-change";
import { AalChartLegend } from "./aal-chart-legend";

/** One horizon's projected loss: its percentiles ("p5" … "p95") and mean. */
export interface LossAtHorizon {
  year: number;
  summary: Record<string, number>;
}

const compact = new Intl.NumberFormat("en-GB", { notation: "compact", maximumFractionDigits: 1 });
const TODAY = "today";
/** Width of the 17–83 % bar and the 5–95 % whisker caps, in px: narrow and fixed, so the marks never meet. */
const BAR_WIDTH = 14;
const CAP_WIDTH = 10;

/**
 * Projected average annual loss by horizon, beside today's: one column per horizon holding a
 * dot-and-range (median dot, 17–83 % bar, 5–95 % whisker with caps), and a first "Today"
 * column with the portfolio's AAL as a square, also carried across as a faint dashed line. The
 * marks are narrow and centred on their column (no mark crosses another), a legend names each
 * shape, and under each year the median's change against today is written out. The loss axis
 * spans the ranges and today's AAL rather than starting at zero (said in the axis label, with a
 * break mark), which is why ranges are drawn rather than bars rising from zero. Plain data in,
 * nothing fetched.
 */
export function AalBandChart({
  title,
  currency,
  baselineAal,
  horizons,
  height = 300,
}: {
  title: string;
  currency: string;
  /** Today's AAL from the portfolio, if known (its own column and the reference line). */
  baselineAal?: number | null;
  horizons: LossAtHorizon[];
  height?: number;
}) {
  const [ref, width] = useChartWidth<HTMLDivElement>();
  const today = baselineAal ?? null;
  const m = { ...DEFAULT_MARGINS, left: 64, bottom: 58 };
  const { innerWidth, innerHeight } = innerSize(width, height, m);
  const x = useMemo(
    () =>
      scaleBand()
        .domain([...(today !== null ? [TODAY] : []), ...horizons.map((h) => String(h.year))])
        .range([0, innerWidth])
        .padding(0.2),
    [horizons, today, innerWidth],
  );
  const centre = (key: string) => (x(key) ?? 0) + x.bandwidth() / 2;
  // The axis spans the data and today's AAL (not from zero), so the ranges have height.
  const { y, fromZero } = useMemo(() => {
    const values = horizons.flatMap((h) => [h.summary.p5, h.summary.p50, h.summary.p95]).filter((v): v is number => v !== undefined);
    if (today !== null) values.push(today);
    const scale = scaleLinear().domain(lossAxisDomain(values).domain).range([innerHeight, 0]).nice();
    return { y: scale, fromZero: scale.domain()[0]! <= 0 };
  }, [horizons, today, innerHeight]);
  const color = seriesColor(0);
  const keys = ["p5", "p17", "p50", "p83", "p95", "mean"];
  const money = moneyScale([today, ...horizons.flatMap((h) => keys.map((k) => h.summary[k]))]);
  const unit = moneyUnit(currency, money);
  const table = (
    <DataTable
      caption={title}
      columns={[
        "Horizon",
        ...(today !== null ? [`Today (${unit})`] : []),
        ...keys.map((k) => (k === "mean" ? `Mean (${unit})` : `${percentileHeading(k)} (${unit})`)),
        ...(today !== null ? ["Median vs today"] : []),
      ]}
      rows={horizons.map((h) => [
        h.year,
        ...(today !== null ? [formatMoney(today, money)] : []),
        ...keys.map((k) => formatMoney(h.summary[k], money)),
        ...(today !== null ? [medianChange(h.summary.p50, today) ?? "–"] : []),
      ])}
    />
  );
  return (
    <ChartFrame
      title={title}
      units={`${unit} (average annual loss)`}
      legend={[
        { label: "median (50th percentile)", color },
        { label: "17th–83rd percentile (bar)", color, kind: "swatch" },
        { label: "5th–95th percentile (whisker)", color },
        ...(today !== null ? [{ label: "today's AAL (portfolio baseline)", color: "var(--pl-ink)", dash: "3 2" }] : []),
      ]}
      description={`Projected AAL across members at each horizon, in ${currency}.${today !== null ? " The square is today's AAL from the portfolio baseline." : ""}${fromZero ? "" : " The loss axis spans the projections and today's AAL: it does not start at zero."}`}
      table={table}
    >
      <div ref={ref} className="flex w-full flex-col gap-2">
        <AalChartLegend color={color} withToday={today !== null} />
        <svg
          width={width}
          height={height}
          role="img"
          aria-label={`${title}: projected average annual loss by horizon (${currency})`}
          className="block overflow-visible"
        >
          <g transform={`translate(${m.left},${m.top})`}>
            <AxisLeft
              scale={y}
              width={innerWidth}
              label={fromZero ? `Average annual loss (${currency})` : `AAL (${currency}), axis not from 0`}
              format={(v) => compact.format(v)}
            />
            <line x2={innerWidth} y1={innerHeight} y2={innerHeight} stroke="var(--pl-line-strong)" />
            {!fromZero && (
              // The usual broken-axis mark: two short slashes where the axis would go on to zero.
              <path
                data-testid="axis-break"
                d={`M-5,${innerHeight - 2} l10,-5 M-5,${innerHeight + 3} l10,-5`}
                stroke="var(--pl-muted)"
                strokeWidth={1.2}
                fill="none"
              />
            )}
            {today !== null && (
              <g data-testid="baseline-aal">
                <line
                  x1={centre(TODAY)}
                  x2={innerWidth}
                  y1={y(today)}
                  y2={y(today)}
                  stroke="var(--pl-ink)"
                  strokeOpacity={0.35}
                  strokeDasharray="4 3"
                />
                <rect
                  data-point="today"
                  x={centre(TODAY) - 5}
                  y={y(today) - 5}
                  width={10}
                  height={10}
                  fill="var(--pl-surface)"
                  stroke="var(--pl-ink)"
                  strokeWidth={1.5}
                />
                <text x={centre(TODAY) + 10} y={y(today)} dy="0.32em" className="fill-text text-[11px] num">
                  {compact.format(today)}
                </text>
                <text x={centre(TODAY)} y={innerHeight + 17} textAnchor="middle" className="fill-muted text-[11px]">
                  Today
                </text>
              </g>
            )}
            {horizons.map((h) => {
              const cx = centre(String(h.year));
              const s = h.summary;
              const change = medianChange(s.p50, today);
              return (
                <g key={h.year} data-horizon={h.year}>
                  {s.p5 !== undefined && s.p95 !== undefined && (
                    <g stroke={color} strokeWidth={1.5}>
                      <line data-range="p5-p95" x1={cx} x2={cx} y1={y(s.p95)} y2={y(s.p5)} />
                      <line x1={cx - CAP_WIDTH / 2} x2={cx + CAP_WIDTH / 2} y1={y(s.p95)} y2={y(s.p95)} />
                      <line x1={cx - CAP_WIDTH / 2} x2={cx + CAP_WIDTH / 2} y1={y(s.p5)} y2={y(s.p5)} />
                    </g>
                  )}
                  {s.p17 !== undefined && s.p83 !== undefined && (
                    <rect
                      data-range="p17-p83"
                      x={cx - BAR_WIDTH / 2}
                      width={BAR_WIDTH}
                      y={y(s.p83)}
                      height={Math.max(1, y(s.p17) - y(s.p83))}
                      rx={2}
                      fill={color}
                      fillOpacity={0.3}
                      stroke={color}
                    />
                  )}
                  {s.p50 !== undefined && (
                    <>
                      <circle data-point="p50" cx={cx} cy={y(s.p50)} r={5} fill={color} stroke="var(--pl-surface)" strokeWidth={1.5} />
                      <text x={cx + BAR_WIDTH / 2 + 6} y={y(s.p50)} dy="0.32em" className="fill-text text-[11px] num">
                        {compact.format(s.p50)}
                      </text>
                    </>
                  )}
                  <text x={cx} y={innerHeight + 17} textAnchor="middle" className="fill-muted text-[11px] num">
                    {h.year}
                  </text>
                  {change && (
                    <text data-change x={cx} y={innerHeight + 31} textAnchor="middle" className="fill-muted text-[10px] num">
                      median {change}
                    </text>
                  )}
                </g>
              );
            })}
            <text x={innerWidth / 2} y={innerHeight + 50} textAnchor="middle" className="fill-muted text-[12px]">
              Horizon year
            </text>
          </g>
        </svg>
      </div>
    </ChartFrame>
  );
}
