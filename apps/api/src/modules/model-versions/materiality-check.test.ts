import type { ImpactPathway } from "@plumeline/contracts";
import { describe, expect, it } from "vitest";
import { describeFiring, materialityFirings } from "./materiality-check.js";

const policy = { medianShiftK: 0.1, exceedancePoints: 5, widthChangePercent: 10 };

/** A hand-made pathway: comparison 5–95 % width 2.0 K at both horizons; differences chosen around each limit. */
function pathway(d2050: ImpactPathway["differences"][number], d2100: ImpactPathway["differences"][number]): ImpactPathway {
  const side = (year: number) => ({ year, temperature: { p5: 1, p50: 2, p95: 3 }, precision: {}, exceedance: { "1.5": 0.5 } });
  return { pathway: { id: "p1", name: "Ramp" }, version: [side(2050), side(2100)], against: [side(2050), side(2100)], differences: [d2050, d2100] };
}

describe("materialityFirings", () => {
  it("fires strictly above each limit, the width relative to the comparison's own width", () => {
    const fired = materialityFirings(
      [
        pathway(
          // exactly at each limit (0.1 K; 0.05 = 5 points; 0.2 K of a 2.0 K width = 10 %): nothing fires
          { year: 2050, medianShift: 0.1, widthChange: 0.2, exceedance: { "1.5": 0.05 } },
          // just past each, one of them downwards
          { year: 2100, medianShift: -0.11, widthChange: 0.21, exceedance: { "1.5": 0.0501 } },
        ),
      ],
      policy,
    );
    expect(fired.map((f) => [f.year, f.metric, f.unit])).toEqual([
      [2100, "median-shift", "K"],
      [2100, "width-change", "%"],
      [2100, "exceedance", "pts"],
    ]);
    expect(fired[0]!.value).toBeCloseTo(-0.11, 12);
    expect(fired[1]!.value).toBeCloseTo(10.5, 12); // 0.21 / 2.0 × 100
    expect(fired[2]!).toMatchObject({ warmingThreshold: 1.5, limit: 5 });
    expect(fired[2]!.value).toBeCloseTo(5.01, 12);
  });

  it("says each firing in one plain sentence", () => {
    const [median] = materialityFirings([pathway({ year: 2050, medianShift: 0.14, widthChange: 0, exceedance: {} }, { year: 2100, medianShift: 0, widthChange: 0, exceedance: {} })], policy);
    expect(describeFiring(median!)).toBe("median shift +0.14 K > 0.1 K on Ramp 2050");
    // Just past the limit, the sentence shows the decimal that passes it.
    const [near] = materialityFirings([pathway({ year: 2050, medianShift: 0.1042, widthChange: 0, exceedance: {} }, { year: 2100, medianShift: 0, widthChange: 0, exceedance: {} })], policy);
    expect(describeFiring(near!)).toBe("median shift +0.104 K > 0.1 K on Ramp 2050");
  });
});
