import { describe, expect, it } from "vitest";
import { rampResponse } from "../climate/two-layer-modes.js";
import type { RunSpec } from "../spec/types.js";
import { expressionDoublingForcing } from "./doubling-forcing.js";
import { runEnsemble } from "./run-ensemble.js";
import { baseSpec, fixed } from "./test-support/specs.js";

/*
 * A member's feedback comes from the forcing it feels at doubled CO2, λ = scale_co2 · F2x / ECS,
 * so that its equilibrium warming for doubled CO2 is its sampled ECS. Equilibrium of the
 * two-layer model under a constant forcing F is T = F/λ for any efficacy (Held et al. 2010;
 * Geoffroy et al. 2013b, eq. for the steady state), so an abrupt doubling held long enough must
 * give back the sampled ECS distribution percentile for percentile.
 */

const YEARS = 1000;
const PRE = 51; // 1750–1800 at the 1750 level: the baseline period, zero forcing

/** Small heat capacities so even the slowest member is at equilibrium to ~1e-12 after 949 years. */
function fastClimate(ecs: RunSpec["model"]["climate"]["ecs"], f2x: RunSpec["model"]["climate"]["f2x"]): RunSpec["model"]["climate"] {
  return {
    ecs,
    f2x,
    upperHeatCapacity: { type: "uniform", min: 1, max: 3 },
    deepHeatCapacity: { type: "uniform", min: 5, max: 10 },
    heatExchange: { type: "uniform", min: 0.5, max: 1 },
    deepEfficacy: { type: "uniform", min: 1, max: 1.5 },
  };
}

function doublingSpec(co2: { ppm: number[] } | { erf: number[] }, climate: RunSpec["model"]["climate"]): RunSpec {
  const base = baseSpec();
  return baseSpec({
    members: 2001,
    baseline: [1750, 1800],
    horizons: [1750 + YEARS - 1],
    thresholds: [],
    pathways: [{ id: "double", name: "Abrupt doubling", startYear: 1750, agents: { co2 } }],
    model: {
      ...base.model,
      climate,
      agents: { co2: { scale: { type: "normal", mean: 1, sd: 0.15 } } },
      correlations: [{ between: ["ecs", "co2"], rank: 0.3 }],
    },
  });
}

const step = (before: number, after: number) => Array.from({ length: YEARS }, (_, t) => (t < PRE ? before : after));
// ECS as the assessed 2–5 K very likely range about 3 K (IPCC AR6 WGI SPM A.4.4), two-piece lognormal.
const ecs = { type: "range", p50: 3, low: 2, high: 5, coverage: 90, shape: "lognormal" } as const;

function expectEquilibriumIsEcs(spec: RunSpec): void {
  const result = runEnsemble(spec);
  const equilibrium = result.pathways[0]!.horizons[0]!.temperature;
  for (const key of Object.keys(result.implied.ecs)) {
    // implied.ecs holds the sampled ECS's percentiles; the equilibrium's are the same to rounding.
    expect(Math.abs(equilibrium[key]! - result.implied.ecs[key]!)).toBeLessThan(1e-9);
  }
}

// Ensembles of thousands of members: a generous timeout for a busy shared machine.
describe("feedback from the forcing a member feels at doubled CO2", { timeout: 60_000 }, () => {
  it("a CO2 doubling given in ppm, held to equilibrium, gives back the sampled ECS percentiles (f2x sampled, unused)", () => {
    // The pathway's doubling is the expression's: 278.3 → 556.6 ppm (AR6 1750 level, AR6 WGI TS §TS.2.2).
    expectEquilibriumIsEcs(doublingSpec({ ppm: step(278.3, 556.6) }, fastClimate(ecs, { type: "normal", mean: 3.93, sd: 0.3 })));
  });

  it("a CO2 doubling given as ERF equal to f2x, held to equilibrium, gives back the sampled ECS percentiles", () => {
    expectEquilibriumIsEcs(doublingSpec({ erf: step(0, 3.93) }, fastClimate(ecs, fixed(3.93))));
  });

  it("the AR6 expression's doubled-CO2 forcing is the assessed 3.93 W m-2 (Forster et al. 2021, AR6 WGI Ch. 7 Section 7.3.2.1)", () => {
    // Assessed ERF for 2×CO2: 3.93 ± 0.47 W m-2; the refit reproduces it to 3 significant figures.
    expect(Math.abs(expressionDoublingForcing("ar6") - 3.93)).toBeLessThan(0.01);
    // Myhre et al. (1998): 5.35 ln 2 = 3.708 W m-2.
    expect(expressionDoublingForcing("myhre-1998")).toBeCloseTo(5.35 * Math.LN2, 12);
  });

  it("implied TCR is the closed-form ramp response at year 70 with the member's felt F2x (Geoffroy et al. 2013a)", () => {
    // Every input fixed; the CO2 scale 1.2 multiplies both the 1 %/yr forcing and λ.
    const climate = { ecs: fixed(3), f2x: fixed(3.6), upperHeatCapacity: fixed(7.3), deepHeatCapacity: fixed(106), heatExchange: fixed(0.73), deepEfficacy: fixed(1.28) };
    for (const [co2, f2x] of [
      [{ ppm: step(278.3, 556.6) }, expressionDoublingForcing("ar6")],
      [{ erf: step(0, 3.6) }, 3.6],
    ] as const) {
      const spec = doublingSpec(co2, climate);
      spec.members = 3;
      spec.model.agents = { co2: { scale: fixed(1.2) } };
      spec.model.correlations = [];
      const felt = 1.2 * f2x;
      const p = { lambda: felt / 3, upperHeatCapacity: 7.3, deepHeatCapacity: 106, heatExchange: 0.73, deepEfficacy: 1.28 };
      // 1 %/yr CO2: F(t) = F2x·t·ln(1.01)/ln 2 (AR6 WGI Ch. 7 Section 7.5 defines TCR at year 70).
      const tcr = rampResponse(p, (felt * Math.log(1.01)) / Math.LN2, 70).upper;
      const result = runEnsemble(spec);
      expect(result.implied.tcr.p50!).toBeCloseTo(tcr, 10);
      expect(result.implied.ecs.p50!).toBe(3);
    }
  });

  it("a run with a ppm pathway and an ERF pathway steps each with its own feedback", () => {
    const spec = doublingSpec({ ppm: step(278.3, 556.6) }, fastClimate(ecs, fixed(3.93)));
    spec.pathways.push({ id: "erf", name: "ERF doubling", startYear: 1750, agents: { co2: { erf: step(0, 3.93) } } });
    spec.members = 1001;
    const result = runEnsemble(spec);
    for (const pathway of result.pathways)
      for (const key of Object.keys(result.implied.ecs))
        expect(Math.abs(pathway.horizons[0]!.temperature[key]! - result.implied.ecs[key]!)).toBeLessThan(1e-9);
  });
});
