import { describe, expect, it } from "vitest";
import { shiftedReturnPeriod } from "./return-periods.js";

describe("shiftedReturnPeriod", () => {
  it("makes an event r times as likely go from 1-in-T to 1-in-(T/r)", () => {
    // Definition: a return period is the reciprocal of the annual frequency, so r times the frequency
    // divides it by r — a 1-in-100 event becomes about 1-in-(100/r).
    expect(shiftedReturnPeriod(100, 2)).toBe(50);
    expect(shiftedReturnPeriod(200, 4)).toBe(50);
    expect(shiftedReturnPeriod(100, 0.5)).toBe(200);
    // AR6 WGI SPM Figure SPM.6 (secondary reproduction): the 10-year hot extreme occurs 2.8 times per 10 years at 1 °C → every 10/2.8 years.
    expect(shiftedReturnPeriod(10, 2.8)).toBeCloseTo(3.5714285714, 9);
  });

  it("rejects non-positive return periods and multipliers", () => {
    expect(() => shiftedReturnPeriod(0, 2)).toThrow(/^returnPeriod /);
    expect(() => shiftedReturnPeriod(100, 0)).toThrow(/^multiplier /);
  });
});
