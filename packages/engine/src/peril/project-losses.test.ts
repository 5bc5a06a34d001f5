import { describe, expect, it } from "vitest";
import { lossAtReturnPeriod, projectRow } from "./project-losses.js";

const row = { aal: 12, loss100: 300, loss200: 420 };

describe("lossAtReturnPeriod", () => {
  it("passes through the two tail points and is straight in log return period", () => {
    expect(lossAtReturnPeriod(row, 100)).toBe(300);
    expect(lossAtReturnPeriod(row, 200)).toBe(420);
    // Same slope beyond: each doubling of T adds loss200 − loss100 = 120.
    expect(lossAtReturnPeriod(row, 400)).toBeCloseTo(540, 9);
    expect(lossAtReturnPeriod(row, 50)).toBeCloseTo(180, 9);
    // Geometric mean of 100 and 200 sits half-way on the log axis: (300 + 420) / 2.
    expect(lossAtReturnPeriod(row, Math.SQRT2 * 100)).toBeCloseTo(360, 9);
  });

  it("never goes below 0", () => {
    // 300 − 120·log2(100/T) reaches 0 at T = 100 / 2^2.5 ≈ 17.7 years.
    expect(lossAtReturnPeriod(row, 10)).toBe(0);
  });
});

describe("projectRow", () => {
  it("severity: every figure scales by the multiplier", () => {
    expect(projectRow(row, "severity", 1.5)).toEqual({ aal: 18, loss100: 450, loss200: 630 });
  });

  it("frequency: AAL scales by m and the 1-in-200 loss becomes the 1-in-100 loss when m = 2 (return period = 1 / annual frequency)", () => {
    // An event twice as likely goes from 1-in-200 to 1-in-100 (return period = 1 / annual frequency), so its loss is now the 1-in-100 loss.
    const doubled = projectRow(row, "frequency", 2);
    expect(doubled.aal).toBe(24);
    expect(doubled.loss100).toBeCloseTo(420, 9);
    expect(doubled.loss200).toBeCloseTo(540, 9);
    expect(projectRow(row, "frequency", 1)).toEqual(row);
    // Halving frequency: the new 1-in-200 loss is the old 1-in-100 loss.
    expect(projectRow(row, "frequency", 0.5).loss200).toBeCloseTo(300, 9);
  });

  it("is non-decreasing in the multiplier for both metrics", () => {
    for (const metric of ["frequency", "severity"] as const) {
      let previous = projectRow(row, metric, 0.1);
      for (let m = 0.2; m < 5; m += 0.1) {
        const next = projectRow(row, metric, m);
        expect(next.aal).toBeGreaterThanOrEqual(previous.aal);
        expect(next.loss100).toBeGreaterThanOrEqual(previous.loss100);
        expect(next.loss200).toBeGreaterThanOrEqual(previous.loss200);
        previous = next;
      }
    }
  });

  it("rejects a non-positive multiplier and an unknown metric", () => {
    expect(() => projectRow(row, "severity", 0)).toThrow(/^multiplier /);
    expect(() => projectRow(row, "volume" as "severity", 1)).toThrow(/^metric /);
  });
});
