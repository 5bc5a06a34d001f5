import type { Distribution, DistributionType } from "@plumeline/contracts";
import { quantileOf } from "@plumeline/engine";

/** Parameters each distribution type takes, in the order the editor shows them. */
export const DISTRIBUTION_FIELDS: Record<DistributionType, Array<{ key: string; label: string }>> = {
  fixed: [{ key: "value", label: "Value" }],
  normal: [
    { key: "mean", label: "Mean" },
    { key: "sd", label: "Standard deviation" },
  ],
  lognormal: [
    { key: "median", label: "Median" },
    { key: "logSd", label: "Log-space sd" },
  ],
  uniform: [
    { key: "min", label: "Min" },
    { key: "max", label: "Max" },
  ],
  triangular: [
    { key: "min", label: "Min" },
    { key: "mode", label: "Mode" },
    { key: "max", label: "Max" },
  ],
  "truncated-normal": [
    { key: "mean", label: "Mean" },
    { key: "sd", label: "Sd" },
    { key: "min", label: "Min" },
    { key: "max", label: "Max" },
  ],
  range: [
    { key: "low", label: "Low end" },
    { key: "p50", label: "Median" },
    { key: "high", label: "High end" },
  ],
};

export const DISTRIBUTION_TYPE_LABELS: Record<DistributionType, string> = {
  range: "From a published range",
  fixed: "Fixed value",
  normal: "Normal",
  lognormal: "Lognormal",
  uniform: "Uniform",
  triangular: "Triangular",
  "truncated-normal": "Truncated normal",
};

const r4 = (v: number) => Math.round(v * 1e4) / 1e4;

/**
 * A distribution of another type with about the same centre and spread as `from`, so
 * switching type in the editor keeps the user's numbers meaningful.
 */
export function convertDistribution(from: Distribution, to: DistributionType): Distribution {
  const q5 = quantileOf(from, 0.05);
  const q50 = quantileOf(from, 0.5);
  const q95 = quantileOf(from, 0.95);
  const spread = q95 - q5 || Math.abs(q50) * 0.2 || 1;
  switch (to) {
    case "fixed":
      return { type: "fixed", value: r4(q50) };
    case "normal":
      return { type: "normal", mean: r4(q50), sd: r4(spread / 3.29) };
    case "lognormal":
      return q50 > 0 && q95 > q50 ? { type: "lognormal", median: r4(q50), logSd: r4(Math.log(q95 / q50) / 1.645) } : { type: "lognormal", median: Math.abs(r4(q50)) || 1, logSd: 0.3 };
    case "uniform":
      return { type: "uniform", min: r4(q5), max: r4(q95 > q5 ? q95 : q5 + 1) };
    case "triangular":
      return { type: "triangular", min: r4(q5), mode: r4(q50), max: r4(q95 > q5 ? q95 : q5 + 1) };
    case "truncated-normal":
      return { type: "truncated-normal", mean: r4(q50), sd: r4(spread / 3.29), min: r4(q50 - spread), max: r4(q50 + spread) };
    case "range":
      return {
        type: "range",
        p50: r4(q50),
        low: r4(q5 < q50 ? q5 : q50 - spread / 2),
        high: r4(q95 > q50 ? q95 : q50 + spread / 2),
        coverage: 90,
        shape: q5 > 0 ? "lognormal" : "split-normal",
      };
  }
}
