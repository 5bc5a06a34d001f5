import { describe, expect, it } from "vitest";
import { tableMultiplier, tableValue } from "./table-multiplier.js";

/**
 * AR6 WGI SPM Figure SPM.6: a 10-year hot extreme of 1850–1900 happens 2.8, 4.1, 5.6 and 9.4
 * times per 10 years at 1, 1.5, 2 and 4 °C of global warming (read in a secondary
 * reproduction of the figure, not the figure itself). 1 time per 10 years at 1850–1900 by the
 * event's definition.
 */
const SPM6_HOT_10YR = [
  { warming: 0, multiplier: 1 },
  { warming: 1, multiplier: 2.8 },
  { warming: 1.5, multiplier: 4.1 },
  { warming: 2, multiplier: 5.6 },
  { warming: 4, multiplier: 9.4 },
];

describe("tableValue and tableMultiplier", () => {
  it("reproduces a user table's own points, for both beyond-table rules", () => {
    const points = [
      { warming: 0.5, multiplier: 0.9 },
      { warming: 1.2, multiplier: 1 },
      { warming: 2.5, multiplier: 1.6 },
      { warming: 3, multiplier: 2.2 },
    ];
    for (const rule of ["hold", "extrapolate"] as const)
      for (const p of points) expect(tableValue(points, rule, p.warming)).toBe(p.multiplier);
  });

  it("reproduces the AR6 SPM.6 hot-extreme frequencies at their warming levels", () => {
    // Baseline warming 0: the insurer's view is 1850–1900, so the table values are the multipliers.
    expect(tableMultiplier(SPM6_HOT_10YR, "hold", 1, 0)).toBe(2.8);
    expect(tableMultiplier(SPM6_HOT_10YR, "hold", 1.5, 0)).toBe(4.1);
    expect(tableMultiplier(SPM6_HOT_10YR, "hold", 2, 0)).toBe(5.6);
    expect(tableMultiplier(SPM6_HOT_10YR, "hold", 4, 0)).toBe(9.4);
  });

  it("interpolates linearly in warming between points", () => {
    // Half-way between 2 K (5.6) and 4 K (9.4): (5.6 + 9.4) / 2 = 7.5.
    expect(tableValue(SPM6_HOT_10YR, "hold", 3)).toBeCloseTo(7.5, 12);
    // A quarter of the way from 1 K (2.8) to 1.5 K (4.1): 2.8 + 0.25·1.3 = 3.125.
    expect(tableValue(SPM6_HOT_10YR, "hold", 1.125)).toBeCloseTo(3.125, 12);
  });

  it("divides by the table's value at the baseline warming (multiplier 1 there)", () => {
    // A risk view that already holds 1 K of warming: 2 °C is 5.6 / 2.8 = 2 times today's frequency.
    expect(tableMultiplier(SPM6_HOT_10YR, "hold", 2, 1)).toBeCloseTo(2, 12);
    expect(tableMultiplier(SPM6_HOT_10YR, "hold", 1, 1)).toBe(1);
  });

  it("holds the end values beyond the table with \"hold\"", () => {
    expect(tableValue(SPM6_HOT_10YR, "hold", 5)).toBe(9.4);
    const noZero = SPM6_HOT_10YR.slice(1);
    expect(tableValue(noZero, "hold", 0.2)).toBe(2.8);
  });

  it("continues the end segment's per-kelvin rate with \"extrapolate\"", () => {
    // End segment 2 → 4 K: 9.4/5.6 over 2 K, i.e. a factor sqrt(9.4/5.6) per K; at 5 K: 9.4·sqrt(9.4/5.6).
    expect(tableValue(SPM6_HOT_10YR, "extrapolate", 5)).toBeCloseTo(9.4 * Math.sqrt(9.4 / 5.6), 12);
    // Below the first segment (1 → 1.5 K: 4.1/2.8 per 0.5 K), at 0.5 K: 2.8 / (4.1/2.8).
    const noZero = SPM6_HOT_10YR.slice(1);
    expect(tableValue(noZero, "extrapolate", 0.5)).toBeCloseTo(2.8 / (4.1 / 2.8), 12);
    // Never reaches 0, however far out.
    expect(tableValue([{ warming: 1, multiplier: 2 }, { warming: 2, multiplier: 1 }], "extrapolate", 10)).toBeGreaterThan(0);
  });

  it("rejects tables that do not strictly increase in warming, bad multipliers and rules", () => {
    expect(() => tableValue([{ warming: 1, multiplier: 1 }, { warming: 1, multiplier: 2 }], "hold", 1)).toThrow(
      /^points\[1\]\.warming must be greater than points\[0\]\.warming/,
    );
    expect(() => tableValue([{ warming: 2, multiplier: 1 }, { warming: 1, multiplier: 2 }], "hold", 1)).toThrow(/^points\[1\]\.warming/);
    expect(() => tableValue([{ warming: 0, multiplier: 1 }, { warming: 1, multiplier: -2 }], "hold", 1)).toThrow(/^points\[1\]\.multiplier must be a finite number > 0/);
    expect(() => tableValue([{ warming: 0, multiplier: 1 }], "hold", 1)).toThrow(/^points must hold at least two points/);
    expect(() => tableValue(SPM6_HOT_10YR, "clamp" as "hold", 1)).toThrow(/^beyondTable must be/);
    expect(() => tableValue(SPM6_HOT_10YR, "hold", Number.NaN)).toThrow(/^warming must be a finite number/);
  });
});
