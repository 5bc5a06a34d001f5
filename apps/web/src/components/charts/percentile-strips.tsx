import { useMemo } from "react";
import { scaleBand, scaleLinear } from "d3";
import { AxisBottom, AxisLeftBand } from "./axes";
import { ChartFrame, DataTable } from "./chart-frame";
import { useChartWidth } from "./use-chart-width";
import { BAND_LABELS } from "./band-labels";
import type { LegendEntry } from "./chart-export";
import { unitOf } from "./line-chart";

export interface PercentileStrip {
  id: string;
  label: string;
  p5: number;
  p17: number;
  p50: number;
  p83: number;
  p95: number;
  color?: string;
}

/**
 * Percentile strips on one shared axis: a thin 5–95 % line, a thick 17–83 % bar and a
 * median tick per row. Used to set distributions side by side (prior vs weighted ECS,
 * two runs at one horizon).
 */
export function PercentileStrips({
  title,
  description,
  strips,
  axisLabel,
  series = [],
}: {
  title: string;
  description?: string;
  strips: PercentileStrip[];
  axisLabel: string;
  /** What the strip colours stand for (runs, priors), for the downloaded chart's legend. */
  series?: LegendEntry[];
}) {
  const [ref, width] = useChartWidth<HTMLDivElement>();
  const labelWidth = 150;
  const m = { top: 6, right: 20, bottom: 44, left: labelWidth };
  const rowH = 30;
  const innerHeight = strips.length * rowH;
  const innerWidth = Math.max(10, width - m.left - m.right);
  const lo = Math.min(...strips.map((s) => s.p5));
  const hi = Math.max(...strips.map((s) => s.p95));
  const pad = (hi - lo) * 0.05 || 0.5;
  const x = useMemo(
    () =>
      scaleLinear()
        .domain([lo - pad, hi + pad])
        .range([0, innerWidth])
        .nice(),
    [lo, hi, pad, innerWidth],
  );
  const yb = useMemo(
    () =>
      scaleBand()
        .domain(strips.map((s) => s.label))
        .range([0, innerHeight])
        .padding(0.35),
    [strips, innerHeight],
  );
  return (
    <ChartFrame
      title={title}
      units={unitOf(axisLabel)}
      legend={[
        ...series,
        { label: `${BAND_LABELS.outer} (thin line)`, color: "var(--pl-ink)" },
        { label: `${BAND_LABELS.inner} (bar)`, color: "var(--pl-ink)", kind: "swatch" },
        { label: `${BAND_LABELS.median} (tick)`, color: "var(--pl-ink)" },
      ]}
      description={description}
      table={
        <DataTable
          caption={title}
          columns={["", "5 %", "17 %", "50 %", "83 %", "95 %"]}
          rows={strips.map((s) => [s.label, s.p5.toFixed(2), s.p17.toFixed(2), s.p50.toFixed(2), s.p83.toFixed(2), s.p95.toFixed(2)])}
        />
      }
    >
      <div ref={ref} className="w-full">
        <svg width={width} height={innerHeight + m.top + m.bottom} role="img" aria-label={`${title}: ${axisLabel}`}>
          <g transform={`translate(${m.left},${m.top})`}>
            {x.ticks(6).map((t) => (
              <line key={t} x1={x(t)} x2={x(t)} y2={innerHeight} stroke="var(--pl-line)" strokeDasharray="2 3" />
            ))}
            <AxisLeftBand scale={yb} labelWidth={labelWidth} />
            <AxisBottom scale={x} height={innerHeight} width={innerWidth} label={axisLabel} ticks={6} />
            {strips.map((s) => {
              const cy = yb(s.label)! + yb.bandwidth() / 2;
              const color = s.color ?? "var(--pl-ember-600)";
              return (
                <g key={s.id} data-strip={s.id}>
                  <line x1={x(s.p5)} x2={x(s.p95)} y1={cy} y2={cy} stroke={color} strokeWidth={2} strokeOpacity={0.5} />
                  <rect
                    x={x(s.p17)}
                    width={Math.max(1, x(s.p83) - x(s.p17))}
                    y={cy - 6}
                    height={12}
                    rx={2}
                    fill={color}
                    fillOpacity={0.45}
                  />
                  <line x1={x(s.p50)} x2={x(s.p50)} y1={cy - 9} y2={cy + 9} stroke={color} strokeWidth={3} />
                </g>
              );
            })}
          </g>
        </svg>
      </div>
    </ChartFrame>
  );
}
