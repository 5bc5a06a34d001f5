import { PercentileSelector } from "../summary/percentile-selector.js";
import type { PercentileSet } from "../spec/types.js";

/** Result key of a percentile: "p" + the percentile as asked (5 -> "p5", 2.5 -> "p2.5"). */
export function percentileKey(percentile: number): string {
  return `p${percentile}`;
}

/**
 * Percentiles (R-7, weighted when weights are given) of values[0..n) keyed "p5", "p17", …
 * Cost O(n) via PercentileSelector.
 */
export function percentileSet(
  selector: PercentileSelector,
  values: Float64Array,
  percentiles: number[],
  weights: Float64Array | null,
  totalWeight: number,
): PercentileSet {
  const n = values.length;
  let min = values[0]!;
  let max = min;
  for (let m = 1; m < n; m++) {
    const v = values[m]!;
    if (v < min) min = v;
    else if (v > max) max = v;
  }
  const out = new Float64Array(percentiles.length);
  selector.select(values, n, percentiles.map((p) => p / 100), out, min, max, weights, totalWeight);
  const set: PercentileSet = {};
  percentiles.forEach((p, j) => (set[percentileKey(p)] = out[j]!));
  return set;
}
