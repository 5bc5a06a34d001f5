import { BAND_SHORT_LABELS } from "./band-labels";
import type { FanSeries } from "./fan-chart";

export interface FanReadoutRow {
  series: FanSeries;
  color: string;
  /** p5, p17, p50, p83, p95 at the year read. */
  values: number[];
}

/**
 * The fan chart's read-out of one year's percentiles, drawn above the plot rather than over
 * it, so it never hides bands, threshold labels or the observed window. It holds one line
 * per series and keeps its height whether or not the pointer is on the chart, so nothing
 * jumps while reading.
 */
export function FanReadout({
  year,
  pinned,
  rows,
  unit,
  digits,
  seriesCount,
}: {
  year: number;
  /** True while the user points at a year (hover or keys); false shows the last year. */
  pinned: boolean;
  rows: FanReadoutRow[];
  unit: string;
  digits: number;
  seriesCount: number;
}) {
  const f = (v: number) => v.toFixed(digits);
  const named = seriesCount > 1;
  return (
    <div role="status" className="rounded-md border border-line bg-surface-2/60 px-3 py-1.5 text-xs" style={{ minHeight: `${1.5 + 1.25 * seriesCount}rem` }}>
      <p>
        <span className="num font-semibold text-ink">{year}</span>{" "}
        <span className="text-muted">{pinned ? "" : "(last year shown: hover or use the arrow keys on the chart to read another)"}</span>
      </p>
      {/* One grid for all series, so the numbers line up in columns. */}
      <div className="grid items-center gap-x-4 gap-y-0.5" style={{ gridTemplateColumns: named ? "minmax(0,max-content) repeat(3, max-content)" : "repeat(3, max-content)" }}>
        {rows.map(({ series, color, values }) => (
          <div key={series.id} className="num contents text-muted">
            {named && (
              <span className="flex min-w-0 items-center gap-1.5 font-sans font-medium text-text">
                <span aria-hidden className="h-2 w-2 shrink-0 rounded-full" style={{ background: color }} />
                <span className="truncate">{series.name}</span>
              </span>
            )}
            <span className="num text-muted">
              median <span className="text-text">{f(values[2]!)}</span> {unit}
            </span>
            <span className="num text-muted">
              {BAND_SHORT_LABELS.inner} <span className="text-text">{f(values[1]!)}–{f(values[3]!)}</span>
            </span>
            <span className="num text-muted">
              {BAND_SHORT_LABELS.outer} <span className="text-text">{f(values[0]!)}–{f(values[4]!)}</span>
            </span>
          </div>
        ))}
      </div>
    </div>
  );
}
