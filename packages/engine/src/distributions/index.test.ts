import { describe, expect, it } from "vitest";
import { createRandom } from "../random/create-random.js";
import {
  cdfOf,
  densityCurve,
  densityOf,
  type Distribution,
  quantileOf,
  quantilesOf,
  sampleOf,
  summarizeDistribution,
  validateDistribution,
} from "./index.js";

const EVERY_KIND: Distribution[] = [
  { type: "normal", mean: 3, sd: 0.5 },
  { type: "lognormal", median: 3, logSd: 0.27853 },
  { type: "uniform", min: 2, max: 4 },
  { type: "triangular", min: 1.5, mode: 2.5, max: 6 },
  { type: "truncated-normal", mean: 0.73, sd: 0.2, min: 0.1, max: 2 },
  { type: "range", p50: 3, low: 2, high: 5, coverage: 90, shape: "lognormal" },
  { type: "range", p50: -1.1, low: -1.7, high: -0.4, coverage: 90, shape: "split-normal" },
];

describe("quantileOf / cdfOf / densityOf", () => {
  it.each(EVERY_KIND)("are mutually consistent for %o", (d) => {
    for (const p of [0.01, 0.17, 0.5, 0.83, 0.99]) expect(cdfOf(d, quantileOf(d, p))).toBeCloseTo(p, 12);
    // Density = slope of the CDF (central difference) away from kinks.
    const x = quantileOf(d, 0.7);
    const h = 1e-6;
    expect((cdfOf(d, x + h) - cdfOf(d, x - h)) / (2 * h)).toBeCloseTo(densityOf(d, x), 5);
  });

  it("returns a fixed value for any p, with density 0", () => {
    const d: Distribution = { type: "fixed", value: 1.07 };
    expect(quantileOf(d, 0.3)).toBe(1.07);
    expect(densityOf(d, 1.07)).toBe(0);
    expect(cdfOf(d, 1.07)).toBe(1);
  });

  it("rejects p outside the open interval and a NaN x", () => {
    const d: Distribution = { type: "normal", mean: 0, sd: 1 };
    expect(() => quantileOf(d, 0)).toThrow("p must be in (0, 1)");
    expect(() => quantileOf(d, 1)).toThrow("p must be in (0, 1)");
    expect(() => quantileOf(d, Number.NaN)).toThrow("p must be in (0, 1)");
    expect(() => cdfOf(d, Number.NaN)).toThrow("x must be a number");
    expect(() => densityOf(d, Number.NaN)).toThrow("x must be a number");
  });
});

describe("sampleOf", () => {
  it("is quantileOf(d, random()) and repeats for a fixed seed", () => {
    const d: Distribution = { type: "normal", mean: 3, sd: 0.5 };
    // First uniform of createRandom("plumeline") is 0.4040036548661512 (see create-random.test.ts);
    // 3 + 0.5·Φ⁻¹(0.4040036548661512) = 2.8785012342520284 [computed, SciPy norm.ppf].
    expect(sampleOf(d, createRandom("plumeline"))).toBeCloseTo(2.8785012342520284, 14);
  });

  it("draws a normal whose sample mean and sd match within sampling error", () => {
    const d: Distribution = { type: "normal", mean: 3, sd: 0.5 };
    const random = createRandom("normal-moments");
    const n = 50_000;
    let sum = 0;
    let sumSquares = 0;
    for (let i = 0; i < n; i++) {
      const x = sampleOf(d, random);
      sum += x;
      sumSquares += x * x;
    }
    const mean = sum / n;
    const sd = Math.sqrt(sumSquares / n - mean * mean);
    // Standard errors: sd/√n = 0.0022 for the mean, sd/√(2n) = 0.0016 for the sd; allow 4 each.
    expect(Math.abs(mean - 3)).toBeLessThan(4 * (0.5 / Math.sqrt(n)));
    expect(Math.abs(sd - 0.5)).toBeLessThan(4 * (0.5 / Math.sqrt(2 * n)));
  });
});

describe("quantilesOf", () => {
  it("maps a column of probabilities in one pass and validates once", () => {
    const d: Distribution = { type: "range", p50: 3, low: 2, high: 5, coverage: 90, shape: "lognormal" };
    const column = quantilesOf(d, [0.05, 0.5, 0.95], "ecs");
    expect(column[0]).toBeCloseTo(2, 12);
    expect(column[1]).toBeCloseTo(3, 12);
    expect(column[2]).toBeCloseTo(5, 12);
    expect(() => quantilesOf({ type: "normal", mean: 0, sd: 0 }, [0.5], "ecs")).toThrow("ecs.sd must be > 0");
    expect(() => quantilesOf(d, [0.5, 1], "ecs")).toThrow("probabilities[1] must be in (0, 1)");
  });
});

