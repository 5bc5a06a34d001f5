import { quantile } from "d3-array";
import { describe, expect, it } from "vitest";
import { createRandom } from "../random/create-random.js";
import { weightedQuantileSorted } from "../statistics/weighted-quantile.js";
import { applyPerilLens, type PerilLensInput } from "./apply-peril-lens.js";
import { assemblePerilResult } from "./assemble-peril-result.js";
import { projectRow } from "./project-losses.js";
import { sampleRates } from "./sample-rates.js";
import { perKelvinMultiplier } from "./per-kelvin-multiplier.js";
import type { PerKelvinScaling, PerilProfile, Portfolio } from "./types.js";

const PERCENTILES = [5, 17, 50, 83, 95];
const MEASURES = ["aal", "loss100", "loss200"] as const;

const flood: PerilProfile = {
  id: "flood-north",
  name: "Flood, North Vale",
  peril: "flood",
  region: "North Vale",
  metric: "severity",
  baselineWarming: 1.1,
  scaling: { kind: "per-kelvin", rate: { type: "normal", mean: 0.07, sd: 0.02 } },
};
const storms: PerilProfile = {
  id: "storm-south",
  name: "Storm frequency, South Fen",
  peril: "storm",
  region: "South Fen",
  metric: "frequency",
  baselineWarming: 1.0,
  scaling: { kind: "per-kelvin", rate: { type: "uniform", min: 0.02, max: 0.12 } },
};
const portfolio: Portfolio = {
  id: "demo",
  name: "Demo",
  rows: [
    { region: "North Vale", peril: "flood", currency: "EUR", aal: 12e6, loss100: 300e6, loss200: 420e6 },
    { region: "South Fen", peril: "storm", currency: "EUR", aal: 9e6, loss100: 200e6, loss200: 260e6 },
    // No profile: enters every member's total unchanged.
    { region: "South Fen", peril: "hail", currency: "EUR", aal: 2e6, loss100: 40e6, loss200: 50e6 },
    { region: "Westmark", peril: "flood", currency: "GBP", aal: 5e6, loss100: 90e6, loss200: 120e6 },
  ],
};

const members = 400;
const random = createRandom("totals-warming");
const warming2050 = Float64Array.from({ length: members }, () => 1.6 + 0.8 * random());
const warming2100 = Float64Array.from({ length: members }, () => 2.0 + 2.0 * random());

function lens(overrides: Partial<PerilLensInput> = {}) {
  return applyPerilLens({
    pathwayId: "p1",
    seed: "totals-test",
    sampling: "latin-hypercube",
    profiles: [flood, storms],
    portfolio,
    horizons: [2050, 2100],
    warmingAtHorizons: [warming2050, warming2100],
    weights: null,
    percentiles: PERCENTILES,
    ...overrides,
  });
}

/**
 * The independent recomputation: each member's own rate (the profile's seeded stream, as the
 * lens draws it), its multiplier from the closed form (1 + r)^(ΔT − ΔT0), each row projected
 * with projectRow, the rows of a currency added for that member — and only then percentiles.
 */
function memberTotals(h: number, currency: string, measure: (typeof MEASURES)[number]): number[] {
  const warming = [warming2050, warming2100][h]!;
  const rates = new Map([flood, storms].map((p) => [p.id, sampleRates((p.scaling as PerKelvinScaling).rate, members, "totals-test", p.id, "latin-hypercube")]));
  return Array.from({ length: members }, (_, i) =>
    portfolio.rows
      .filter((row) => row.currency === currency)
      .reduce((sum, row) => {
        const profile = [flood, storms].find((p) => p.peril === row.peril && p.region === row.region);
        if (!profile) return sum + row[measure];
        const m = perKelvinMultiplier(rates.get(profile.id)![i]!, warming[i]!, profile.baselineWarming);
        return sum + projectRow(row, profile.metric, m)[measure];
      }, 0),
  );
}

