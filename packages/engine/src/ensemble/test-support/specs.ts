import type { Distribution, RunSpec } from "../../spec/types.js";

export const fixed = (value: number): Distribution => ({ type: "fixed", value });

/** A rising CO2-like ERF ramp over 1750–2100 (invented, smooth), and a small negative aerosol series. */
export function rampPathway(id = "ramp", startYear = 1750, years = 351): RunSpec["pathways"][number] {
  return {
    id,
    name: `Test pathway ${id}`,
    startYear,
    agents: {
      co2: { erf: Array.from({ length: years }, (_, t) => 3.5 * (t / (years - 1)) ** 2.5) },
      "aerosol-cloud": { erf: Array.from({ length: years }, (_, t) => -0.9 * (t / (years - 1)) ** 3) },
    },
  };
}

/** Illustrative CMIP5-mean-like climate (C = 7.3, C0 = 106, λ = 1.13, γ = 0.73, ε = 1; Geoffroy et al. 2013a means, from memory) with F2x = 3.71. */
export function fixedClimate(): RunSpec["model"]["climate"] {
  return {
    ecs: fixed(3.71 / 1.13),
    f2x: fixed(3.71),
    upperHeatCapacity: fixed(7.3),
    deepHeatCapacity: fixed(106),
    heatExchange: fixed(0.73),
    deepEfficacy: fixed(1),
  };
}

/** An uncertain climate like the W1 workload's (bench-reference/README.md). */
export function uncertainClimate(): RunSpec["model"]["climate"] {
  return {
    ecs: { type: "lognormal", median: 3, logSd: 0.3 },
    f2x: { type: "normal", mean: 3.93, sd: 0.24 },
    upperHeatCapacity: { type: "truncated-normal", mean: 8, sd: 1, min: 3, max: 20 },
    deepHeatCapacity: { type: "truncated-normal", mean: 100, sd: 20, min: 20, max: 300 },
    heatExchange: { type: "truncated-normal", mean: 0.7, sd: 0.1, min: 0.2, max: 2 },
    deepEfficacy: { type: "truncated-normal", mean: 1.2, sd: 0.2, min: 0.5, max: 3 },
  };
}

export function baseSpec(overrides: Partial<RunSpec> = {}): RunSpec {
  return {
    seed: "test-seed",
    members: 500,
    sampling: "latin-hypercube",
    baseline: [1850, 1900],
    percentiles: [5, 17, 50, 83, 95],
    thresholds: [1.5, 2, 3],
    horizons: [2030, 2050, 2100],
    pathways: [rampPathway()],
    model: {
      climate: uncertainClimate(),
      agents: { "aerosol-cloud": { scale: { type: "normal", mean: 1, sd: 0.5 } } },
      correlations: [],
      constraint: null,
      forcingExpression: "ar6",
    },
    ...overrides,
  };
}
