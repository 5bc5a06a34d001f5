/**
 * Weighted quantile of sorted values with linear interpolation; with equal weights it is
 * exactly R type 7 (the engine's unweighted percentile rule).
 *
 * Definition. Drop members of zero weight (so they cannot shift the result); let the
 * remaining m members have weights w_k, cumulative weight C_k (inclusive), total W and mean
 * weight w̄ = W/m. Member k sits at the plotting position
 *   S_k = (C_k − (w_k + w̄)/2) / (W − w̄),
 * and Q(p) interpolates linearly between the members whose positions bracket p; Q(p) is the
 * smallest value for p ≤ S_first and the largest for p ≥ S_last.
 * Why this form: with equal weights C_k = (k+1)w̄ and S_k = k/(m − 1), the type-7 positions;
 * the positions are strictly increasing; a heavy member spreads over a wide stretch of p
 * (its neighbours sit (w_k + w_next)/2 apart); the rule is symmetric — reversing the order
 * maps S_k to 1 − S_k — and unchanged when all weights are scaled.
 * One member of positive weight gives its value for every p.
 * Cost O(n) time, no allocation. Use weightedQuantilesSorted for several p in one pass.
 * Reference: type 7 of Hyndman & Fan (1996), The American Statistician 50(4), 361–365,
 * generalised as above (our definition).
 *
 * Example: `weightedQuantileSorted([1, 2, 3], [1, 2, 1], 0.25)` → 1.5556 (positions −1/16,
 * 1/2, 17/16); with weights [1, 1, 1] it is quantileSorted([1, 2, 3], 0.25) = 1.5.
 */
export function weightedQuantileSorted(
  sortedValues: ArrayLike<number>,
  weightsInSameOrder: ArrayLike<number>,
  p: number,
): number {
  const result = weightedQuantilesSorted(sortedValues, weightsInSameOrder, [p]);
  return result[0]!;
}

/**
 * Several weighted quantiles (definition of weightedQuantileSorted) in one pass over the
 * members. Returns them in the order of `ps`. Cost O(n + k log k) for k probabilities.
 *
 * Example: `weightedQuantilesSorted([1, 2, 3, 4], [1, 1, 1, 1], [0, 0.5, 1])` → Float64Array [1, 2.5, 4].
 */
export function weightedQuantilesSorted(
  sortedValues: ArrayLike<number>,
  weightsInSameOrder: ArrayLike<number>,
  ps: ArrayLike<number>,
): Float64Array {
  const n = sortedValues.length;
  if (n === 0) throw new RangeError("sortedValues must not be empty");
  if (weightsInSameOrder.length !== n) throw new RangeError("weightsInSameOrder must have as many entries as sortedValues");
  const order = Array.from({ length: ps.length }, (_, i) => i);
  for (const i of order) {
    const p = ps[i]!;
    if (typeof p !== "number" || !(p >= 0 && p <= 1)) throw new RangeError(ps.length === 1 ? "p must be in [0, 1]" : `ps[${i}] must be in [0, 1]`);
  }
  order.sort((a, b) => ps[a]! - ps[b]!);

  let total = 0;
  let positive = 0;
  let lastPositive = -1;
  for (let k = 0; k < n; k++) {
    const w = weightsInSameOrder[k]!;
    if (!(w >= 0) || w === Infinity) throw new RangeError(`weightsInSameOrder[${k}] must be a finite number ≥ 0`);
    if (w > 0) {
      total += w;
      positive++;
      lastPositive = k;
    }
  }
  if (positive === 0) throw new RangeError("weightsInSameOrder must have a positive sum");

  const out = new Float64Array(ps.length);
  if (positive === 1) return out.fill(sortedValues[lastPositive]!);

  const meanWeight = total / positive;
  const span = total - meanWeight;
  let next = 0; // index into `order` of the next probability to answer
  let cumulative = 0;
  let previousPosition = -Infinity;
  let previousValue = Number.NaN;
  for (let k = 0; k < n && next < order.length; k++) {
    const w = weightsInSameOrder[k]!;
    if (w === 0) continue;
    cumulative += w;
    const position = (cumulative - (w + meanWeight) / 2) / span;
    const value = sortedValues[k]!;
    while (next < order.length && ps[order[next]!]! <= position) {
      const p = ps[order[next]!]!;
      out[order[next]!] =
        previousPosition === -Infinity ? value : previousValue + ((p - previousPosition) / (position - previousPosition)) * (value - previousValue);
      next++;
    }
    previousPosition = position;
    previousValue = value;
  }
  // Probabilities beyond the last position take the largest value of positive weight.
  for (; next < order.length; next++) out[order[next]!] = sortedValues[lastPositive]!;
  return out;
}
