import { quantile } from "d3-array";
import { describe, expect, it } from "vitest";
import { createRandom } from "../random/create-random.js";
import { applyPerilLens, type PerilLensInput } from "./apply-peril-lens.js";
import { assemblePerilResult } from "./assemble-peril-result.js";
import { perilMultiplierCurve } from "./multiplier-curve.js";
import { sampleRates } from "./sample-rates.js";
import type { PerilProfile, Portfolio } from "./types.js";

const PERCENTILES = [5, 17, 50, 83, 95];

const flood: PerilProfile = {
  id: "flood-north",
  name: "Heavy-rainfall flood, North Vale",
  peril: "flood-heavy-rainfall",
  region: "North Vale",
  metric: "severity",
  baselineWarming: 1.1,
  scaling: { kind: "per-kelvin", rate: { type: "fixed", value: 0.07 } },
};

/** AR6 WGI SPM Figure SPM.6 10-year hot extreme, times per 10 years at 0/1/1.5/2/4 °C (read in a secondary reproduction of the figure). */
const heat: PerilProfile = {
  id: "heat-south",
  name: "Heat, South Fen",
  peril: "heat",
  region: "South Fen",
  metric: "frequency",
  baselineWarming: 0,
  scaling: {
    kind: "table",
    points: [
      { warming: 0, multiplier: 1 },
      { warming: 1, multiplier: 2.8 },
      { warming: 1.5, multiplier: 4.1 },
      { warming: 2, multiplier: 5.6 },
      { warming: 4, multiplier: 9.4 },
    ],
    beyondTable: "hold",
  },
};

const portfolio: Portfolio = {
  id: "demo",
  name: "Demo",
  rows: [
    { region: "North Vale", peril: "flood-heavy-rainfall", currency: "EUR", aal: 12, loss100: 300, loss200: 420 },
    { region: "South Fen", peril: "heat", currency: "EUR", aal: 4, loss100: 80, loss200: 110 },
    { region: "South Fen", peril: "wind", currency: "EUR", aal: 9, loss100: 200, loss200: 260 },
  ],
};

function constant(members: number, value: number): Float64Array {
  return new Float64Array(members).fill(value);
}

function lens(overrides: Partial<PerilLensInput>): ReturnType<typeof applyPerilLens> {
  return applyPerilLens({
    pathwayId: "p1",
    seed: "lens-test",
    sampling: "monte-carlo",
    profiles: [flood],
    portfolio: null,
    horizons: [2050],
    warmingAtHorizons: [constant(5, 2.1)],
    weights: null,
    percentiles: PERCENTILES,
    ...overrides,
  });
}

