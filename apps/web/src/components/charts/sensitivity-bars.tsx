import { useMemo } from "react";
import { scaleBand, scaleLinear } from "d3";
import { AxisBottom, AxisLeftBand } from "./axes";
import { ChartFrame, DataTable } from "./chart-frame";
import { useChartWidth } from "./use-chart-width";

export interface SensitivityBar {
  input: string;
  label: string;
  index: number;
}

/**
 * Sensitivity budget at one horizon: which inputs drive the spread of warming, largest
 * first. Signed indices (rank correlations) extend left or right of zero.
 */
export function SensitivityBars({
  title,
  horizon,
  bars,
  indexLabel = "Rank correlation with warming (–1 to 1)",
}: {
  title: string;
  horizon: number;
  bars: SensitivityBar[];
  indexLabel?: string;
}) {
  const [ref, width] = useChartWidth<HTMLDivElement>();
  const sorted = [...bars].sort((a, b) => Math.abs(b.index) - Math.abs(a.index));
  // Wide enough for the longest input name the budget can hold, "Other well-mixed gases scale"
  // (28 characters at the axis's ~6.5 px each), so no driver is cut to an ellipsis.
  const labelWidth = 190;
  const m = { top: 8, right: 48, bottom: 44, left: labelWidth };
  const rowH = 24;
  const innerHeight = Math.max(1, sorted.length) * rowH;
  const innerWidth = Math.max(10, width - m.left - m.right);
  const lo = Math.min(0, ...sorted.map((b) => b.index));
  const hi = Math.max(0.05, ...sorted.map((b) => b.index));
  const x = useMemo(() => scaleLinear().domain([lo, hi]).range([0, innerWidth]).nice(), [lo, hi, innerWidth]);
  const yb = useMemo(
    () =>
      scaleBand()
        .domain(sorted.map((b) => b.label))
        .range([0, innerHeight])
        .padding(0.25),
    [sorted, innerHeight],
  );

  return (
    <ChartFrame
      title={title}
      units={indexLabel}
      legend={[
        { label: "pushes warming up (positive)", color: "var(--pl-ember-400)", kind: "swatch" },
        { label: "pushes warming down (negative)", color: "var(--pl-series-2)", kind: "swatch" },
      ]}
      description={`What drives the spread of warming in ${horizon}.`}
      table={<DataTable caption={title} columns={["Input", indexLabel]} rows={sorted.map((b) => [b.label, b.index.toFixed(3)])} />}
    >
      <div ref={ref} className="w-full">
        <svg width={width} height={innerHeight + m.top + m.bottom} role="img" aria-label={`${title}: ${indexLabel} by input`}>
          <g transform={`translate(${m.left},${m.top})`}>
            <AxisLeftBand scale={yb} labelWidth={labelWidth} />
            <AxisBottom scale={x} height={innerHeight} width={innerWidth} label={indexLabel} ticks={6} />
            <line x1={x(0)} x2={x(0)} y2={innerHeight} stroke="var(--pl-line-strong)" />
            {sorted.map((b) => (
              <g key={b.input} data-input={b.input}>
                <rect
                  x={Math.min(x(0), x(b.index))}
                  width={Math.abs(x(b.index) - x(0))}
                  y={yb(b.label)}
                  height={yb.bandwidth()}
                  fill={b.index >= 0 ? "var(--pl-ember-400)" : "var(--pl-series-2)"}
                />
                <text
                  x={x(Math.max(0, b.index)) + 4}
                  y={yb(b.label)! + yb.bandwidth() / 2}
                  dy="0.32em"
                  className="fill-muted text-[11px] num"
                >
                  {b.index.toFixed(2)}
                </text>
              </g>
            ))}
          </g>
        </svg>
      </div>
    </ChartFrame>
  );
}
