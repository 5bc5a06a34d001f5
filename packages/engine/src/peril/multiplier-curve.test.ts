import { describe, expect, it } from "vitest";
import { perilMultiplierCurve } from "./multiplier-curve.js";

describe("perilMultiplierCurve", () => {
  it("gives (1 + F⁻¹(p))^(ΔT − ΔT0) above the baseline and the flipped percentile below it", () => {
    // Uniform 3–11 %/K: F⁻¹(0.05) = 0.034, F⁻¹(0.95) = 0.106 (closed form of the uniform quantile).
    const profile = { baselineWarming: 1, scaling: { kind: "per-kelvin" as const, rate: { type: "uniform" as const, min: 0.03, max: 0.11 } } };
    const curve = perilMultiplierCurve(profile, [0, 1, 3], [5, 95]);
    expect(curve.warming).toEqual([0, 1, 3]);
    expect(curve.bands.p5![2]).toBeCloseTo(Math.pow(1.034, 2), 12);
    expect(curve.bands.p95![2]).toBeCloseTo(Math.pow(1.106, 2), 12);
    expect(curve.bands.p5![1]).toBe(1);
    // One kelvin below the baseline: the 5th percentile is 1 / (1 + F⁻¹(0.95)).
    expect(curve.bands.p5![0]).toBeCloseTo(1 / 1.106, 12);
    expect(curve.bands.p95![0]).toBeCloseTo(1 / 1.034, 12);
  });

  it("gives the table multiplier in every band of a table profile", () => {
    const profile = {
      baselineWarming: 0,
      scaling: { kind: "table" as const, points: [{ warming: 0, multiplier: 1 }, { warming: 2, multiplier: 3 }], beyondTable: "hold" as const },
    };
    const curve = perilMultiplierCurve(profile, [0, 1, 2, 3], [5, 50, 95]);
    for (const key of ["p5", "p50", "p95"]) expect(curve.bands[key]).toEqual([1, 2, 3, 3]);
  });

  it("rejects bad percentiles and warming levels", () => {
    const profile = { baselineWarming: 0, scaling: { kind: "per-kelvin" as const, rate: { type: "fixed" as const, value: 0.07 } } };
    expect(() => perilMultiplierCurve(profile, [1], [100])).toThrow(/^percentiles\[0\]/);
    expect(() => perilMultiplierCurve(profile, [Number.NaN], [50])).toThrow(/^warmingLevels\[0\]/);
  });
});
