/**
 * Quantile of sorted numbers by linear interpolation between order statistics: R type 7,
 * the default of R's `quantile`, NumPy's `percentile` and d3's `quantileSorted`.
 *
 * Definition: with h = (n − 1)·p and k = ⌊h⌋, Q(p) = x[k] + (h − k)·(x[k+1] − x[k]);
 * Q(0) = min, Q(1) = max. `sorted` must be in ascending order (not checked: O(1) cost).
 * Cost O(1). Reference: R. J. Hyndman, Y. Fan (1996), "Sample quantiles in statistical
 * packages", The American Statistician 50(4), 361–365 (definition 7).
 *
 * Example: `quantileSorted([1, 2, 3, 4], 0.5)` → 2.5.
 */
export function quantileSorted(sorted: ArrayLike<number>, p: number): number {
  const n = sorted.length;
  if (n === 0) throw new RangeError("sorted must not be empty");
  if (typeof p !== "number" || !(p >= 0 && p <= 1)) throw new RangeError("p must be in [0, 1]");
  if (p === 0 || n === 1) return sorted[0]!;
  if (p === 1) return sorted[n - 1]!;
  const h = (n - 1) * p;
  const k = Math.floor(h);
  const lower = sorted[k]!;
  const upper = sorted[k + 1]!;
  return lower + (upper - lower) * (h - k);
}
