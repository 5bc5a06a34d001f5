import { describe, expect, it } from "vitest";
import { compareAxis } from "./compare-baseline";

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
