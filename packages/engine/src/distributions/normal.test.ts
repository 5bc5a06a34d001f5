import { describe, expect, it } from "vitest";
import { erfc } from "./erfc.js";
import {
  cdfNormal,
  densityNormal,
  quantileNormal,
  standardNormalCdf,
  standardNormalDensity,
  standardNormalQuantile,
  standardNormalSurvival,
} from "./normal.js";

describe("standardNormalQuantile", () => {
  // Standard normal quantiles computed with scipy.stats.norm.ppf (SciPy 1.17), 10 decimals given.
  const table: Array<[number, number]> = [
    [0.05, -1.644853627],
    [0.1, -1.2815515655],
    [0.17, -0.9541652531],
    [0.25, -0.6744897502],
    [0.83, 0.9541652531],
    [0.9, 1.2815515655],
    [0.95, 1.644853627],
  ];
  it.each(table)("Φ⁻¹(%f) matches SciPy's norm.ppf to 1e-9", (p, z) => {
    expect(Math.abs(standardNormalQuantile(p) - z)).toBeLessThan(1e-9);
  });

  it("reaches far into both tails (reference: mpmath 30-digit ncdf, inverted)", () => {
    // Φ(−37) = 5.7255712225245768e-300, Φ(−10) = 7.619853024160526e-24 [computed, mpmath].
    expect(standardNormalQuantile(5.7255712225245768e-300)).toBeCloseTo(-37, 11);
    expect(standardNormalQuantile(7.619853024160526e-24)).toBeCloseTo(-10, 12);
  });

  it("inverts Φ: relative 1e-12 in the lower tail, absolute 1e-15 in the upper half", () => {
    for (const p of [1e-300, 1e-100, 1e-20, 1e-8, 0.001, 0.0243, 0.2, 0.425]) {
      expect(Math.abs(standardNormalCdf(standardNormalQuantile(p)) / p - 1)).toBeLessThan(1e-12);
    }
    for (const p of [0.5, 0.6, 0.9, 0.999, 1 - 1e-12]) {
      expect(Math.abs(standardNormalCdf(standardNormalQuantile(p)) - p)).toBeLessThan(1e-15);
    }
  });

  it("is antisymmetric and gives ±Infinity at 0 and 1", () => {
    expect(standardNormalQuantile(0.3)).toBe(-standardNormalQuantile(0.7));
    expect(standardNormalQuantile(0.5)).toBe(0);
    expect(standardNormalQuantile(0)).toBe(-Infinity);
    expect(standardNormalQuantile(1)).toBe(Infinity);
  });

  it("rejects NaN and p outside [0, 1]", () => {
    expect(() => standardNormalQuantile(Number.NaN)).toThrow(RangeError);
    expect(() => standardNormalQuantile(1.5)).toThrow(/p must be in \[0, 1\]/);
    expect(() => standardNormalQuantile(-0.1)).toThrow(/p must be in \[0, 1\]/);
  });
});

describe("standardNormalCdf", () => {
  it("gives the 66 % central mass between the 17th and 83rd percentiles", () => {
    // Φ(0.9541653) − Φ(−0.9541653) = 0.6600 (scipy.stats.norm.cdf: 0.66000002371).
    expect(standardNormalCdf(0.9541653) - standardNormalCdf(-0.9541653)).toBeCloseTo(0.66000002371, 10);
  });

  it("keeps relative precision deep in the lower tail (reference: mpmath ncdf, 30 digits)", () => {
    const table: Array<[number, number]> = [
      [-10, 7.619853024160526066e-24],
      [-20, 2.7536241186062336951e-89],
      [-37, 5.7255712225245768227e-300],
    ];
    for (const [x, expected] of table) expect(Math.abs(standardNormalCdf(x) / expected - 1)).toBeLessThan(1e-13);
    expect(standardNormalSurvival(10) / 7.619853024160526066e-24 - 1).toBeLessThan(1e-13);
  });

  it("agrees with 1 − Φ(−x) and with Φ(0) = 1/2, Φ(±∞) = 0, 1", () => {
    expect(standardNormalCdf(0)).toBe(0.5);
    for (const x of [0.1, 0.7, 1.3, 2.9, 4.5]) expect(standardNormalCdf(x) + standardNormalCdf(-x)).toBeCloseTo(1, 15);
    expect(standardNormalCdf(-Infinity)).toBe(0);
    expect(standardNormalCdf(Infinity)).toBe(1);
  });

  it("rejects NaN", () => {
    expect(() => standardNormalCdf(Number.NaN)).toThrow(/x must be a number/);
  });
});

describe("erfc", () => {
  // Reference values: computed with mpmath.erfc to 30 significant digits.
  const table: Array<[number, number]> = [
    [0.3, 0.67137324054087258381],
    [1, 0.15729920705028513066],
    [-1, 1.8427007929497148693],
    [3, 2.2090496998585441373e-5],
    [5, 1.5374597944280348502e-12],
    [10, 2.088487583762544757e-45],
    [20, 5.3958656116079009289e-176],
  ];
  it.each(table)("erfc(%f) to 2e-15 relative", (x, expected) => {
    expect(Math.abs(erfc(x) / expected - 1)).toBeLessThan(2e-15);
  });
  it("underflows to 0 far out and tends to 2 on the left", () => {
    expect(erfc(30)).toBe(0);
    expect(erfc(-30)).toBe(2);
    expect(erfc(0)).toBe(1);
  });
});

describe("standardNormalDensity and the normal(mean, sd) law", () => {
  it("has φ(0) = 1/√(2π) and φ(1) = e^(−1/2)/√(2π)", () => {
    expect(standardNormalDensity(0)).toBeCloseTo(1 / Math.sqrt(2 * Math.PI), 16);
    expect(standardNormalDensity(1)).toBeCloseTo(Math.exp(-0.5) / Math.sqrt(2 * Math.PI), 16);
  });

  it("scales quantile, CDF and density by mean and sd", () => {
    const d = { type: "normal", mean: 3, sd: 0.5 } as const;
    // mean + sd·z95 with z95 = scipy.stats.norm.ppf(0.95) (SciPy 1.17).
    expect(quantileNormal(d, 0.95)).toBeCloseTo(3 + 0.5 * 1.644853627, 9);
    expect(cdfNormal(d, 3)).toBe(0.5);
    expect(densityNormal(d, 3)).toBeCloseTo(2 / Math.sqrt(2 * Math.PI), 15);
  });
});
