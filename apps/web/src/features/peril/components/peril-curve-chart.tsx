import { useMemo } from "react";
import { area, line, max, min, scaleLinear } from "d3";
import { AxisBottom, AxisLeft } from "@/components/charts/axes";
import { ChartFrame, DataTable } from "@/components/charts/chart-frame";
import { DEFAULT_MARGINS, innerSize } from "@/components/charts/margins";
import { seriesColor } from "@/components/charts/palette";
import { useChartWidth } from "@/components/charts/use-chart-width";

/** A multiplier curve as plain arrays: warming levels and the band percentiles at each. */
export interface MultiplierCurveData {
  warming: number[];
  /** "p5", "p17", "p50", "p83", "p95" → multiplier at each warming level. */
  bands: Record<string, number[]>;
  baselineWarming: number;
  /** Table profiles: each table's multiplier at each warming level, by the event return period it states. */
  tables?: { returnPeriod: number; multiplier: number[] }[];
}

/** Y domain covering the outer band, every table and 1, padded a little; multipliers never go below 0. */
export function curveYDomain(curve: MultiplierCurveData): [number, number] {
  const tableValues = (curve.tables ?? []).flatMap((t) => t.multiplier);
  const lo = Math.min(1, min([...(curve.bands.p5 ?? curve.bands.p50 ?? []), ...tableValues]) ?? 1);
  const hi = Math.max(1, max([...(curve.bands.p95 ?? curve.bands.p50 ?? []), ...tableValues]) ?? 1);
  const pad = (hi - lo) * 0.05 || 0.1;
  return [Math.max(0, lo - pad), hi + pad];
}

/**
 * Multiplier against global warming (K above 1850–1900): a light 5–95 % band, a stronger
 * 17–83 % band and the median, a dashed line at multiplier 1 and a marker at the warming
 * already in the firm's risk view (where every band meets 1). A table profile has no scaling
 * uncertainty: one line per table, labelled with the return period of the events it describes.
 */
