import { runResultSchema } from "@plumeline/contracts";
import { describe, expect, it } from "vitest";
import { tableMultiplierAt } from "../peril/table-multiplier.js";
import { tablesOf } from "../peril/table-profile.js";
import type { PerilProfile, Portfolio, TableScaling } from "../peril/types.js";
import { applyDefaults } from "../spec/apply-defaults.js";
import { inputHash } from "../hash/run-hashes.js";
import { runEnsemble } from "./run-ensemble.js";
import { baseSpec, fixed, fixedClimate, rampPathway } from "./test-support/specs.js";

/**
 * The demo seed's profiles and portfolio (seeds/src/perils), loaded at run time: they live in
 * another package that depends on this one, so a static import would be a cycle.
 */
async function demoPerils(): Promise<{ demoPerilProfiles: PerilProfile[]; demoPortfolio: Portfolio }> {
  const url = new URL("../../../../seeds/src/perils/index.ts", import.meta.url).href;
  return (await import(/* @vite-ignore */ url)) as { demoPerilProfiles: PerilProfile[]; demoPortfolio: Portfolio };
}

const perKelvin = (id: string, rate: number, metric: "frequency" | "severity", baselineWarming = 1.1): PerilProfile => ({
  id,
  name: `Profile ${id}`,
  peril: "flood-heavy-rainfall",
  region: "Test Region",
  metric,
  baselineWarming,
  scaling: { kind: "per-kelvin", rate: fixed(rate) },
});

const KEYS = ["p5", "p17", "p50", "p83", "p95"] as const;

