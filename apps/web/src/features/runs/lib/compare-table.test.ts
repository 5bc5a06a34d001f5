import type { PathwayResult } from "@plumeline/contracts";
import { describe, expect, it } from "vitest";
import { compareHorizons, formatSigned } from "./compare-table";

/** Invented horizon figures; the expected differences are plain subtraction, done by hand. */
function pathway(
  name: string,
  horizons: Array<{ year: number; p5: number; p50: number; p95: number; ex: Record<string, number> }>,
): PathwayResult {
  return {
    id: name,
    name,
    horizons: horizons.map((h) => ({
      year: h.year,
      temperature: { p5: h.p5, p17: h.p50 - 0.1, p50: h.p50, p83: h.p50 + 0.1, p95: h.p95 },
      exceedance: h.ex,
    })),
  } as unknown as PathwayResult;
}

describe("compareHorizons", () => {
  const ref = pathway("Middle", [
    { year: 2050, p5: 1.4, p50: 2.0, p95: 2.9, ex: { "1.5": 0.9, "2": 0.5 } },
    { year: 2100, p5: 1.8, p50: 2.7, p95: 4.0, ex: { "1.5": 0.99, "2": 0.8 } },
  ]);
  const wider = pathway("Middle", [
    { year: 2050, p5: 1.2, p50: 2.1, p95: 3.3, ex: { "1.5": 0.85, "2": 0.55, "3": 0.05 } },
    { year: 2100, p5: 1.6, p50: 2.9, p95: 4.6, ex: { "1.5": 0.97, "2": 0.83 } },
  ]);
  const third = pathway("Low", [{ year: 2100, p5: 1.1, p50: 1.6, p95: 2.3, ex: { "1.5": 0.6, "2": 0.2 } }]);

  it("keeps only the horizons every run has, rows labelled by run name, the first as reference", () => {
    const out = compareHorizons([
      { label: "Core v1", pathway: ref },
      { label: "Wider aerosols", pathway: wider },
      { label: "Low story", pathway: third },
    ]);
    expect(out.map((h) => h.year)).toEqual([2100]);
    expect(out[0]!.rows.map((r) => r.runLabel)).toEqual(["Core v1", "Wider aerosols", "Low story"]);
    expect(out[0]!.rows.map((r) => r.reference)).toEqual([true, false, false]);
    expect(out[0]!.rows[0]!.medianDiff).toBeNull();
  });

  it("differences: median and 5–95 width in K, exceedance in percentage points", () => {
    const [h2050] = compareHorizons([
      { label: "Core v1", pathway: ref },
      { label: "Wider aerosols", pathway: wider },
    ]);
    const row = h2050!.rows[1]!;
    expect(row.median).toBe(2.1);
    expect(row.medianDiff).toBeCloseTo(0.1, 12);
    // Widths 3.3 − 1.2 = 2.1 and 2.9 − 1.4 = 1.5: wider by 0.6 K.
    expect(row.width).toBeCloseTo(2.1, 12);
    expect(row.widthDiff).toBeCloseTo(0.6, 12);
    // 0.85 − 0.90 = −5 pp; 0.55 − 0.50 = +5 pp; "3" only in one run, so not compared.
    expect(h2050!.thresholds).toEqual(["1.5", "2"]);
    expect(row.exceedanceDiffPp!["1.5"]).toBeCloseTo(-5, 10);
    expect(row.exceedanceDiffPp!["2"]).toBeCloseTo(5, 10);
  });

  it("names a horizon that lacks a percentile the comparison needs", () => {
    const broken = { ...ref, horizons: [{ year: 2050, temperature: { p50: 2 }, exceedance: {} }] } as unknown as PathwayResult;
    expect(() =>
      compareHorizons([
        { label: "a", pathway: broken },
        { label: "b", pathway: broken },
      ]),
    ).toThrow(/horizon 2050 lacks/);
  });
});

describe("formatSigned", () => {
  it("writes a sign, a true minus and no negative zero", () => {
    expect(formatSigned(0.123, 2)).toBe("+0.12");
    expect(formatSigned(-0.05, 2, "K")).toBe("−0.05 K");
    expect(formatSigned(-0.001, 2)).toBe("0.00");
    expect(formatSigned(-4.96, 1, "pp")).toBe("−5.0 pp");
  });
});
