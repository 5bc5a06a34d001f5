/**
 * Plotting position of a member of a weighted ensemble, the rule of the statistics module's
 * weightedQuantileSorted (statistics/weighted-quantile.ts): members of zero weight are
 * dropped; with C the cumulative weight up to and including the member, w its weight, w̄ the
 * mean positive weight and W the total, S = (C − (w + w̄)/2) / (W − w̄). With equal weights
 * S_k = k/(m − 1), exactly R type 7. Percentiles interpolate linearly between the members
 * whose positions bracket p. Positions increase strictly with C.
 *
 * Example: weights [1, 2, 1] -> positions −1/16, 1/2, 17/16.
 */
export function weightedPosition(cumulativeWeight: number, weight: number, meanWeight: number, span: number): number {
  return (cumulativeWeight - (weight + meanWeight) / 2) / span;
}