describe("validateDistribution", () => {
  const cases: Array<[Distribution, string]> = [
    [{ type: "fixed", value: Number.NaN }, "ecs.value must be a finite number"],
    [{ type: "normal", mean: 3, sd: 0 }, "ecs.sd must be > 0"],
    [{ type: "normal", mean: Infinity, sd: 1 }, "ecs.mean must be a finite number"],
    [{ type: "lognormal", median: -3, logSd: 0.3 }, "ecs.median must be > 0"],
    [{ type: "lognormal", median: 3, logSd: 0 }, "ecs.logSd must be > 0"],
    [{ type: "uniform", min: 4, max: 2 }, "ecs.max must be > ecs.min"],
    [{ type: "triangular", min: 1, mode: 5, max: 4 }, "ecs.mode must lie between ecs.min and ecs.max"],
    [{ type: "truncated-normal", mean: 3, sd: 1, min: 2, max: 2 }, "ecs.max must be > ecs.min"],
    [{ type: "range", p50: 3, low: 2, high: 2.5, coverage: 66, shape: "split-normal" }, "ecs.high must be > ecs.p50"],
    [{ type: "range", p50: 3, low: 2, high: 5, coverage: 90, shape: "gamma" as "lognormal" }, 'ecs.shape must be "lognormal" or "split-normal"'],
    [{ type: "beta" } as unknown as Distribution, "ecs.type must be one of"],
  ];
  it.each(cases)("rejects %o naming the field", (d, message) => {
    expect(() => validateDistribution(d, "ecs")).toThrow(RangeError);
    expect(() => validateDistribution(d, "ecs")).toThrow(message);
  });

  it.each(EVERY_KIND)("accepts %o", (d) => {
    expect(() => validateDistribution(d, "ecs")).not.toThrow();
  });
});

describe("summarizeDistribution", () => {
  it("gives the percentiles of LN(ln 3, 0.27853) under p-keys", () => {
    const summary = summarizeDistribution({ type: "lognormal", median: 3, logSd: 0.27853 });
    expect(Object.keys(summary)).toEqual(["p5", "p17", "p50", "p83", "p95"]);
    // exp(ln 3 + 0.27853·z_p), computed from the closed form: 1.8974 / 2.2999 / 3.0000 / 3.9133 / 4.7434.
    expect(summary.p5).toBeCloseTo(1.8974, 4);
    expect(summary.p17).toBeCloseTo(2.2999, 4);
    expect(summary.p50).toBeCloseTo(3, 12);
    expect(summary.p83).toBeCloseTo(3.9133, 4);
    expect(summary.p95).toBeCloseTo(4.7434, 4);
  });

  it("accepts custom percentiles and rejects 0 and 100", () => {
    expect(summarizeDistribution({ type: "uniform", min: 0, max: 10 }, [10, 2.5])).toEqual({ p10: 1, "p2.5": 0.25 });
    expect(() => summarizeDistribution({ type: "uniform", min: 0, max: 10 }, [0])).toThrow("percentiles[0] must be in (0, 100)");
    expect(() => summarizeDistribution({ type: "uniform", min: 0, max: 10 }, [50, 100])).toThrow("percentiles[1] must be in (0, 100)");
  });
});

describe("densityCurve", () => {
  it("spans the 0.5–99.5 % range with `points` samples whose area is about 0.99", () => {
    const d: Distribution = { type: "normal", mean: 3, sd: 0.5 };
    const curve = densityCurve(d);
    expect(curve.x).toHaveLength(101);
    expect(curve.density).toHaveLength(101);
    // Φ⁻¹(0.995) = 2.5758293035489 [computed, SciPy].
    expect(curve.x[0]).toBeCloseTo(3 - 0.5 * 2.5758293035489, 10);
    expect(curve.x[100]).toBeCloseTo(3 + 0.5 * 2.5758293035489, 10);
    let area = 0;
    for (let i = 1; i < curve.x.length; i++) area += ((curve.density[i]! + curve.density[i - 1]!) / 2) * (curve.x[i]! - curve.x[i - 1]!);
    expect(area).toBeCloseTo(0.99, 3);
  });

  it("draws a fixed value as one spike point and rejects too few points", () => {
    expect(densityCurve({ type: "fixed", value: 2 })).toEqual({ x: [2], density: [0] });
    expect(() => densityCurve({ type: "normal", mean: 0, sd: 1 }, 1)).toThrow("points must be an integer ≥ 2");
  });
});