describe("applyPerilLens", () => {
  it("gives exactly (1 + r)^(ΔT − ΔT0) when warming and rate are fixed (closed form)", () => {
    const result = lens({ horizons: [2050, 2100], warmingAtHorizons: [constant(5, 2.1), constant(5, 3.6)] });
    const [at2050, at2100] = result.profiles[0]!.horizons;
    for (const key of ["p5", "p50", "p95", "mean"]) {
      expect(at2050!.multiplier[key]).toBeCloseTo(Math.pow(1.07, 2.1 - 1.1), 14);
      expect(at2100!.multiplier[key]).toBeCloseTo(Math.pow(1.07, 3.6 - 1.1), 14);
    }
    expect(at2050!.returnPeriods).toBeNull(); // severity: return periods not shifted
    expect(result.pathwayId).toBe("p1");
  });

  it("with warming fixed and only the rate uncertain, multiplier percentiles are the transformed rate percentiles", () => {
    // (1 + r)^2.5 is increasing in r, so percentiles commute with it. With 101 members R-7
    // reads exact order statistics at 5/17/50/83/95 %, so the match is exact up to rounding;
    // the rate percentiles come from d3-array's quantile of the same draws.
    const members = 101;
    const rate = { type: "normal" as const, mean: 0.07, sd: 0.02 };
    const profile: PerilProfile = { ...flood, scaling: { kind: "per-kelvin", rate } };
    const result = lens({ profiles: [profile], warmingAtHorizons: [constant(members, 3.6)] });
    const rates = Array.from(sampleRates(rate, members, "lens-test", profile.id, "monte-carlo"));
    for (const p of PERCENTILES) {
      const expected = Math.pow(1 + quantile(rates, p / 100)!, 2.5);
      expect(result.profiles[0]!.horizons[0]!.multiplier[`p${p}`]).toBeCloseTo(expected, 12);
    }
    // A decreasing transform (warming below the baseline: exponent −1) flips the percentiles.
    const below = lens({ profiles: [profile], warmingAtHorizons: [constant(members, 0.1)] });
    expect(below.profiles[0]!.horizons[0]!.multiplier.p5).toBeCloseTo(1 / (1 + quantile(rates, 0.95)!), 12);
  });

  it("matches the exact multiplier curve of the rate distribution for a large Latin-hypercube sample", () => {
    const rate = { type: "normal" as const, mean: 0.07, sd: 0.02 };
    const profile: PerilProfile = { ...flood, scaling: { kind: "per-kelvin", rate } };
    const result = lens({ profiles: [profile], sampling: "latin-hypercube", warmingAtHorizons: [constant(20000, 3.6)] });
    const curve = perilMultiplierCurve(profile, [3.6], PERCENTILES);
    // Closed form: percentile p of (1+r)^2.5 is (1 + 0.07 + 0.02·z_p)^2.5; LHS error well under 0.1 %.
    for (const p of PERCENTILES) {
      const exact = curve.bands[`p${p}`]![0]!;
      expect(Math.abs(result.profiles[0]!.horizons[0]!.multiplier[`p${p}`]! / exact - 1)).toBeLessThan(1e-3);
    }
    // z_0.95 = 1.6448536 (standard normal table): (1.07 + 0.0328971)^2.5.
    expect(curve.bands.p95![0]).toBeCloseTo(Math.pow(1.07 + 0.02 * 1.6448536, 2.5), 6);
  });

  it("reproduces the AR6 SPM.6 hot-extreme frequencies when all members sit at a warming level", () => {
    // AR6 WGI SPM Figure SPM.6 (secondary reproduction): 2.8 / 4.1 / 5.6 / 9.4 times per 10 years at 1 / 1.5 / 2 / 4 °C.
    const levels = [1, 1.5, 2, 4];
    const expected = [2.8, 4.1, 5.6, 9.4];
    const result = lens({ profiles: [heat], horizons: [2030, 2050, 2070, 2100], warmingAtHorizons: levels.map((w) => constant(7, w)) });
    result.profiles[0]!.horizons.forEach((h, k) => {
      expect(h.multiplier.p50).toBeCloseTo(expected[k]!, 12);
      // Return-period identity (return period = 1 / annual frequency): today's 1-in-100 event becomes 1-in-(100 / m).
      expect(h.returnPeriods!["100"].p50).toBeCloseTo(100 / expected[k]!, 10);
      expect(h.returnPeriods!["200"].p50).toBeCloseTo(200 / expected[k]!, 10);
    });
  });

  it("projects matching portfolio rows: frequency tail losses move along the log-return-period line", () => {
    // Table doubling frequency at 1 K: m = 2, so the new 1-in-100 loss is the old 1-in-200 loss (return period = 1 / annual frequency).
    const doubling: PerilProfile = {
      ...heat,
      scaling: { kind: "table", points: [{ warming: 0, multiplier: 1 }, { warming: 1, multiplier: 2 }], beyondTable: "hold" },
    };
    const result = lens({ profiles: [doubling], portfolio, warmingAtHorizons: [constant(3, 1)] });
    const losses = result.profiles[0]!.horizons[0]!.losses;
    expect(losses).toHaveLength(1);
    expect(losses[0]!.region).toBe("South Fen");
    expect(losses[0]!.aal.p50).toBe(8);
    expect(losses[0]!.loss100.p50).toBeCloseTo(110, 9);
    // 1-in-200 → baseline loss at 400 years: 110 + (110 − 80) = 140.
    expect(losses[0]!.loss200.p50).toBeCloseTo(140, 9);
    // Severity (flood, 7 %/K, ΔT − ΔT0 = 1): every loss × 1.07.
    const severity = lens({ portfolio, warmingAtHorizons: [constant(3, 2.1)] }).profiles[0]!.horizons[0]!.losses[0]!;
    expect(severity.aal.mean).toBeCloseTo(12 * 1.07, 10);
    expect(severity.loss200.p95).toBeCloseTo(420 * 1.07, 10);
  });

  it("lets members keep their own warming, so warming and rate uncertainty combine", () => {
    const members = 4000;
    const random = createRandom("warming-spread");
    const spreadWarming = new Float64Array(members).map(() => 2 + 1.2 * random());
    const uncertain: PerilProfile = { ...flood, scaling: { kind: "per-kelvin", rate: { type: "normal", mean: 0.07, sd: 0.02 } } };
    const width = (r: ReturnType<typeof applyPerilLens>) => {
      const m = r.profiles[0]!.horizons[0]!.multiplier;
      return m.p95! - m.p5!;
    };
    const both = width(lens({ profiles: [uncertain], warmingAtHorizons: [spreadWarming] }));
    const warmingOnly = width(lens({ profiles: [flood], warmingAtHorizons: [spreadWarming] }));
    const rateOnly = width(lens({ profiles: [uncertain], warmingAtHorizons: [constant(members, 2.6)] }));
    expect(both).toBeGreaterThan(warmingOnly);
    expect(both).toBeGreaterThan(rateOnly);
    // Fixed rate: each member's multiplier is 1.07^(w − 1.1), so the mean is the sample mean of that.
    const mean = spreadWarming.reduce((s, w) => s + Math.pow(1.07, w - 1.1), 0) / members;
    expect(lens({ profiles: [flood], warmingAtHorizons: [spreadWarming] }).profiles[0]!.horizons[0]!.multiplier.mean).toBeCloseTo(mean, 12);
  });

  it("weights members: equal weights change nothing, the mean is Σw·m/Σw", () => {
    const warming = Float64Array.from([1.5, 2, 2.5, 3, 3.5]);
    const plain = lens({ warmingAtHorizons: [warming] });
    const equal = lens({ warmingAtHorizons: [warming], weights: constant(5, 0.2) });
    for (const p of PERCENTILES)
      expect(equal.profiles[0]!.horizons[0]!.multiplier[`p${p}`]).toBeCloseTo(plain.profiles[0]!.horizons[0]!.multiplier[`p${p}`]!, 12);
    const weights = Float64Array.from([0, 0, 1, 1, 2]);
    const weighted = lens({ warmingAtHorizons: [warming], weights }).profiles[0]!.horizons[0]!.multiplier;
    const expectedMean = (Math.pow(1.07, 1.4) + Math.pow(1.07, 1.9) + 2 * Math.pow(1.07, 2.4)) / 4;
    expect(weighted.mean).toBeCloseTo(expectedMean, 12);
    expect(weighted.p50!).toBeGreaterThan(plain.profiles[0]!.horizons[0]!.multiplier.p50!);
  });

  it("is reproducible, and a member keeps its rate across pathways", () => {
    const uncertain: PerilProfile = { ...flood, scaling: { kind: "per-kelvin", rate: { type: "uniform", min: 0.02, max: 0.1 } } };
    const warming = [Float64Array.from({ length: 50 }, (_, i) => 1.5 + i / 25)];
    const a = lens({ profiles: [uncertain], warmingAtHorizons: warming });
    const b = lens({ profiles: [uncertain], warmingAtHorizons: warming, pathwayId: "p2" });
    expect(b.profiles).toEqual(a.profiles);
    const otherSeed = lens({ profiles: [uncertain], warmingAtHorizons: warming, seed: "other" });
    expect(otherSeed.profiles[0]!.horizons[0]!.multiplier.p50).not.toBe(a.profiles[0]!.horizons[0]!.multiplier.p50);
  });

  it("rejects mismatched arrays, bad weights and rate draws at or below -100 %", () => {
    expect(() => lens({ horizons: [2030, 2050] })).toThrow(/warmingAtHorizons must hold one array per horizon/);
    expect(() => lens({ horizons: [2030, 2050], warmingAtHorizons: [constant(5, 2), constant(4, 2)] })).toThrow(
      /warmingAtHorizons\[1\] has 4 members, expected 5/,
    );
    expect(() => lens({ weights: constant(5, 0) })).toThrow(/weights must not all be 0/);
    expect(() => lens({ weights: Float64Array.from([1, 1, -1, 1, 1]) })).toThrow(/weights\[2\] must be a finite number ≥ 0/);
    expect(() => lens({ percentiles: [0] })).toThrow(/percentiles\[0\] must lie strictly between 0 and 100/);
    const reckless: PerilProfile = { ...flood, scaling: { kind: "per-kelvin", rate: { type: "normal", mean: -0.5, sd: 0.3 } } };
    expect(() => lens({ profiles: [flood, reckless], warmingAtHorizons: [constant(500, 2)] })).toThrow(
      /^perils\[1\]\.scaling\.rate drew .* rates must stay above -1/,
    );
  });
});

