import { describe, expect, it } from "vitest";
import { perKelvinMultiplier } from "./per-kelvin-multiplier.js";
import { perilMultiplier } from "./peril-multiplier.js";

describe("perKelvinMultiplier", () => {
  it("is exactly (1 + r)^(ΔT − ΔT0) (closed form, issue 5)", () => {
    for (const [r, t, t0] of [
      [0.07, 2.1, 1.1],
      [0.07, 4, 1.2],
      [0.03, 1.5, 0],
      [-0.05, 3, 1],
      [0.15, 0.8, 1.1],
    ] as const)
      expect(perKelvinMultiplier(r, t, t0)).toBe(Math.pow(1 + r, t - t0));
  });

  it("is 1 at the baseline warming and compounds per kelvin", () => {
    expect(perKelvinMultiplier(0.07, 1.1, 1.1)).toBe(1);
    // Two kelvin beyond the baseline at 7 %/K: 1.07² = 1.1449 (exact arithmetic).
    expect(perKelvinMultiplier(0.07, 3.1, 1.1)).toBeCloseTo(1.1449, 12);
    // Below the baseline the law runs backwards: 1 / 1.07.
    expect(perKelvinMultiplier(0.07, 0.1, 1.1)).toBeCloseTo(1 / 1.07, 12);
  });

  it("rejects rates at or below -100 % per K and non-finite warming", () => {
    expect(() => perKelvinMultiplier(-1, 2, 1)).toThrow(/^rate must be a finite number > -1/);
    expect(() => perKelvinMultiplier(-1.2, 2, 1)).toThrow(/^rate /);
    expect(() => perKelvinMultiplier(0.07, Number.NaN, 1)).toThrow(/^warming /);
    expect(() => perKelvinMultiplier(0.07, 2, Number.POSITIVE_INFINITY)).toThrow(/^baselineWarming /);
  });
});

describe("perilMultiplier", () => {
  it("uses the member's rate for per-kelvin profiles and needs one", () => {
    const profile = { baselineWarming: 1, scaling: { kind: "per-kelvin" as const, rate: { type: "fixed" as const, value: 0.07 } } };
    expect(perilMultiplier(profile, 3, 0.07)).toBe(Math.pow(1.07, 2));
    expect(() => perilMultiplier(profile, 3)).toThrow(/rate is needed/);
  });

  it("uses the table for table profiles, relative to the baseline warming", () => {
    const profile = {
      baselineWarming: 1,
      scaling: { kind: "table" as const, points: [{ warming: 0, multiplier: 1 }, { warming: 1, multiplier: 2 }, { warming: 2, multiplier: 3 }], beyondTable: "hold" as const },
    };
    // Table value 3 at 2 K over table value 2 at the 1 K baseline.
    expect(perilMultiplier(profile, 2)).toBe(1.5);
    expect(perilMultiplier(profile, 1)).toBe(1);
  });
});
