/**
 * Puts series that start in different years or run for different lengths on one shared year
 * axis (the union of their years); a year a series lacks holds NaN, which the line chart
 * leaves as a gap rather than drawing a false value.
 */
export function alignOnYears(series: ReadonlyArray<{ startYear: number; values: readonly number[] }>): {
  years: number[];
  values: number[][];
} {
  const first = Math.min(...series.map((s) => s.startYear));
  const last = Math.max(...series.map((s) => s.startYear + s.values.length - 1));
  if (!Number.isFinite(first) || last < first) return { years: [], values: series.map(() => []) };
  const years = Array.from({ length: last - first + 1 }, (_, i) => first + i);
  return { years, values: series.map((s) => years.map((y) => s.values[y - s.startYear] ?? NaN)) };
}
