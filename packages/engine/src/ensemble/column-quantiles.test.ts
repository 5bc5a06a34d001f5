import { describe, expect, it } from "vitest";
import { quantileOf, type Distribution } from "../distributions/index.js";
import { columnQuantiles } from "./column-quantiles.js";

// The reference is the distribution module's own quantile (itself checked against SciPy in
// distributions/*.test.ts): the column path must give the very same doubles.
const LAWS: Distribution[] = [
  { type: "normal", mean: 3.93, sd: 0.24 },
  { type: "lognormal", median: 3, logSd: 0.3039 },
  { type: "truncated-normal", mean: 8, sd: 1, min: 3, max: 58 },
  { type: "truncated-normal", mean: 1.2, sd: 0.2, min: 0.5, max: 1.3 },
  { type: "truncated-normal", mean: 0, sd: 1, min: 2, max: 40 },
  { type: "truncated-normal", mean: 0, sd: 1, min: -40, max: -1 },
  { type: "uniform", min: 2, max: 4 },
  { type: "triangular", min: -0.01, mode: 0.015, max: 0.04 },
  { type: "range", p50: 0.07, low: 0.05, high: 0.09, coverage: 90, shape: "split-normal" },
  { type: "fixed", value: 3.71 },
];

describe("columnQuantiles", () => {
  it("equals quantileOf member by member, tails included", () => {
    const u = new Float64Array([1e-300, 1e-12, 0.001, 0.025, 0.17, 0.5, 0.5000001, 0.83, 0.975, 0.999, 1 - 1e-12]);
    for (const d of LAWS) {
      const out = new Float64Array(u.length);
      columnQuantiles(d, u, out);
      u.forEach((p, i) => expect(out[i], `${d.type} at p = ${p}`).toBe(quantileOf(d, p)));
    }
  });
});
