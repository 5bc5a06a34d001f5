import { PercentileSelector } from "../summary/percentile-selector.js";
import type { PerilSummary } from "./types.js";

/**
 * Percentiles and mean of one uncertain peril output over the members: keys "p" + the
 * percentile as written (p5, p17, p50, …) plus "mean". Percentiles are R type 7 (linear
 * between order statistics), weighted by the constraint weights when given, through the
 * runner's exact PercentileSelector, so they follow the same definition as the warming
 * percentiles. The mean is Σ w·v / Σ w. Cost O(n).
 *
 * Example: summariseValues([1, 2, 3, 4], null, [50], selector) → { p50: 2.5, mean: 2.5 }.
 */
export function summariseValues(
  values: Float64Array,
  weights: Float64Array | null,
  percentiles: readonly number[],
  selector: PercentileSelector,
): PerilSummary {
  const n = values.length;
  if (n === 0) throw new RangeError("values must not be empty");
  let min = Infinity;
  let max = -Infinity;
  let sum = 0;
  let totalWeight = 0;
  for (let i = 0; i < n; i++) {
    const v = values[i]!;
    if (v < min) min = v;
    if (v > max) max = v;
    const w = weights ? weights[i]! : 1;
    sum += w * v;
    totalWeight += w;
  }
  const probs = percentiles.map((p) => p / 100);
  const out = new Float64Array(probs.length);
  selector.select(values, n, probs, out, min, max, weights, totalWeight);
  const summary: PerilSummary = {};
  percentiles.forEach((p, k) => {
    summary[`p${p}`] = out[k]!;
  });
  summary.mean = sum / totalWeight;
  return summary;
}
