import { describe, expect, it } from "vitest";
import { compareAxis, compareYears } from "./compare-baseline";

describe("compareAxis", () => {
  it("names the baseline both runs share, like the run page's axis", () => {
    expect(compareAxis([1850, 1900], [1850, 1900])).toEqual({ label: "Warming above 1850–1900 (K)", mismatch: false });
  });

  it("flags two different baselines: the same anomaly would mean different warming", () => {
    expect(compareAxis([1850, 1900], [1995, 2014])).toEqual({ label: "Warming above each run's baseline (K)", mismatch: true });
  });

  it("stays generic while a run's manifest is still loading", () => {
    expect(compareAxis([1850, 1900], undefined)).toEqual({ label: "Warming above baseline (K)", mismatch: false });
  });
});

describe("compareAxis with more than two runs", () => {
  it("names one baseline only when all runs share it", () => {
    expect(compareAxis([1850, 1900], [1850, 1900], [1850, 1900]).label).toBe("Warming above 1850–1900 (K)");
    expect(compareAxis([1850, 1900], [1850, 1900], [1995, 2014]).mismatch).toBe(true);
  });
});

describe("compareYears", () => {
  const span = (a: number, b: number) => Array.from({ length: b - a + 1 }, (_, i) => a + i);

  it("starts at the earliest baseline start and ends at the last year all runs have", () => {
    expect(
      compareYears([
        { years: span(1750, 2100), baseline: [1850, 1900] },
        { years: span(1750, 2150), baseline: [1850, 1900] },
      ]),
    ).toEqual([1850, 2100]);
  });

  it("never starts before a run's first year", () => {
    expect(
      compareYears([
        { years: span(1900, 2100), baseline: [1850, 1900] },
        { years: span(1750, 2100), baseline: [1850, 1900] },
      ]),
    ).toEqual([1900, 2100]);
  });

  it("refuses an empty comparison", () => {
    expect(() => compareYears([])).toThrow(/at least one run/);
  });
});
