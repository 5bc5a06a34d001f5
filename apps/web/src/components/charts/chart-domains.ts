/**
 * Where a chart's axes start and end: where the data starts and ends. A probability that is
 * zero for a century, or a rounded-out axis that runs a whole kelvin below the lowest band,
 * spends the reader's width and height on nothing.
 */

/**
 * A value axis around [lo, hi] with a small margin (`pad` of the span on each side). With
 * `includeZero` a positive range starts at 0 (warming read from the baseline), but a range
 * that dips below zero stops just under its lowest value, never at a rounded-out tick.
 */
export function paddedDomain(
  lo: number,
  hi: number,
  { includeZero = false, pad = 0.04 }: { includeZero?: boolean; pad?: number } = {},
): [number, number] {
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) throw new RangeError(`paddedDomain needs finite bounds, got [${lo}, ${hi}]`);
  const a = includeZero ? Math.min(lo, 0) : lo;
  const b = includeZero ? Math.max(hi, 0) : hi;
  const margin = (b - a) * pad || (b !== 0 ? Math.abs(b) * pad : 0.5);
  return [a < 0 || !includeZero ? a - margin : 0, b + margin];
}

/**
 * The index the year axis starts at: `margin` years before the first year any series rises
 * above `floor` (a 0.05 % chance reads as 0.0 %), rounded down to a decade, and never before
 * `fromIndex`. A chart whose series never leave zero keeps its whole span.
 */
export function firstActiveIndex(
  years: number[],
  series: number[][],
  fromIndex = 0,
  { floor = 0.0005, margin = 10 }: { floor?: number; margin?: number } = {},
): number {
  let first = -1;
  for (let k = Math.max(0, fromIndex); k < years.length && first < 0; k++) if (series.some((s) => (s[k] ?? 0) > floor)) first = k;
  if (first < 0) return Math.max(0, fromIndex);
  const startYear = Math.floor((years[first]! - margin) / 10) * 10;
  let k = first;
  while (k > fromIndex && years[k - 1]! >= startYear) k--;
  return k;
}
