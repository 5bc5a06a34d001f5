import type { ScaleBand, ScaleLinear } from "d3";

type Numeric = ScaleLinear<number, number>;

/**
 * Axes drawn as React SVG from a d3 scale: tick lines, tick labels and an axis label that
 * always carries the unit ("Warming (K)"). Gridlines run across the plot for easy reading.
 */
export function AxisBottom({
  scale,
  height,
  label,
  ticks = 8,
  format = (v: number) => String(v),
  width,
}: {
  scale: Numeric;
  height: number;
  width: number;
  label: string;
  ticks?: number;
  format?: (v: number) => string;
}) {
  const values = scale.ticks(ticks);
  return (
    <g className="axis axis-x" transform={`translate(0,${height})`}>
      <line x1={0} x2={width} stroke="var(--pl-line-strong)" />
      {values.map((v) => (
        <g key={v} transform={`translate(${scale(v)},0)`} data-tick={v}>
          <line y2={5} stroke="var(--pl-line-strong)" />
          <text y={17} textAnchor="middle" className="fill-muted text-[11px] num">
            {format(v)}
          </text>
        </g>
      ))}
      <text x={width / 2} y={36} textAnchor="middle" className="axis-label fill-muted text-[12px]">
        {label}
      </text>
    </g>
  );
}

export function AxisLeft({
  scale,
  width,
  label,
  ticks = 6,
  format = (v: number) => String(v),
  grid = true,
}: {
  scale: Numeric;
  width: number;
  label: string;
  ticks?: number;
  format?: (v: number) => string;
  grid?: boolean;
}) {
  const values = scale.ticks(ticks);
  const [r0, r1] = scale.range() as [number, number];
  return (
    <g className="axis axis-y">
      {values.map((v) => (
        <g key={v} transform={`translate(0,${scale(v)})`} data-tick={v}>
          {grid && <line x2={width} stroke="var(--pl-line)" strokeDasharray={v === 0 ? undefined : "2 3"} />}
          <text x={-8} dy="0.32em" textAnchor="end" className="fill-muted text-[11px] num">
            {format(v)}
          </text>
        </g>
      ))}
      <text
        transform={`translate(-44,${(r0 + r1) / 2}) rotate(-90)`}
        textAnchor="middle"
        className="axis-label fill-muted text-[12px]"
      >
        {label}
      </text>
    </g>
  );
}

/** Category axis on the left for horizontal bar charts (agents, inputs). */
export function AxisLeftBand({ scale, labelWidth }: { scale: ScaleBand<string>; labelWidth: number; format?: (v: string) => string }) {
  return (
    <g className="axis axis-band">
      {scale.domain().map((d) => (
        <text key={d} x={-8} y={(scale(d) ?? 0) + scale.bandwidth() / 2} dy="0.32em" textAnchor="end" className="fill-text text-[12px]">
          {d.length > labelWidth / 6.5 ? (
            <>
              {/* A cut label keeps its full name for hover and for screen readers. */}
              <title>{d}</title>
              {`${d.slice(0, Math.floor(labelWidth / 6.5) - 1)}…`}
            </>
          ) : (
            d
          )}
        </text>
      ))}
    </g>
  );
}
