import { useMemo } from "react";
import { area, scaleLinear } from "d3";

export interface DensityMarker {
  p: number;
  value: number;
}

/**
 * Compact density curve of one input's distribution with its percentile markers (5/17/50/83/95).
 * Fixed inputs have no density: the caller passes a single spike.
 */
export function DensityPreview({
  xs,
  density,
  markers,
  unit,
  label,
  width = 280,
  height = 96,
}: {
  xs: number[];
  density: number[];
  markers: DensityMarker[];
  unit: string;
  label: string;
  width?: number;
  height?: number;
}) {
  const m = { top: 6, right: 8, bottom: 20, left: 8 };
  const iw = width - m.left - m.right;
  const ih = height - m.top - m.bottom;
  const lo = Math.min(...xs, ...markers.map((k) => k.value));
  const hi = Math.max(...xs, ...markers.map((k) => k.value));
  const x = useMemo(() => scaleLinear().domain(lo === hi ? [lo - 1, hi + 1] : [lo, hi]).range([0, iw]), [lo, hi, iw]);
  const y = useMemo(() => scaleLinear().domain([0, Math.max(...density.filter(Number.isFinite), 1e-12)]).range([ih, 0]), [density, ih]);
  const idx = xs.map((_, i) => i).filter((i) => Number.isFinite(density[i]));
  const d = area<number>()
    .x((i) => x(xs[i]!))
    .y0(ih)
    .y1((i) => y(density[i]!))(idx);
  return (
    <svg width={width} height={height} role="img" aria-label={`Density of ${label} (${unit}) with its 5, 17, 50, 83 and 95 percentiles`} className="block max-w-full">
      <g transform={`translate(${m.left},${m.top})`}>
        <path d={d ?? ""} fill="var(--pl-ember-200)" fillOpacity={0.7} stroke="var(--pl-ember-600)" strokeWidth={1.2} />
        {markers.map((k) => (
          <g key={k.p} data-percentile={k.p}>
            <line x1={x(k.value)} x2={x(k.value)} y1={0} y2={ih} stroke="var(--pl-ink)" strokeOpacity={k.p === 50 ? 0.9 : 0.45} strokeDasharray={k.p === 50 ? undefined : "2 2"} />
          </g>
        ))}
        <line y1={ih} y2={ih} x2={iw} stroke="var(--pl-line-strong)" />
        {x.ticks(4).map((t) => (
          <text key={t} x={x(t)} y={ih + 13} textAnchor="middle" className="fill-muted text-[10px] num">
            {t}
          </text>
        ))}
        <text x={iw} y={4} textAnchor="end" className="fill-faint text-[10px]">
          {unit}
        </text>
      </g>
    </svg>
  );
}
