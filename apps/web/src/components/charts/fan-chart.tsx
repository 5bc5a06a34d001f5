import { useMemo, useState, type KeyboardEvent, type PointerEvent } from "react";
import { area, extent, line, max, min, scaleLinear } from "d3";
import { AxisBottom, AxisLeft } from "./axes";
import { BandKey } from "./band-key";
import { BAND_LABELS } from "./band-labels";
import { ChartFrame, DataTable } from "./chart-frame";
import { paddedDomain } from "./chart-domains";
import { DEFAULT_MARGINS, innerSize } from "./margins";
import { FanReadout } from "./fan-readout";
import { seriesColor, thresholdStyle } from "./palette";
import { useChartWidth } from "./use-chart-width";

/** One pathway (or run) as plain arrays: the year axis and five percentile series of equal length. */
export interface FanSeries {
  id: string;
  name: string;
  years: number[];
  p5: number[];
  p17: number[];
  p50: number[];
  p83: number[];
  p95: number[];
  color?: string;
  /**
   * How the bands are drawn: "filled" (default: tinted bands, solid median) or "outline"
   * (band edges only, dashed median), so two series on one chart neither blend their colours
   * nor hide each other's median.
   */
  treatment?: "filled" | "outline" | "median";
}

export interface ObservedWindow {
  from: number;
  to: number;
  observed?: number;
  sd?: number;
}

export interface FanChartProps {
  title: string;
  series: FanSeries[];
  /** Axis label with its unit, e.g. "Warming above 1850–1900 (K)". */
  yLabel: string;
  unit: string;
  fromYear?: number;
  toYear?: number;
  /** Shared axes when two charts are compared side by side. */
  yDomain?: [number, number];
  observedWindow?: ObservedWindow | null;
  thresholds?: number[];
  height?: number;
  description?: string;
  /** Decimals in the read-out and the table. */
  digits?: number;
}

const KEYS = ["p5", "p17", "p50", "p83", "p95"] as const;

/** Index range of years within [from, to]. */
function yearWindow(years: number[], from: number, to: number): [number, number] {
  let a = 0;
  while (a < years.length && years[a]! < from) a++;
  let b = years.length - 1;
  while (b > a && years[b]! > to) b--;
  return [a, b + 1];
}

/**
 * Y domain covering every visible band from 0 (warming read from the baseline), padded a
 * little; below zero it stops just under the lowest band rather than at a rounded-out tick.
 */
export function fanYDomain(series: FanSeries[], from = -Infinity, to = Infinity): [number, number] {
  let lo = 0;
  let hi = 0;
  for (const s of series) {
    const [a, b] = yearWindow(s.years, from, to);
    lo = Math.min(lo, min(s.p5.slice(a, b)) ?? 0);
    hi = Math.max(hi, max(s.p95.slice(a, b)) ?? 0);
  }
  return paddedDomain(lo, hi, { includeZero: true });
}

/**
 * Fan chart: per series, a light 5th–95th percentile band, a stronger 17th–83rd band and the solid median,
 * over years. Hover or arrow keys read out the year's percentiles; legend buttons toggle
 * series; an optional shaded window marks the observed period used by a constraint.
 */
