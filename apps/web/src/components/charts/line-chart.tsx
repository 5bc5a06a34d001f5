import { useMemo } from "react";
import { extent, line, scaleLinear } from "d3";
import { AxisBottom, AxisLeft } from "./axes";
import { ChartFrame, DataTable } from "./chart-frame";
import { DEFAULT_MARGINS, innerSize } from "./margins";
import { seriesColor } from "./palette";
import { useChartWidth } from "./use-chart-width";

export interface LineSeries {
  id: string;
  label: string;
  values: number[];
  color?: string;
}

/** The unit in an axis label's last brackets ("CO₂ (ppm)" -> "ppm"), else the whole label. */
export function unitOf(label: string): string {
  return /\(([^()]+)\)\s*$/.exec(label)?.[1] ?? label;
}

/**
 * Plain multi-line chart over years (e.g. concentrations given in ppm or ppb). A NaN value is
 * a year the series does not cover: the line breaks there and the table shows "–".
 */
export function LineChart({ title, years, series, yLabel, height = 240 }: { title: string; years: number[]; series: LineSeries[]; yLabel: string; height?: number }) {
  const [ref, width] = useChartWidth<HTMLDivElement>();
  const m = DEFAULT_MARGINS;
  const { innerWidth, innerHeight } = innerSize(width, height, m);
  const [lo, hi] = extent(series.flatMap((s) => s.values)) as [number, number];
  const x = useMemo(() => scaleLinear().domain([years[0]!, years.at(-1)!]).range([0, innerWidth]), [years, innerWidth]);
  const y = useMemo(() => scaleLinear().domain([Math.min(0, lo ?? 0), hi ?? 1]).range([innerHeight, 0]).nice(), [lo, hi, innerHeight]);
  return (
    <ChartFrame
      title={title}
      units={unitOf(yLabel)}
      legend={series.map((s, i) => ({ label: s.label, color: s.color ?? seriesColor(i) }))}
      table={
        <DataTable
          caption={title}
          columns={["Year", ...series.map((s) => s.label)]}
          rows={years.map((yr, k) => ({ yr, k })).filter(({ yr }) => yr % 10 === 0).map(({ yr, k }) => [yr, ...series.map((s) => {
            const v = s.values[k];
            return v !== undefined && Number.isFinite(v) ? v.toFixed(2) : "–";
          })])}
        />
      }
    >
      <div className="flex flex-wrap gap-3 text-xs">
        {series.map((s, i) => (
          <span key={s.id} className="flex items-center gap-1.5">
            <span aria-hidden className="h-0.5 w-4" style={{ background: s.color ?? seriesColor(i) }} />
            {s.label}
          </span>
        ))}
      </div>
      <div ref={ref} className="w-full">
        <svg width={width} height={height} role="img" aria-label={`${title}: ${yLabel} against year`}>
          <g transform={`translate(${m.left},${m.top})`}>
            <AxisLeft scale={y} width={innerWidth} label={yLabel} />
            <AxisBottom scale={x} height={innerHeight} width={innerWidth} label="Year" ticks={Math.max(2, Math.floor(innerWidth / 80))} />
            {series.map((s, i) => (
              <path key={s.id} d={
                  line<number>()
                    .defined((v) => Number.isFinite(v))
                    .x((_, k) => x(years[k]!))
                    .y((v) => y(v))(s.values) ?? ""
                }
                data-series={s.id} fill="none" stroke={s.color ?? seriesColor(i)} strokeWidth={2} />
            ))}
          </g>
        </svg>
      </div>
    </ChartFrame>
  );
}
