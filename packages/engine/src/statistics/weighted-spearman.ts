/**
 * Weighted mid-ranks of values, scaled to (0, 1): member m gets the weight of the members
 * below it plus half the weight of those tied with it (itself included), over the total.
 * Unweighted, these are (mid-rank − 1/2)/n, an affine map of the usual mid-ranks, so their
 * Pearson correlation is Spearman's. `order` lists the members sorted by value.
 * Cost O(n). Reference: the weighted Spearman coefficient as the weighted Pearson
 * correlation of weighted ranks (Bailey & Emad, R package wCorr, 2017 — from memory).
 * `out`: where to write them (every element is written, since order lists every member once),
 * so a caller ranking many columns in turn can reuse one O(n) array.
 */
export function weightedMidRanks(
  values: ArrayLike<number>,
  order: ArrayLike<number>,
  weights: ArrayLike<number> | null,
  totalWeight: number,
  out: Float64Array = new Float64Array(order.length),
): Float64Array {
  const n = order.length;
  if (out.length !== n) throw new RangeError(`out must hold ${n} ranks, not ${out.length}`);
  let before = 0;
  let start = 0;
  while (start < n) {
    let end = start;
    const value = values[order[start]!]!;
    let tied = weights ? weights[order[start]!]! : 1;
    while (end + 1 < n && values[order[end + 1]!]! === value) {
      end++;
      tied += weights ? weights[order[end]!]! : 1;
    }
    const rank = (before + tied / 2) / totalWeight;
    for (let k = start; k <= end; k++) out[order[k]!] = rank;
    before += tied;
    start = end + 1;
  }
  return out;
}

/**
 * Weighted Pearson correlation of x and y (weights null: plain Pearson). Returns 0 when
 * either has no (weighted) variance, so a budget never holds NaN. Cost O(n).
 */
export function weightedCorrelation(x: ArrayLike<number>, y: ArrayLike<number>, weights: ArrayLike<number> | null, totalWeight: number): number {
  const n = x.length;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    const w = weights ? weights[i]! : 1;
    mx += w * x[i]!;
    my += w * y[i]!;
  }
  mx /= totalWeight;
  my /= totalWeight;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const w = weights ? weights[i]! : 1;
    const dx = x[i]! - mx;
    const dy = y[i]! - my;
    sxy += w * dx * dy;
    sxx += w * dx * dx;
    syy += w * dy * dy;
  }
  if (!(sxx > 0) || !(syy > 0)) return 0;
  return Math.max(-1, Math.min(1, sxy / Math.sqrt(sxx * syy)));
}
