import { orderStatisticInterval } from "../statistics/index.js";
import type { PercentileSelector } from "../summary/percentile-selector.js";
import { percentileKey } from "./percentile-set.js";

/**
 * Monte Carlo precision of each reported percentile: the distribution-free 95 % interval
 * [X(r), X(s)] of order statistics that covers the true percentile with probability ≥ 95 %
 * (binomial argument; Conover, Practical Nonparametric Statistics, 3rd ed., Section 3.2). With
 * constraint weights the interval uses Kish's effective size in place of n and reads the
 * weighted percentiles at r/n_eff and s/n_eff — an approximation only, since weighted draws are not i.i.d. order statistics.
 * null when the ensemble is too small for a 95 % interval.
 */
export function percentilePrecision(
  selector: PercentileSelector,
  values: Float64Array,
  percentiles: number[],
  weights: Float64Array | null,
  totalWeight: number,
  effectiveMembers: number,
): Record<string, [number, number] | null> {
  const n = values.length;
  let min = values[0]!;
  let max = min;
  for (let m = 1; m < n; m++) {
    const v = values[m]!;
    if (v < min) min = v;
    else if (v > max) max = v;
  }
  const result: Record<string, [number, number] | null> = {};
  for (const percentile of percentiles) {
    const key = percentileKey(percentile);
    if (!weights) {
      const interval = orderStatisticInterval(n, percentile / 100, 0.95);
      if (!interval) {
        result[key] = null;
        continue;
      }
      const out = new Float64Array(2);
      selector.orderStatistics(values, n, [interval.lower - 1, interval.upper - 1], out, min, max);
      result[key] = [out[0]!, out[1]!];
      continue;
    }
    const effective = Math.floor(effectiveMembers);
    const interval = effective >= 2 ? orderStatisticInterval(effective, percentile / 100, 0.95) : null;
    if (!interval) {
      result[key] = null;
      continue;
    }
    const out = new Float64Array(2);
    const probs = [(interval.lower - 1) / (effective - 1), (interval.upper - 1) / (effective - 1)];
    selector.select(values, n, probs, out, min, max, weights, totalWeight);
    result[key] = [out[0]!, out[1]!];
  }
  return result;
}
