/**
 * Ranks 1 … n of the values, tied values sharing the average of the ranks they span
 * (mid-ranks), in the order of the input.
 *
 * Method: sort member indices by value, then sweep runs of equal values. Cost O(n log n)
 * time, one index array and the result. NaN is rejected (it has no rank).
 * Reference: standard (Spearman's rho is defined on mid-ranks; Kendall & Gibbons, Rank
 * Correlation Methods, 5th ed., ch. 3).
 *
 * Example: `ranks([10, 30, 20, 20])` → Float64Array [1, 4, 2.5, 2.5].
 */
export function ranks(values: ArrayLike<number>): Float64Array {
  const n = values.length;
  const order = new Uint32Array(n);
  for (let i = 0; i < n; i++) {
    const value = values[i]!;
    if (typeof value !== "number" || Number.isNaN(value)) throw new RangeError(`values[${i}] must be a number`);
    order[i] = i;
  }
  order.sort((a, b) => values[a]! - values[b]! || a - b);
  const result = new Float64Array(n);
  let start = 0;
  while (start < n) {
    let end = start;
    const value = values[order[start]!]!;
    while (end + 1 < n && values[order[end + 1]!]! === value) end++;
    const midRank = (start + end) / 2 + 1;
    for (let k = start; k <= end; k++) result[order[k]!] = midRank;
    start = end + 1;
  }
  return result;
}

/**
 * Spearman's rank correlation: the Pearson correlation of the mid-ranks of x and y.
 *
 * A constant series has no rank variance; then 0 is returned (no monotone association — the
 * sensitivity budget reads a fixed input as driving none of the spread) instead of NaN.
 * Cost O(n log n). Reference: C. Spearman (1904), Am. J. Psychol. 15, 72–101; matches
 * simple-statistics `sampleRankCorrelation` where that is defined.
 *
 * Example: `spearman([1, 2, 3, 4, 5], [1, 4, 9, 16, 25])` → 1.
 */
export function spearman(x: ArrayLike<number>, y: ArrayLike<number>): number {
  if (x.length !== y.length) throw new RangeError("x and y must have the same length");
  if (x.length < 2) throw new RangeError("x must have at least 2 values");
  const rx = ranks(x);
  const ry = ranks(y);
  // Both rank vectors have mean (n + 1)/2.
  const mean = (x.length + 1) / 2;
  let cross = 0;
  let xx = 0;
  let yy = 0;
  for (let i = 0; i < rx.length; i++) {
    const dx = rx[i]! - mean;
    const dy = ry[i]! - mean;
    cross += dx * dy;
    xx += dx * dx;
    yy += dy * dy;
  }
  if (xx === 0 || yy === 0) return 0;
  return cross / Math.sqrt(xx * yy);
}
