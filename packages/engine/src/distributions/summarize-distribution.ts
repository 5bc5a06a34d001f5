import { quantileOf } from "./evaluate-distribution.js";
import type { Distribution } from "./types.js";
import { validateDistribution } from "./validate-distribution.js";

/**
 * Percentiles of a distribution for editor previews and model-version diffs.
 *
 * Method: quantileOf at each percentile/100; keys are "p" + the percentile as written
 * ("p5", "p17", "p50", …). Percentiles must lie strictly between 0 and 100. Cost O(k).
 *
 * Example: `summarizeDistribution({ type: "lognormal", median: 3, logSd: 0.27853 })`
 * → { p5: 1.8974…, p17: 2.2999…, p50: 3, p83: 3.9133…, p95: 4.7434… } (exp(ln 3 + 0.27853·z_p), computed).
 */
export function summarizeDistribution(
  d: Distribution,
  percentiles: readonly number[] = [5, 17, 50, 83, 95],
): Record<string, number> {
  validateDistribution(d, "distribution");
  const summary: Record<string, number> = {};
  percentiles.forEach((percentile, index) => {
    if (typeof percentile !== "number" || !(percentile > 0 && percentile < 100))
      throw new RangeError(`percentiles[${index}] must be in (0, 100)`);
    summary[`p${percentile}`] = quantileOf(d, percentile / 100);
  });
  return summary;
}