export function FanChart({
  title,
  series,
  yLabel,
  unit,
  fromYear,
  toYear,
  yDomain,
  observedWindow,
  thresholds = [],
  height = 360,
  description,
  digits = 2,
}: FanChartProps) {
  const [ref, width] = useChartWidth<HTMLDivElement>();
  const [hidden, setHidden] = useState<Set<string>>(new Set());
  const [hoverYear, setHoverYear] = useState<number | null>(null);
  const m = DEFAULT_MARGINS;
  const { innerWidth, innerHeight } = innerSize(width, height, m);
  const visible = series.filter((s) => !hidden.has(s.id));

  const allYears = series.flatMap((s) => [s.years[0]!, s.years[s.years.length - 1]!]);
  const [minYear, maxYear] = extent(allYears) as [number, number];
  const x0 = Math.max(fromYear ?? minYear, minYear);
  const x1 = Math.min(toYear ?? maxYear, maxYear);

  const x = useMemo(() => scaleLinear().domain([x0, x1]).range([0, innerWidth]), [x0, x1, innerWidth]);
  const y = useMemo(
    // No nice(): rounding the domain out to whole ticks ran the axis a kelvin below the data.
    () =>
      scaleLinear()
        .domain(yDomain ?? fanYDomain(visible.length ? visible : series, x0, x1))
        .range([innerHeight, 0]),
    [yDomain, visible, series, x0, x1, innerHeight],
  );

  const shapes = useMemo(
    () =>
      series.map((s, i) => {
        const [a, b] = yearWindow(s.years, x0, x1);
        const idx = Array.from({ length: b - a }, (_, k) => a + k);
        const band = (lo: number[], hi: number[]) =>
          area<number>()
            .x((k) => x(s.years[k]!))
            .y0((k) => y(lo[k]!))
            .y1((k) => y(hi[k]!))(idx) ?? "";
        const edge = (v: number[]) =>
          line<number>()
            .x((k) => x(s.years[k]!))
            .y((k) => y(v[k]!))(idx) ?? "";
        // Outlined bands are their two edges only (no closing stroke at the first and last year).
        const edges = (lo: number[], hi: number[]) => `${edge(hi)}${edge(lo)}`;
        const outline = s.treatment === "outline";
        return {
          s,
          color: s.color ?? seriesColor(i),
          outer: outline ? edges(s.p5, s.p95) : band(s.p5, s.p95),
          inner: outline ? edges(s.p17, s.p83) : band(s.p17, s.p83),
          median:
            line<number>()
              .x((k) => x(s.years[k]!))
              .y((k) => y(s.p50[k]!))(idx) ?? "",
        };
      }),
    [series, x, y, x0, x1],
  );

  function yearFromPointer(e: PointerEvent<SVGRectElement>) {
    const rect = e.currentTarget.getBoundingClientRect();
    const year = Math.round(x.invert(e.clientX - rect.left));
    setHoverYear(Math.max(x0, Math.min(x1, year)));
  }
  function onKey(e: KeyboardEvent<SVGRectElement>) {
    const step = e.shiftKey ? 10 : 1;
    if (e.key === "ArrowRight") setHoverYear((h) => Math.min(x1, (h ?? x0) + step));
    else if (e.key === "ArrowLeft") setHoverYear((h) => Math.max(x0, (h ?? x1) - step));
    else if (e.key === "Escape") setHoverYear(null);
    else return;
    e.preventDefault();
  }

  // The read-out shows the pointed year, or the last year while nothing is pointed at.
  const readYear = hoverYear ?? x1;
  const readout = shapes
    .filter(({ s }) => !hidden.has(s.id))
    .flatMap(({ s, color }) => {
      const k = s.years.indexOf(readYear);
      return k < 0 ? [] : [{ series: s, color, values: KEYS.map((key) => s[key][k]!) }];
    });
  // Outlined series go on top of filled ones, so their edges and dashed median stay visible.
  const drawOrder = [...shapes].sort(
    (a, b) =>
      Number(a.s.treatment === "outline" || a.s.treatment === "median") - Number(b.s.treatment === "outline" || b.s.treatment === "median"),
  );

  const table = (
    <DataTable
      caption={title}
      columns={["Series", "Year", ...KEYS.map((k) => `${k.slice(1)} % (${unit})`)]}
      rows={series.flatMap((s) =>
        s.years
          .map((yr, k) => ({ yr, k }))
          .filter(({ yr }) => yr >= x0 && yr <= x1 && (yr % 10 === 0 || yr === x1))
          .map(({ yr, k }) => [s.name, yr, ...KEYS.map((key) => s[key][k]!.toFixed(digits))]),
      )}
    />
  );

  return (
    <ChartFrame
      title={title}
      units={unit}
      legend={[
        ...shapes
          .filter(({ s }) => !hidden.has(s.id))
          .map(({ s, color }) =>
            s.treatment === "outline"
              ? { label: `${s.name} (outlined bands, dashed median)`, color, dash: "7 4" }
              : s.treatment === "median"
                ? { label: `${s.name} (median only)`, color }
                : { label: series.length > 1 ? `${s.name} (filled bands)` : s.name, color, kind: "swatch" as const },
          ),
        {
          label: `bands: ${BAND_LABELS.outer} (light), ${BAND_LABELS.inner} (strong); line: ${BAND_LABELS.median}`,
          color: "var(--pl-ink)",
        },
        ...thresholds.map((t, k) => ({ label: `${t} ${unit} threshold`, color: thresholdStyle(k).color, dash: thresholdStyle(k).dash })),
      ]}
      description={
        description ?? `Median line, ${BAND_LABELS.inner} and ${BAND_LABELS.outer} bands. Hover or use arrow keys to read a year.`
      }
      table={table}
    >
      {series.length > 1 && (
        <div className="flex flex-wrap gap-2" role="group" aria-label="Show or hide series">
          {shapes.map(({ s, color }) => (
            <button
              key={s.id}
              type="button"
              aria-pressed={!hidden.has(s.id)}
              onClick={() =>
                setHidden((h) => {
                  const next = new Set(h);
                  if (next.has(s.id)) next.delete(s.id);
                  else next.add(s.id);
                  return next;
                })
              }
              className="flex items-center gap-1.5 rounded-full border border-line px-2.5 py-0.5 text-xs aria-pressed:bg-surface-2 aria-[pressed=false]:opacity-50"
            >
              <LegendSwatch color={color} outline={s.treatment === "outline"} lineOnly={s.treatment === "median"} />
              {s.name}
            </button>
          ))}
        </div>
      )}
      <BandKey />
      <FanReadout year={readYear} pinned={hoverYear !== null} rows={readout} unit={unit} digits={digits} seriesCount={visible.length} />
      <div ref={ref} className="relative w-full">
        <svg width={width} height={height} role="img" aria-label={`${title}: ${yLabel} against year`} className="block overflow-visible">
          <g transform={`translate(${m.left},${m.top})`}>
            {observedWindow && observedWindow.to >= x0 && observedWindow.from <= x1 && (
              <g data-testid="observed-window">
                <rect
                  x={x(Math.max(observedWindow.from, x0))}
                  width={Math.max(1, x(Math.min(observedWindow.to, x1)) - x(Math.max(observedWindow.from, x0)))}
                  y={0}
                  height={innerHeight}
                  fill="var(--pl-accent)"
                  opacity={0.09}
                />
                {observedWindow.observed !== undefined && (
                  <line
                    x1={x(Math.max(observedWindow.from, x0))}
                    x2={x(Math.min(observedWindow.to, x1))}
                    y1={y(observedWindow.observed)}
                    y2={y(observedWindow.observed)}
                    stroke="var(--pl-accent)"
                    strokeWidth={3}
                  />
                )}
                <text x={x(Math.max(observedWindow.from, x0)) - 4} y={12} textAnchor="end" className="fill-accent text-[10px]">
                  observed {observedWindow.from}–{observedWindow.to}
                </text>
              </g>
            )}
            <AxisLeft scale={y} width={innerWidth} label={yLabel} />
            <AxisBottom
              scale={x}
              height={innerHeight}
              width={innerWidth}
              label="Year"
              format={(v) => String(v)}
              ticks={Math.max(2, Math.floor(innerWidth / 80))}
            />
            {thresholds.map((t, k) =>
              t >= y.domain()[0]! && t <= y.domain()[1]! ? (
                <g key={t} data-threshold={t}>
                  <line
                    x2={innerWidth}
                    y1={y(t)}
                    y2={y(t)}
                    stroke={thresholdStyle(k).color}
                    strokeDasharray={thresholdStyle(k).dash}
                    strokeWidth={1.2}
                  />
                  <text x={4} y={y(t) - 4} fill={thresholdStyle(k).color} className="text-[10px] num">
                    {t} {unit}
                  </text>
                </g>
              ) : null,
            )}
            {drawOrder
              .filter(({ s }) => !hidden.has(s.id))
              .map(({ s, color, outer, inner, median }) =>
                s.treatment === "median" ? (
                  <g key={s.id} data-series={s.id} data-treatment="median">
                    <path data-band="p50" d={median} fill="none" stroke={color} strokeWidth={2} />
                  </g>
                ) : s.treatment === "outline" ? (
                  <g key={s.id} data-series={s.id} data-treatment="outline">
                    <path data-band="p5-p95" d={outer} fill="none" stroke={color} strokeWidth={1} strokeDasharray="2 3" />
                    <path data-band="p17-p83" d={inner} fill="none" stroke={color} strokeWidth={1.5} />
                    <path data-band="p50" d={median} fill="none" stroke={color} strokeWidth={2.5} strokeDasharray="7 4" />
                  </g>
                ) : (
                  <g key={s.id} data-series={s.id} data-treatment="filled">
                    <path data-band="p5-p95" d={outer} fill={color} fillOpacity={0.16} />
                    <path data-band="p17-p83" d={inner} fill={color} fillOpacity={0.32} />
                    <path data-band="p50" d={median} fill="none" stroke={color} strokeWidth={2} />
                  </g>
                ),
              )}
            {hoverYear !== null && <line x1={x(hoverYear)} x2={x(hoverYear)} y2={innerHeight} stroke="var(--pl-ink)" strokeOpacity={0.4} />}
            <rect
              width={innerWidth}
              height={innerHeight}
              fill="transparent"
              tabIndex={0}
              aria-label="Chart read-out: use left and right arrow keys to move through years"
              onPointerMove={yearFromPointer}
              onPointerLeave={() => setHoverYear(null)}
              onKeyDown={onKey}
              onBlur={() => setHoverYear(null)}
            />
          </g>
        </svg>
      </div>
    </ChartFrame>
  );
}

/** Legend key: a tinted square with a solid line (filled), or an outlined square with a dashed line (outline). */
function LegendSwatch({ color, outline, lineOnly = false }: { color: string; outline: boolean; lineOnly?: boolean }) {
  if (lineOnly)
    return (
      <svg aria-hidden width={22} height={12} className="shrink-0">
        <line x1={2} x2={20} y1={6} y2={6} stroke={color} strokeWidth={2} />
      </svg>
    );
  return (
    <svg aria-hidden width={22} height={12} className="shrink-0">
      <rect
        x={1}
        y={1}
        width={20}
        height={10}
        rx={2}
        fill={outline ? "none" : color}
        fillOpacity={0.3}
        stroke={outline ? color : "none"}
        strokeWidth={1.2}
      />
      <line x1={2} x2={20} y1={6} y2={6} stroke={color} strokeWidth={2} strokeDasharray={outline ? "4 2" : undefined} />
    </svg>
  );
}
