import { describe, expect, it } from "vitest";
import { densityCurve, densityOf, percentileValues, quantileOf } from "./distribution-math";
import { standardNormalCdf, standardNormalQuantile } from "./standard-normal";

describe("standard normal", () => {
  it("matches R's qnorm and pnorm", () => {
    // R: qnorm(0.95) = 1.644853626951472; qnorm(0.83) = 0.9541652531461943; qnorm(0.001) = -3.090232306167813
    expect(standardNormalQuantile(0.95)).toBeCloseTo(1.644853626951472, 14);
    expect(standardNormalQuantile(0.83)).toBeCloseTo(0.9541652531461943, 14);
    expect(standardNormalQuantile(0.001)).toBeCloseTo(-3.090232306167813, 12);
    // R: pnorm(1.959964) = 0.9750000 ; Numerical Recipes erfcc is good to 1.2e-7
    expect(standardNormalCdf(1.959963984540054)).toBeCloseTo(0.975, 6);
  });
});

describe("quantileOf", () => {
  it("normal: mean + sd·z", () => {
    // R: qnorm(0.05, 3, 0.5) = 2.177573186524264
    expect(quantileOf({ type: "normal", mean: 3, sd: 0.5 }, 0.05)).toBeCloseTo(2.177573186524264, 12);
  });
  it("lognormal: median·exp(logSd·z)", () => {
    // Closed form: qlnorm(0.95, log(3), 0.3) = 3·exp(0.3·qnorm(0.95)), qnorm(0.95) = 1.644853626951472 (R)
    expect(quantileOf({ type: "lognormal", median: 3, logSd: 0.3 }, 0.95)).toBeCloseTo(3 * Math.exp(0.3 * 1.644853626951472), 12);
  });
  it("uniform and triangular closed forms", () => {
    expect(quantileOf({ type: "uniform", min: 2, max: 4 }, 0.25)).toBe(2.5);
    // Symmetric triangle (0, 1, 2): median at the mode; p = 0.125 at x = 0.5 (CDF x²/2)
    expect(quantileOf({ type: "triangular", min: 0, mode: 1, max: 2 }, 0.5)).toBeCloseTo(1, 12);
    expect(quantileOf({ type: "triangular", min: 0, mode: 1, max: 2 }, 0.125)).toBeCloseTo(0.5, 12);
  });
  it("truncated normal: half-normal median is Φ⁻¹(0.75)", () => {
    // N(0,1) truncated to [0, 50]: median = qnorm(0.75) = 0.6744897501960817 (R). CDF good to ~1e-7.
    expect(quantileOf({ type: "truncated-normal", mean: 0, sd: 1, min: 0, max: 50 }, 0.5)).toBeCloseTo(0.6744897501960817, 6);
  });
  it("range reproduces its published median and ends", () => {
    const lognormal = { type: "range", p50: 3, low: 2, high: 5, coverage: 90, shape: "lognormal" } as const;
    expect(quantileOf(lognormal, 0.05)).toBeCloseTo(2, 12);
    expect(quantileOf(lognormal, 0.5)).toBeCloseTo(3, 12);
    expect(quantileOf(lognormal, 0.95)).toBeCloseTo(5, 12);
    const split = { type: "range", p50: 3, low: 2.5, high: 4, coverage: 66, shape: "split-normal" } as const;
    expect(quantileOf(split, 0.17)).toBeCloseTo(2.5, 12);
    expect(quantileOf(split, 0.83)).toBeCloseTo(4, 12);
  });
});

describe("densities", () => {
  it("integrate to about one over the preview range", () => {
    for (const d of [
      { type: "normal", mean: 0, sd: 1 },
      { type: "lognormal", median: 3, logSd: 0.4 },
      { type: "triangular", min: 0, mode: 0.2, max: 2 },
      { type: "truncated-normal", mean: 1, sd: 1, min: 0, max: 2 },
      { type: "range", p50: 3, low: 2, high: 5, coverage: 90, shape: "lognormal" },
    ] as const) {
      const { xs, density } = densityCurve(d, 2001);
      let integral = 0;
      for (let i = 1; i < xs.length; i++) integral += ((density[i]! + density[i - 1]!) / 2) * (xs[i]! - xs[i - 1]!);
      // The curve spans the central 99.5 %; trapezoid error is small at 2001 points.
      expect(integral).toBeGreaterThan(0.99);
      expect(integral).toBeLessThan(1.001);
    }
  });
  it("normal density at the mean is 1/(sd·√(2π))", () => {
    expect(densityOf({ type: "normal", mean: 2, sd: 0.5 }, 2)).toBeCloseTo(1 / (0.5 * Math.sqrt(2 * Math.PI)), 12);
  });
  it("lists the five preview percentiles in order", () => {
    const values = percentileValues({ type: "normal", mean: 3, sd: 1 }).map((v) => v.value);
    expect(values).toEqual([...values].sort((a, b) => a - b));
    expect(values[2]).toBeCloseTo(3, 12);
  });
});