describe("runEnsemble with the peril lens", () => {
  it("applies the demo profiles and portfolio: one block per pathway, unmatched rows listed, contracts shape", async () => {
    const { demoPerilProfiles, demoPortfolio } = await demoPerils();
    const spec = baseSpec({ members: 1000, pathways: [rampPathway("a"), rampPathway("b", 1800, 301)] });
    const result = runEnsemble({ ...spec, perils: demoPerilProfiles, portfolio: demoPortfolio });
    // The shared contracts schema is the shape the API and web read.
    const parsed = runResultSchema.safeParse(result);
    expect(parsed.success).toBe(true);
    const perils = result.perils!;
    expect(perils.portfolioId).toBe(demoPortfolio.id);
    expect(perils.pathways.map((p) => p.pathwayId)).toEqual(["a", "b"]);
    // The demo portfolio's hail row has no demo profile on purpose (seeds/src/perils/demo-portfolio.ts).
    expect(perils.unmatchedRows).toEqual([{ region: "Ostrand Uplands", peril: "hail" }]);
    for (const pathway of perils.pathways) {
      expect(pathway.profiles.map((p) => p.profileId)).toEqual(demoPerilProfiles.map((p) => p.id));
      for (const profile of pathway.profiles) {
        expect(profile.horizons.map((h) => h.year)).toEqual(spec.horizons);
        expect(profile.horizons[0]!.returnPeriods === null).toBe(profile.metric === "severity");
        for (const h of profile.horizons) for (let k = 1; k < KEYS.length; k++) expect(h.multiplier[KEYS[k]!]!).toBeGreaterThanOrEqual(h.multiplier[KEYS[k - 1]!]!);
      }
      // Flood rows: one per matching (peril, region) row of the portfolio.
      expect(pathway.profiles[0]!.horizons[0]!.losses.map((l) => l.region)).toEqual(["Northmere Coast"]);
    }
    // The heat profile is a table, increasing in warming: its multiplier percentiles are the
    // table read at the warming percentiles (piecewise linear, so R-7 interpolation between
    // neighbouring members commutes with it except across a table point: tolerance 1e-6).
    const heat = demoPerilProfiles.findIndex((p) => p.scaling.kind === "table");
    const scaling = demoPerilProfiles[heat]!.scaling as TableScaling;
    // The reported multiplier is the most frequent table's (the one AAL uses).
    const table = tableMultiplierAt(tablesOf(scaling)[0]!.points, scaling.beyondTable, demoPerilProfiles[heat]!.baselineWarming);
    result.pathways.forEach((pathway, p) =>
      pathway.horizons.forEach((horizon, h) => {
        const lensed = perils.pathways[p]!.profiles[heat]!.horizons[h]!;
        for (const key of KEYS) expect(lensed.multiplier[key]!).toBeCloseTo(table(horizon.temperature[key]!), 6);
      }),
    );
  });

  it("fixed warming and a fixed rate give the closed form (1 + r)^(ΔT − ΔT0), T/m and m·AAL", () => {
    // Every member identical: the horizon warming is one number, so each summary is exact.
    const spec = baseSpec({
      members: 7,
      model: { ...baseSpec().model, climate: fixedClimate(), agents: {} },
      perils: [perKelvin("freq", 0.07, "frequency"), perKelvin("sev", 0.07, "severity")],
      portfolio: {
        id: "pf",
        name: "Test portfolio",
        rows: [{ region: "Test Region", peril: "flood-heavy-rainfall", currency: "EUR", aal: 10, loss100: 300, loss200: 420 }],
      },
    });
    const result = runEnsemble(spec);
    const lens = result.perils!.pathways[0]!;
    result.pathways[0]!.horizons.forEach((horizon, h) => {
      const warming = horizon.temperature.p50!;
      const m = 1.07 ** (warming - 1.1); // issue 5: multiplier = (1 + r)^(ΔT − ΔT0)
      const freq = lens.profiles[0]!.horizons[h]!;
      const sev = lens.profiles[1]!.horizons[h]!;
      for (const key of [...KEYS, "mean"]) {
        expect(freq.multiplier[key]!).toBeCloseTo(m, 12);
        // Return-period identity: an event of return period T becomes one of T / m.
        expect(freq.returnPeriods!["100"][key]!).toBeCloseTo(100 / m, 10);
        // Severity: AAL and tail losses scale by m (contracts PERIL_RULES).
        expect(sev.losses[0]!.aal[key]!).toBeCloseTo(10 * m, 10);
        expect(sev.losses[0]!.loss200[key]!).toBeCloseTo(420 * m, 8);
      }
    });
  });

  it("with only warming uncertain (fixed rate), multiplier percentiles are the transformed warming percentiles", () => {
    // m = 1.07^(T − 1.1) is increasing in T, so each order statistic of m is the transform of
    // the same order statistic of T; R-7 interpolation between neighbouring order statistics
    // (about 1e-3 K apart here) differs from transforming the interpolated T by far less than 1e-7.
    const spec = baseSpec({ members: 2000, perils: [perKelvin("freq", 0.07, "frequency")] });
    const result = runEnsemble(spec);
    const lens = result.perils!.pathways[0]!.profiles[0]!;
    result.pathways[0]!.horizons.forEach((horizon, h) => {
      for (const key of KEYS) expect(lens.horizons[h]!.multiplier[key]!).toBeCloseTo(1.07 ** (horizon.temperature[key]! - 1.1), 7);
    });
  });

  it("perils and portfolio enter the inputHash only when given; bad peril input names the field", () => {
    const spec = baseSpec({ members: 20 });
    expect("perils" in applyDefaults(spec)).toBe(false);
    expect("portfolio" in applyDefaults(spec)).toBe(false);
    const withPerils = { ...spec, perils: [perKelvin("freq", 0.07, "frequency")] };
    expect(inputHash(applyDefaults(withPerils))).not.toBe(inputHash(applyDefaults(spec)));
    expect(runEnsemble(spec).perils).toBeUndefined();
    expect(() => runEnsemble({ ...spec, perils: [perKelvin("x", 0.07, "frequency", 3.5)] })).toThrow(/^perils\[0\]\.baselineWarming must lie between 0 and 3 K/);
    expect(() => runEnsemble({ ...withPerils, baseline: [1861, 1890] })).toThrow(/^baseline must be \[1850, 1900\] when perils are given/);
  });
});
