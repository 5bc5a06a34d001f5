import { describe, expect, it } from "vitest";
import { lossAtReturnPeriod, projectRow, projectRowAcrossReturnPeriods } from "./project-losses.js";
import { lossReturnPeriodAfterScaling, multiplierAtReturnPeriod } from "./return-period-multiplier.js";
import { tableProfileReader } from "./table-profile.js";
import type { TableScaling } from "./types.js";

/**
 * IPCC AR6 WGI SPM Figure SPM.6 (CMIP6 medians, land, vs 1850–1900), as printed in the figure
 * and read here from secondary reproductions of it: a 1850–1900 10-year hot extreme occurs
 * 2.8 / 4.1 / 5.6 / 9.4 times per 10 years at 1 / 1.5 / 2 / 4 °C; a 50-year one 4.8 / 8.6 /
 * 13.9 / 39.2 times per 50 years.
 */
const SPM6: TableScaling = {
  kind: "table",
  tables: [
    { returnPeriod: 10, points: [{ warming: 0, multiplier: 1 }, { warming: 1, multiplier: 2.8 }, { warming: 1.5, multiplier: 4.1 }, { warming: 2, multiplier: 5.6 }, { warming: 4, multiplier: 9.4 }] },
    { returnPeriod: 50, points: [{ warming: 0, multiplier: 1 }, { warming: 1, multiplier: 4.8 }, { warming: 1.5, multiplier: 8.6 }, { warming: 2, multiplier: 13.9 }, { warming: 4, multiplier: 39.2 }] },
  ],
  beyondTable: "hold",
};

describe("multiplier at a return period (log multiplier straight in log return period)", () => {
  it("gives each table's own multiplier at its return period: SPM.6's figures at 1, 1.5, 2 and 4 °C", () => {
    const reader = tableProfileReader(SPM6, 0);
    const out = new Float64Array(2);
    const expected: Record<number, [number, number]> = { 1: [2.8, 4.8], 1.5: [4.1, 8.6], 2: [5.6, 13.9], 4: [9.4, 39.2] };
    for (const [warming, [ten, fifty]] of Object.entries(expected)) {
      reader.multipliersAt(Number(warming), out);
      expect(multiplierAtReturnPeriod(reader.returnPeriods, out, "hold", 10)).toBe(ten);
      expect(multiplierAtReturnPeriod(reader.returnPeriods, out, "hold", 50)).toBe(fifty);
    }
  });

  it("is the geometric mean at the geometric mean of two return periods (closed form of the power law)", () => {
    // ln m(T) = ln m10 + (ln m50 − ln m10) · ln(T/10) / ln 5; at T = √500, ln(T/10) = ½ ln 5.
    expect(multiplierAtReturnPeriod([10, 50], [2.8, 4.8], "hold", Math.sqrt(500))).toBeCloseTo(Math.sqrt(2.8 * 4.8), 12);
    // Any T between: m10 · (m50/m10)^(ln(T/10)/ln 5).
    expect(multiplierAtReturnPeriod([10, 50], [5.6, 13.9], "hold", 25)).toBeCloseTo(5.6 * (13.9 / 5.6) ** (Math.log(2.5) / Math.log(5)), 12);
  });

  it("holds the nearest table beyond the tables, or continues the end segment's power law", () => {
    expect(multiplierAtReturnPeriod([10, 50], [5.6, 13.9], "hold", 100)).toBe(13.9);
    expect(multiplierAtReturnPeriod([10, 50], [5.6, 13.9], "hold", 2)).toBe(5.6);
    // Power law m ∝ T^b, b = ln(13.9/5.6)/ln 5: m(200) = 13.9 · 4^b.
    const b = Math.log(13.9 / 5.6) / Math.log(5);
    expect(multiplierAtReturnPeriod([10, 50], [5.6, 13.9], "extrapolate", 200)).toBeCloseTo(13.9 * 4 ** b, 10);
    expect(multiplierAtReturnPeriod([10, 50], [5.6, 13.9], "extrapolate", 5)).toBeCloseTo(5.6 * 0.5 ** b, 10);
  });

  it("uses one table's multiplier at every return period", () => {
    expect(multiplierAtReturnPeriod([10], [2.8], "extrapolate", 200)).toBe(2.8);
  });
});

describe("baseline return period of the loss level that becomes 1-in-T", () => {
  it("is T·m when every return period has the same multiplier (the single-multiplier rule)", () => {
    expect(lossReturnPeriodAfterScaling([10], [2], "hold", 100)).toBe(200);
    expect(lossReturnPeriodAfterScaling([10, 50], [3, 3], "extrapolate", 200)).toBe(600);
  });

  it("solves t / m(t) = T in closed form on the power-law segment holding the answer", () => {
    // Beyond 50 years with "hold", m = m50 and t = T · m50 (when that lies beyond 50).
    expect(lossReturnPeriodAfterScaling([10, 50], [2.8, 4.8], "hold", 100)).toBeCloseTo(480, 9);
    // With "extrapolate", m(t) = m10 (t/10)^b: t / m(t) = (10/m10)(t/10)^(1−b) = T → t = 10 (T m10 / 10)^(1/(1−b)).
    const b = Math.log(4.8 / 2.8) / Math.log(5);
    expect(lossReturnPeriodAfterScaling([10, 50], [2.8, 4.8], "extrapolate", 100)).toBeCloseTo(10 * ((100 * 2.8) / 10) ** (1 / (1 - b)), 8);
    // Inside the tables: T = 5 lies between t/m at 10 (3.571) and at 50 (10.42).
    expect(lossReturnPeriodAfterScaling([10, 50], [2.8, 4.8], "hold", 5)).toBeCloseTo(10 * ((5 * 2.8) / 10) ** (1 / (1 - b)), 8);
  });

  it("refuses when extrapolated tables make rarer events at least as frequent for good", () => {
    // b = ln(40/2)/ln 5 > 1: t / m(t) falls beyond 50 years.
    expect(() => lossReturnPeriodAfterScaling([10, 50], [2, 40], "extrapolate", 100)).toThrow(/^returnPeriod 100: beyond 50 years/);
  });
});

describe("portfolio row across return periods", () => {
  const row = { aal: 12, loss100: 300, loss200: 420 };

  it("is projectRow, bit for bit, when the tables agree", () => {
    for (const metric of ["frequency", "severity"] as const)
      expect(projectRowAcrossReturnPeriods(row, metric, { returnPeriods: [10, 50], multipliers: [2.5, 2.5], beyond: "extrapolate" })).toEqual(projectRow(row, metric, 2.5));
  });

  it("scales AAL by the most frequent table and the tail by the tail's own multipliers", () => {
    const curve = { returnPeriods: [10, 50], multipliers: [2.8, 4.8], beyond: "hold" as const };
    expect(projectRowAcrossReturnPeriods(row, "severity", curve)).toEqual({ aal: 12 * 2.8, loss100: 300 * 4.8, loss200: 420 * 4.8 });
    const frequency = projectRowAcrossReturnPeriods(row, "frequency", curve);
    expect(frequency.aal).toBe(12 * 2.8);
    // Held beyond 50 years: the 1-in-100 loss becomes the baseline 1-in-480 loss.
    expect(frequency.loss100).toBeCloseTo(lossAtReturnPeriod(row, 480), 9);
    expect(frequency.loss200).toBeCloseTo(lossAtReturnPeriod(row, 960), 9);
  });
});
