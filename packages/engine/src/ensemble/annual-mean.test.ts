import { describe, expect, it } from "vitest";
import { twoLayerModes } from "../climate/two-layer-modes.js";
import type { TwoLayerParameters } from "../climate/two-layer-parameters.js";
import type { RunSpec } from "../spec/types.js";
import { runEnsemble } from "./run-ensemble.js";
import { baseSpec, fixed } from "./test-support/specs.js";

/*
 * A year's reported temperature and imbalance are the exact MEAN over that year, as observed
 * records and assessments report a year (e.g. IPCC AR6 WGI SPM A.1.2's 2011–2020 mean).
 * Check: the integral over each year of the analytic two-layer step response of Geoffroy et al.
 * (2013a), J. Climate 26, 1841–1857 (step forcing F from t = 0):
 *   T(t)  = F/λ · [1 − a_f e^(−t/τ_f) − a_s e^(−t/τ_s)]
 *   T0(t) = F/λ · [1 − a_f φ_f e^(−t/τ_f) − a_s φ_s e^(−t/τ_s)]
 * so ∫_{k−1}^{k} T dt = F/λ · (1 − a_f τ_f (e^(−(k−1)/τ_f) − e^(−k/τ_f)) − a_s τ_s (…)), and likewise
 * for T0 with the φ factors (efficacy: Geoffroy et al. 2013b).
 */

const PARAMETERS: TwoLayerParameters = { lambda: 1.13, upperHeatCapacity: 7.3, deepHeatCapacity: 106, heatExchange: 0.73, deepEfficacy: 1 };

function annualMeans(p: TwoLayerParameters, forcing: number, k: number): { upper: number; deep: number } {
  const m = twoLayerModes(p);
  const decay = (tau: number) => tau * (Math.exp(-(k - 1) / tau) - Math.exp(-k / tau));
  const fast = m.aFast * decay(m.tauFast);
  const slow = m.aSlow * decay(m.tauSlow);
  return {
    upper: (forcing / p.lambda) * (1 - fast - slow),
    deep: (forcing / p.lambda) * (1 - m.phiFast * fast - m.phiSlow * slow),
  };
}

/** Year 1750 at zero forcing (the baseline), then a step of 1 W m-2 held from 1751 on. */
function stepSpec(p: TwoLayerParameters, overrides: Partial<RunSpec> = {}): RunSpec {
  const years = 151;
  const spec = baseSpec({
    members: 1,
    baseline: [1750, 1750],
    thresholds: [0.5],
    horizons: [],
    pathways: [{ id: "step", name: "Step", startYear: 1750, agents: { other: { erf: Array.from({ length: years }, (_, t) => (t === 0 ? 0 : 1)) } } }],
    ...overrides,
  });
  // λ = F2x / ECS with F2x = 1: the feedback is exactly p.lambda's reciprocal pair.
  spec.model = {
    ...spec.model,
    climate: {
      ecs: fixed(1 / p.lambda),
      f2x: fixed(1),
      upperHeatCapacity: fixed(p.upperHeatCapacity),
      deepHeatCapacity: fixed(p.deepHeatCapacity),
      heatExchange: fixed(p.heatExchange),
      deepEfficacy: fixed(p.deepEfficacy),
    },
    agents: {},
  };
  return spec;
}

// Ensembles of thousands of members: a generous timeout for a busy shared machine.
describe("annual means", { timeout: 60_000 }, () => {
  it("a step of 1 W m-2 gives each year's mean of the analytic step response (Geoffroy et al. 2013a)", () => {
    const result = runEnsemble(stepSpec(PARAMETERS)).pathways[0]!;
    // Integrals of the analytic solution for C = 7.3, C0 = 106, λ = 1.13, γ = 0.73, ε = 1 (the
    // CMIP5 multi-model-mean parameters of Geoffroy et al. 2013a as remembered, used here as
    // illustrative inputs); values computed from the closed form above to 6 decimals.
    const published: [number, number][] = [
      [1, 0.063032],
      [2, 0.169827],
      [5, 0.367187],
      [10, 0.494288],
      [20, 0.550479],
      [50, 0.592608],
      [100, 0.647264],
    ];
    for (const [k, value] of published) {
      expect(result.temperature.p50![k]!).toBeCloseTo(value, 6);
      expect(Math.abs(result.temperature.p50![k]! - annualMeans(PARAMETERS, 1, k).upper)).toBeLessThan(1e-13);
    }
  });

  it("the imbalance is the year's mean N = F − λT − (ε − 1)γ(T − T0), with efficacy 1.28 (Geoffroy et al. 2013b)", () => {
    const p = { ...PARAMETERS, deepEfficacy: 1.28 };
    const result = runEnsemble(stepSpec(p)).pathways[0]!;
    for (const k of [1, 3, 10, 40, 150]) {
      const { upper, deep } = annualMeans(p, 1, k);
      expect(Math.abs(result.temperature.p50![k]! - upper)).toBeLessThan(1e-13);
      const imbalance = 1 - p.lambda * upper - (p.deepEfficacy - 1) * p.heatExchange * (upper - deep);
      expect(Math.abs(result.imbalance.p50![k]! - imbalance)).toBeLessThan(1e-13);
    }
  });

  it("a threshold is crossed in the first year whose MEAN exceeds it, not the first year-end", () => {
    // End of year 10: T = 0.500631 K (Geoffroy et al. 2013a closed form), above 0.5 K; the mean
    // of year 10 is 0.494288 K, below it: the crossing is a later year.
    const result = runEnsemble(stepSpec(PARAMETERS)).pathways[0]!;
    let first = 1;
    while (annualMeans(PARAMETERS, 1, first).upper <= 0.5) first++;
    expect(first).toBeGreaterThan(10);
    expect(result.crossing["0.5"]!.p50).toBe(1750 + first);
  });

  it("the baseline and the constraint window average annual means", () => {
    const spec = stepSpec(PARAMETERS, { baseline: [1751, 1760], thresholds: [] });
    spec.model.constraint = { from: 1781, to: 1790, observed: 0.1, sd: 0.1, internalVariability: 0 };
    const result = runEnsemble(spec).pathways[0]!;
    const mean = (from: number, to: number) => {
      let s = 0;
      for (let k = from; k <= to; k++) s += annualMeans(PARAMETERS, 1, k).upper;
      return s / (to - from + 1);
    };
    const baseline = mean(1, 10);
    expect(Math.abs(result.temperature.p50![50]! - (annualMeans(PARAMETERS, 1, 50).upper - baseline))).toBeLessThan(1e-13);
    expect(Math.abs(result.constraint!.windowWarmingPrior.p50! - (mean(31, 40) - baseline))).toBeLessThan(1e-13);
  });
});
