/**
 * Where the k-th smallest member (0-based) sits on the [0, 1] probability scale of a weighted
 * ensemble, for the weighted analogue of R type 7: S_k = k·w_k + (n − 1)·C_k, normalised by
 * S_n = (n − 1)·W, where C_k is the weight of the k members below it and W the total
 * (the "C = 1" weighted percentile; with equal weights S_k/S_n = k/(n − 1), exactly type 7).
 * Percentiles interpolate linearly between consecutive positions. Positions never decrease
 * with k, because S_{k+1} − S_k = (k+1)·w_{k+1} + (n−1−k)·w_k ≥ 0.
 *
 * Example: n = 4 equal weights, k = 2 -> 2/3.
 */
export function weightedPosition(k: number, weightBelow: number, weight: number, n: number, totalWeight: number): number {
  return (k * weight + (n - 1) * weightBelow) / ((n - 1) * totalWeight);
}