describe("portfolio totals (member by member)", () => {
  it("equal the R-7 percentiles (d3-array quantile) of each member's sum over rows, per currency", () => {
    const totals = lens().totals!;
    expect(totals.map((t) => t.currency)).toEqual(["EUR", "GBP"]);
    const eur = totals[0]!;
    expect(eur.rows).toBe(3);
    expect(eur.projectedRows).toBe(2);
    expect(eur.baseline).toEqual({ aal: 23e6, loss100: 540e6, loss200: 730e6 });
    [2050, 2100].forEach((year, h) => {
      expect(eur.horizons[h]!.year).toBe(year);
      for (const currency of ["EUR", "GBP"])
        for (const measure of MEASURES) {
          const sums = memberTotals(h, currency, measure);
          const summary = totals.find((t) => t.currency === currency)!.horizons[h]![measure];
          for (const p of PERCENTILES) expect(summary[`p${p}`]).toBeCloseTo(quantile(sums, p / 100)!, 3);
          expect(summary.mean).toBeCloseTo(sums.reduce((a, b) => a + b, 0) / members, 3);
        }
    });
    // GBP stays apart, and its one row (Westmark flood) has no profile: it enters unchanged.
    expect(totals[1]!.projectedRows).toBe(0);
    expect(totals[1]!.horizons[1]!.loss200.p95).toBe(120e6);
  });

  it("never adds percentiles: the total's 95th percentile is not the sum of the rows' 95th percentiles", () => {
    const result = lens();
    const at2100 = result.profiles.map((p) => p.horizons[1]!.losses[0]!);
    const sumOfP95 = at2100.reduce((s, l) => s + l.loss200.p95!, 0) + 50e6; // + the unprojected hail row
    const total = result.totals![0]!.horizons[1]!.loss200.p95!;
    // Independent rates per profile: the rows' 95th percentiles fall on different members, so
    // the percentile of the sum differs from the sum of percentiles (here by more than 0.1 %).
    expect(Math.abs(total / sumOfP95 - 1)).toBeGreaterThan(1e-3);
    // The mean is additive, so it agrees with the sum of the row means.
    const sumOfMeans = at2100.reduce((s, l) => s + l.aal.mean!, 0) + 2e6;
    expect(result.totals![0]!.horizons[1]!.aal.mean).toBeCloseTo(sumOfMeans, 2);
  });

  it("weights members under a constraint: percentiles are the weighted quantiles of the member sums", () => {
    const weights = Float64Array.from({ length: members }, (_, i) => (i % 3 === 0 ? 0 : 1 + (i % 5)));
    const totals = lens({ weights }).totals!;
    for (const measure of MEASURES) {
      const sums = memberTotals(1, "EUR", measure);
      const order = sums.map((_, i) => i).sort((a, b) => sums[a]! - sums[b]!);
      const sorted = Float64Array.from(order.map((i) => sums[i]!));
      const w = Float64Array.from(order.map((i) => weights[i]!));
      for (const p of PERCENTILES)
        expect(totals[0]!.horizons[1]![measure][`p${p}`]).toBeCloseTo(weightedQuantileSorted(sorted, w, p / 100), 3);
      const mean = sums.reduce((s, v, i) => s + v * weights[i]!, 0) / weights.reduce((s, v) => s + v, 0);
      expect(totals[0]!.horizons[1]![measure].mean).toBeCloseTo(mean, 3);
    }
  });

  it("refuses totals (and says why) when two profiles would project the same row; none without a portfolio", () => {
    const twin: PerilProfile = { ...flood, id: "flood-frequency", name: "Flood frequency, North Vale", metric: "frequency" };
    expect(lens({ profiles: [flood, twin] }).totals).toBeUndefined();
    const assembled = assemblePerilResult([flood, twin], portfolio, []);
    expect(assembled.totalsRefused).toMatch(/North Vale \/ flood is projected by "Flood, North Vale" and "Flood frequency, North Vale"/);
    expect(lens({ portfolio: null }).totals).toBeUndefined();
    expect(assemblePerilResult([flood], portfolio, []).totalsRefused).toBeUndefined();
  });
});
