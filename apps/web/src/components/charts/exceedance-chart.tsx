import { useMemo } from "react";
import { line, scaleLinear } from "d3";
import { formatProbabilityTenths } from "@/lib/format";
import { AxisBottom, AxisLeft } from "./axes";
import { ChartFrame, DataTable } from "./chart-frame";
import { firstActiveIndex } from "./chart-domains";
import { DEFAULT_MARGINS, innerSize } from "./margins";
import { useChartWidth } from "./use-chart-width";

export interface ExceedanceCurve {
  /** Threshold in K above the baseline. */
  threshold: number;
  /** Share of members above the threshold, 0–1, one per year. */
  probability: number[];
}

/** Threshold colours step from gold through ember to red: a hotter threshold reads as a hotter colour. */
const THRESHOLD_COLORS = ["var(--pl-gold)", "var(--pl-ember-600)", "var(--pl-danger)", "var(--pl-ember-800)", "var(--pl-series-3)"];

/**
 * Probability of exceeding each warming threshold, per year (0–100 %). Thresholds are
 * drawn in order, so a higher threshold is always the lower curve.
 */
export function ExceedanceChart({
  title,
  years,
  curves,
  fromYear,
  height = 280,
  unit = "K",
}: {
  title: string;
  years: number[];
  curves: ExceedanceCurve[];
  fromYear?: number;
  height?: number;
  unit?: string;
}) {
  const [ref, width] = useChartWidth<HTMLDivElement>();
  const m = DEFAULT_MARGINS;
  const { innerWidth, innerHeight } = innerSize(width, height, m);
  const from = Math.max(0, fromYear === undefined ? 0 : years.findIndex((y) => y >= fromYear));
  // The year axis starts a decade before any chance leaves zero, not at the run's first year.
  const start = firstActiveIndex(
    years,
    curves.map((c) => c.probability),
    from,
  );
  const x = useMemo(
    () =>
      scaleLinear()
        .domain([years[start]!, years[years.length - 1]!])
        .range([0, innerWidth]),
    [years, start, innerWidth],
  );
  const y = useMemo(() => scaleLinear().domain([0, 100]).range([innerHeight, 0]), [innerHeight]);
  const sorted = [...curves].sort((a, b) => a.threshold - b.threshold);
  const idx = Array.from({ length: years.length - start }, (_, k) => start + k);

  return (
    <ChartFrame
      title={title}
      units={`% of members (chance of warming above each threshold, in ${unit})`}
      legend={sorted.map((c, i) => ({ label: `above ${c.threshold} ${unit}`, color: THRESHOLD_COLORS[i % THRESHOLD_COLORS.length]! }))}
      description={`Share of members whose warming is above each threshold in that year.${
        start > from ? ` Drawn from ${years[start]}: before then no threshold is exceeded by more than 0.05 % of members.` : ""
      }`}
      table={
        <DataTable
          caption={title}
          columns={["Year", ...sorted.map((c) => `Chance > ${c.threshold} ${unit}`)]}
          rows={idx
            .filter((k) => years[k]! % 10 === 0)
            .map((k) => [years[k]!, ...sorted.map((c) => formatProbabilityTenths(c.probability[k]))])}
        />
      }
    >
      <div className="flex flex-wrap gap-3 text-xs">
        {sorted.map((c, i) => (
          <span key={c.threshold} className="flex items-center gap-1.5">
            <span aria-hidden className="h-0.5 w-4" style={{ background: THRESHOLD_COLORS[i % THRESHOLD_COLORS.length] }} />
            above {c.threshold} {unit}
          </span>
        ))}
      </div>
      <div ref={ref} className="w-full">
        <svg width={width} height={height} role="img" aria-label={`${title}: probability (%) against year`}>
          <g transform={`translate(${m.left},${m.top})`}>
            <AxisLeft scale={y} width={innerWidth} label="Probability of exceeding (%)" ticks={5} />
            <AxisBottom scale={x} height={innerHeight} width={innerWidth} label="Year" ticks={Math.max(2, Math.floor(innerWidth / 80))} />
            {sorted.map((c, i) => (
              <path
                key={c.threshold}
                data-threshold={c.threshold}
                d={
                  line<number>()
                    .x((k) => x(years[k]!))
                    .y((k) => y(c.probability[k]! * 100))(idx) ?? ""
                }
                fill="none"
                stroke={THRESHOLD_COLORS[i % THRESHOLD_COLORS.length]}
                strokeWidth={2}
              />
            ))}
          </g>
        </svg>
      </div>
    </ChartFrame>
  );
}
