import type { PercentileSelector } from "../summary/percentile-selector.js";
import { percentileKey } from "./percentile-set.js";

/**
 * Distribution of the first year each member's anomaly exceeds a threshold (strictly; the
 * crossing rule of advance-year.ts), over the pathway years. Members that never cross sit
 * above every year (as year index `years`), so percentiles are R-7 (weighted with a
 * constraint) over all members; a percentile that reaches into the never-crossing members
 * is null. `never` is the (weighted) share of members that never cross.
 * Example: 4 members crossing in 2030, 2040, never, never -> p50 null, never 0.5.
 */
export function crossingSummary(
  selector: PercentileSelector,
  crossingIndex: Float64Array,
  startYear: number,
  years: number,
  percentiles: number[],
  weights: Float64Array | null,
  totalWeight: number,
  values: Float64Array = new Float64Array(crossingIndex.length),
): Record<string, number | null> {
  const n = crossingIndex.length;
  if (values.length !== n) throw new RangeError(`values must hold ${n} members, not ${values.length}`);
  let never = 0;
  for (let m = 0; m < n; m++) {
    const t = crossingIndex[m]!;
    if (t < 0) {
      values[m] = years;
      never += weights ? weights[m]! : 1;
    } else values[m] = t;
  }
  let min = values[0]!;
  let max = min;
  for (let m = 1; m < n; m++) {
    const v = values[m]!;
    if (v < min) min = v;
    else if (v > max) max = v;
  }
  const out = new Float64Array(percentiles.length);
  selector.select(values, n, percentiles.map((p) => p / 100), out, min, max, weights, totalWeight);
  const result: Record<string, number | null> = {};
  percentiles.forEach((p, j) => {
    const t = out[j]!;
    result[percentileKey(p)] = t > years - 1 ? null : startYear + t;
  });
  result.never = weights ? never / totalWeight : never / n;
  return result;
}

/**
 * Histogram of first-crossing years: for each pathway year, the (weighted) share of members
 * whose anomaly first exceeds the threshold in that year (the crossing rule of
 * advance-year.ts). The shares plus `never` of crossingSummary add up to 1. O(members).
 * Example: 4 members crossing at year indices 0, 0, 2 and never, 3 years -> [0.5, 0, 0.25].
 */
export function crossingShareByYear(
  crossingIndex: Float64Array,
  years: number,
  weights: Float64Array | null,
  totalWeight: number,
): number[] {
  const share = new Float64Array(years);
  const n = crossingIndex.length;
  for (let m = 0; m < n; m++) {
    const t = crossingIndex[m]!;
    if (t >= 0) share[t] = share[t]! + (weights ? weights[m]! : 1);
  }
  const total = weights ? totalWeight : n;
  return Array.from(share, (w) => w / total);
}