describe("assemblePerilResult", () => {
  it("lists the portfolio rows no profile projects", () => {
    const pathways = [lens({ profiles: [flood, heat], portfolio })];
    const result = assemblePerilResult([flood, heat], portfolio, pathways);
    expect(result.portfolioId).toBe("demo");
    expect(result.unmatchedRows).toEqual([{ region: "South Fen", peril: "wind" }]);
    expect(assemblePerilResult([flood], null, pathways).portfolioId).toBeNull();
  });
});

describe("table profiles with return periods", () => {
  const points = (heat.scaling as { points: { warming: number; multiplier: number }[] }).points;
  /** AR6 WGI SPM Figure SPM.6 50-year hot extreme, times per 50 years at 0/1/1.5/2/4 °C (secondary reproductions of the figure). */
  const fifty = [
    { warming: 0, multiplier: 1 },
    { warming: 1, multiplier: 4.8 },
    { warming: 1.5, multiplier: 8.6 },
    { warming: 2, multiplier: 13.9 },
    { warming: 4, multiplier: 39.2 },
  ];
  const both: PerilProfile = {
    ...heat,
    scaling: { kind: "table", tables: [{ returnPeriod: 10, points }, { returnPeriod: 50, points: fifty }], beyondTable: "hold" },
  };
  const lens = (profile: PerilProfile, warming: number[], weights: number[] | null = null) =>
    applyPerilLens({
      pathwayId: "p",
      seed: "s",
      sampling: "monte-carlo",
      profiles: [profile],
      portfolio,
      horizons: [2100],
      warmingAtHorizons: [Float64Array.from(warming)],
      weights: weights ? Float64Array.from(weights) : null,
      percentiles: [50],
    }).profiles[0]!;

  it("reads a table saved without a return period as one 10-year table: same numbers as before, flagged", () => {
    const legacy = lens(heat, [1, 2, 3]);
    const stated = lens({ ...heat, scaling: { kind: "table", tables: [{ returnPeriod: 10, points }], beyondTable: "hold" } }, [1, 2, 3]);
    expect(legacy.horizons).toEqual(stated.horizons);
    expect(legacy.table).toMatchObject({ returnPeriods: [10], readOutside: [100, 200] });
    expect(legacy.multiplierReturnPeriod).toBeNull();
  });

  it("uses the 50-year table for the 1-in-100 and 1-in-200 events when held beyond it, the 10-year table for AAL", () => {
    const result = lens(both, [2]);
    const h = result.horizons[0]!;
    expect(h.multiplier.p50).toBe(5.6);
    expect(h.tailMultipliers!["100"].p50).toBe(13.9);
    expect(h.returnPeriods!["100"].p50).toBeCloseTo(100 / 13.9, 12);
    expect(result.multiplierReturnPeriod).toBe(10);
    expect(result.table).toMatchObject({ returnPeriods: [10, 50], warmingRange: [0, 4], readOutside: [100, 200] });
    const row = h.losses[0]!;
    expect(row.aal.p50).toBeCloseTo(4 * 5.6, 12);
    // 1-in-100 after scaling = baseline loss at 100 · 13.9 years (log-linear through 80 and 110).
    expect(row.loss100.p50).toBeCloseTo(80 + 30 * Math.log2(13.9), 9);
  });

  it("reports the weighted share of members beyond the table's warming range", () => {
    expect(lens(both, [1, 2, 4.5, 5]).horizons[0]!.beyondTable).toEqual({ below: 0, above: 0.5 });
    // Weights 1, 1, 2, 0: above = 2 / 4.
    expect(lens(both, [1, 2, 4.5, 5], [1, 1, 2, 0]).horizons[0]!.beyondTable).toEqual({ below: 0, above: 0.5 });
    expect(lens(both, [1, 2, 4.5, 5], [1, 1, 0, 2]).horizons[0]!.beyondTable).toEqual({ below: 0, above: 0.5 });
    expect(lens(both, [1, 2, 4.5, 5], [3, 1, 0, 0]).horizons[0]!.beyondTable).toEqual({ below: 0, above: 0 });
    expect(lens(flood, [1, 5]).horizons[0]!.beyondTable).toBeNull();
  });
});