export function PerilCurveChart({
  curve,
  title = "Multiplier against warming",
  height = 300,
}: {
  curve: MultiplierCurveData;
  title?: string;
  height?: number;
}) {
  const [ref, width] = useChartWidth<HTMLDivElement>();
  const m = DEFAULT_MARGINS;
  const { innerWidth, innerHeight } = innerSize(width, height, m);
  const x = useMemo(
    () =>
      scaleLinear()
        .domain([curve.warming[0] ?? 0, curve.warming.at(-1) ?? 1])
        .range([0, innerWidth]),
    [curve.warming, innerWidth],
  );
  const y = useMemo(() => scaleLinear().domain(curveYDomain(curve)).range([innerHeight, 0]).nice(), [curve, innerHeight]);
  const idx = curve.warming.map((_, i) => i);
  const band = (lo?: number[], hi?: number[]) =>
    lo && hi
      ? (area<number>()
          .x((i) => x(curve.warming[i]!))
          .y0((i) => y(lo[i]!))
          .y1((i) => y(hi[i]!))(idx) ?? "")
      : "";
  const median = curve.bands.p50
    ? (line<number>()
        .x((i) => x(curve.warming[i]!))
        .y((i) => y(curve.bands.p50![i]!))(idx) ?? "")
    : "";
  const color = seriesColor(0);
  const tables = curve.tables ?? [];
  const byTable = tables.length > 0;
  const keys = ["p5", "p17", "p50", "p83", "p95"].filter((k) => curve.bands[k]);
  const tableLine = (values: number[]) =>
    line<number>()
      .x((i) => x(curve.warming[i]!))
      .y((i) => y(values[i]!))(idx) ?? "";
  const tableRows = curve.warming
    .map((w, i) => ({ w, i }))
    .filter(({ w }) => Math.abs(w * 2 - Math.round(w * 2)) < 1e-9)
    .map(({ w, i }) => [
      w.toFixed(1),
      ...(byTable ? tables.map((t) => t.multiplier[i]!.toFixed(3)) : keys.map((k) => curve.bands[k]![i]!.toFixed(3))),
    ]);
  const columns = byTable ? tables.map((t) => `1-in-${t.returnPeriod}-year events`) : keys.map((k) => `${k.slice(1)} %`);
  const baselineVisible = curve.baselineWarming >= x.domain()[0]! && curve.baselineWarming <= x.domain()[1]!;

  return (
    <ChartFrame
      title={title}
      units="multiplier (× the firm's baseline view) against warming above 1850–1900 (K)"
      legend={[
        ...(byTable
          ? tables.map((t, k) => ({ label: `1-in-${t.returnPeriod}-year events`, color: seriesColor(k) }))
          : [
              { label: "5th–95th percentile (light) and 17th–83rd percentile (strong) bands", color, kind: "swatch" as const },
              { label: "median (50th percentile)", color },
            ]),
        { label: "multiplier 1 (the baseline view)", color: "var(--pl-ink)", dash: "4 3" },
        ...(baselineVisible ? [{ label: "warming already in the risk view", color: "var(--pl-accent)", dash: "2 3" }] : []),
      ]}
      description={
        byTable
          ? "One line per table, for the events of the return period it states; a table carries no scaling uncertainty. Between return periods the lens reads along a straight line in log return period."
          : "Median, 17–83 % and 5–95 % bands of the scaling uncertainty alone (exact percentiles, no sampling)."
      }
      table={<DataTable caption={title} columns={["Warming (K)", ...columns]} rows={tableRows} />}
    >
      <div ref={ref} className="w-full">
        <svg
          width={width}
          height={height}
          role="img"
          aria-label={`${title}: multiplier against warming above 1850–1900`}
          className="block overflow-visible"
        >
          <g transform={`translate(${m.left},${m.top})`}>
            <AxisLeft scale={y} width={innerWidth} label="Multiplier (× baseline view)" format={(v) => v.toFixed(2)} />
            <AxisBottom
              scale={x}
              height={innerHeight}
              width={innerWidth}
              label="Warming above 1850–1900 (K)"
              format={(v) => v.toFixed(1)}
            />
            <line
              data-testid="unit-line"
              x2={innerWidth}
              y1={y(1)}
              y2={y(1)}
              stroke="var(--pl-ink)"
              strokeOpacity={0.45}
              strokeDasharray="4 3"
            />
            {byTable ? (
              tables.map((t, k) => (
                <g key={t.returnPeriod} data-return-period={t.returnPeriod}>
                  <path d={tableLine(t.multiplier)} fill="none" stroke={seriesColor(k)} strokeWidth={2} />
                  <text x={innerWidth + 4} y={y(t.multiplier.at(-1)!)} dy="0.32em" className="text-[10px]" fill={seriesColor(k)}>
                    1-in-{t.returnPeriod}
                  </text>
                </g>
              ))
            ) : (
              <>
                <path data-band="p5-p95" d={band(curve.bands.p5, curve.bands.p95)} fill={color} fillOpacity={0.16} />
                <path data-band="p17-p83" d={band(curve.bands.p17, curve.bands.p83)} fill={color} fillOpacity={0.32} />
                <path data-band="p50" d={median} fill="none" stroke={color} strokeWidth={2} />
              </>
            )}
            {baselineVisible && (
              <g data-testid="baseline-marker">
                <line
                  x1={x(curve.baselineWarming)}
                  x2={x(curve.baselineWarming)}
                  y2={innerHeight}
                  stroke="var(--pl-accent)"
                  strokeWidth={1.5}
                  strokeDasharray="2 3"
                />
                <text x={x(curve.baselineWarming) + 4} y={12} className="fill-accent text-[10px]">
                  in risk view: {curve.baselineWarming.toFixed(2)} K
                </text>
              </g>
            )}
          </g>
        </svg>
      </div>
    </ChartFrame>
  );
}
