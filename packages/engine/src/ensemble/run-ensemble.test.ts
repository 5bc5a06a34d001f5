import { describe, expect, it } from "vitest";
import { quantile } from "d3-array";
import { twoLayerPropagator } from "../climate/two-layer-propagator.js";
import { preparePlan } from "./prepare-plan.js";
import { runEnsemble } from "./run-ensemble.js";
import { SETUP_SHARE } from "./progress-share.js";
import { baseSpec, fixedClimate, rampPathway } from "./test-support/specs.js";

// Standard normal quantiles, scipy.stats.norm.ppf (SciPy 1.17).
const Z: Record<string, number> = { p5: -1.644853627, p17: -0.9541652531, p50: 0, p83: 0.9541652531, p95: 1.644853627 };

function hasNonFinite(value: unknown): boolean {
  if (typeof value === "number") return !Number.isFinite(value);
  if (Array.isArray(value)) return value.some(hasNonFinite);
  if (value && typeof value === "object") return Object.values(value).some(hasNonFinite);
  return false;
}

// Ensembles of thousands of members: a generous timeout for a busy shared machine.
describe("runEnsemble", { timeout: 60_000 }, () => {
  it("with only an agent scale uncertain, percentiles = deterministic response × (1 + sd·z_p)", () => {
    // Closed form: the model is linear in forcing, so a member whose only forcing agent is
    // scaled by s has anomaly s·D(t); with s ~ Normal(1, 0.2) the p-percentile is D(t)(1 + 0.2 z_p).
    // Not the CO2 scale: it also sets each member's feedback (λ = scale_co2 · F2x / ECS).
    const pathway = { ...rampPathway(), agents: { ozone: { erf: (rampPathway().agents.co2 as { erf: number[] }).erf } } };
    const common = baseSpec({ pathways: [pathway], horizons: [], thresholds: [] });
    const deterministic = runEnsemble({
      ...common,
      members: 1,
      model: { ...common.model, climate: fixedClimate(), agents: {} },
    }).pathways[0]!.temperature.p50!;
    const result = runEnsemble({
      ...common,
      members: 20_000,
      model: { ...common.model, climate: fixedClimate(), agents: { ozone: { scale: { type: "normal", mean: 1, sd: 0.2 } } } },
    });
    const temperature = result.pathways[0]!.temperature;
    for (const t of [200, 280, 350]) {
      for (const key of Object.keys(Z)) {
        // Latin hypercube: sample percentiles sit within about 1e-4 of the exact ones at n = 20,000.
        expect(temperature[key]![t]!).toBeCloseTo(deterministic[t]! * (1 + 0.2 * Z[key]!), 3);
      }
    }
  });

  it("yearly percentiles equal d3-array quantile (R-7) over members simulated independently", () => {
    // Reference: d3-array quantile is R type 7; each member is re-simulated here with the
    // climate module's propagator, outside the streaming runner.
    const spec = baseSpec({ members: 301, sampling: "monte-carlo", horizons: [2100], thresholds: [1] });
    const { plan } = preparePlan(spec);
    const names = plan.inputs.map((x) => x.name);
    const col = (name: string) => plan.columns[names.indexOf(name)]!;
    const pathway = spec.pathways[0]!;
    const co2 = (pathway.agents.co2 as { erf: number[] }).erf;
    const aerosol = (pathway.agents["aerosol-cloud"] as { erf: number[] }).erf;
    const years = co2.length;
    const anomalies: number[][] = Array.from({ length: years }, () => []);
    for (let m = 0; m < spec.members; m++) {
      const p = twoLayerPropagator({
        lambda: col("f2x")[m]! / col("ecs")[m]!,
        upperHeatCapacity: col("upperHeatCapacity")[m]!,
        deepHeatCapacity: col("deepHeatCapacity")[m]!,
        heatExchange: col("heatExchange")[m]!,
        deepEfficacy: col("deepEfficacy")[m]!,
      });
      const scale = col("aerosol-cloud")[m]!;
      let x = 0;
      let y = 0;
      const upper: number[] = [];
      for (let t = 0; t < years; t++) {
        const f = co2[t]! + scale * aerosol[t]!;
        // The year's mean upper-layer temperature (exact, from the state at the year's start).
        upper.push(p.m11 * x + p.m12 * y + p.r1 * f);
        [x, y] = [p.a11 * x + p.a12 * y + p.b1 * f, p.a21 * x + p.a22 * y + p.b2 * f];
      }
      const baseline = upper.slice(100, 151).reduce((s, v) => s + v, 0) / 51;
      upper.forEach((v, t) => anomalies[t]!.push(v - baseline));
    }
    const result = runEnsemble(spec).pathways[0]!;
    for (const t of [0, 120, 260, 350]) {
      for (const [key, p] of [["p5", 0.05], ["p17", 0.17], ["p50", 0.5], ["p83", 0.83], ["p95", 0.95]] as const)
        expect(result.temperature[key]![t]!).toBeCloseTo(quantile(anomalies[t]!, p)!, 10);
      const above = anomalies[t]!.filter((v) => v > 1).length / spec.members;
      expect(result.exceedance["1"]![t]!).toBeCloseTo(above, 12);
    }
    const firstAbove = anomalies.findIndex((row) => row.some((v) => v > 1));
    expect(result.crossing["1"]!.p5).toBeGreaterThanOrEqual(1750 + firstAbove);

    // First-crossing histogram: each member's first year strictly above 1 K, counted here
    // member by member from the re-simulated anomalies (the crossing rule of advance-year.ts).
    const firstYearCounts = new Array<number>(years).fill(0);
    let never = 0;
    for (let m = 0; m < spec.members; m++) {
      const t = anomalies.findIndex((row) => row[m]! > 1);
      if (t < 0) never++;
      else firstYearCounts[t]!++;
    }
    const share = result.crossingShare!["1"]!;
    expect(share).toHaveLength(years);
    share.forEach((s, t) => expect(s).toBeCloseTo(firstYearCounts[t]! / spec.members, 12));
    expect(result.crossing["1"]!.never).toBeCloseTo(never / spec.members, 12);
  });

  it("a constraint narrows the ECS spread and moves the weighted window warming toward the evidence", () => {
    const spec = baseSpec({ members: 4000, horizons: [2050] });
    const prior = runEnsemble(spec);
    const windowPrior = prior.pathways[0]!; // no constraint block without a constraint
    expect(windowPrior.constraint).toBeNull();
    const constrained = runEnsemble({
      ...spec,
      // A tight likelihood (no internal variability) so the weighted window warming lands near 0.9.
      model: { ...spec.model, constraint: { from: 2011, to: 2020, observed: 0.9, sd: 0.08, internalVariability: 0 } },
    });
    const c = constrained.pathways[0]!.constraint!;
    expect(c.ecsPosterior.p95! - c.ecsPosterior.p5!).toBeLessThan(c.ecsPrior.p95! - c.ecsPrior.p5!);
    expect(Math.abs(c.windowWarmingPosterior.p50! - 0.9)).toBeLessThan(Math.abs(c.windowWarmingPrior.p50! - 0.9));
    expect(c.windowWarmingPosterior.p50!).toBeCloseTo(0.9, 1);
    expect(c.effectiveMembers).toBeLessThan(spec.members);
    expect(constrained.effectiveMembers).toBe(c.effectiveMembers);
  });

  it("same seed gives the same resultHash; another seed a different one; no NaN anywhere", () => {
    const spec = baseSpec({ members: 300 });
    const a = runEnsemble(spec);
    const b = runEnsemble(structuredClone(spec));
    expect(b.resultHash).toBe(a.resultHash);
    expect(b.inputHash).toBe(a.inputHash);
    const c = runEnsemble({ ...spec, seed: "another seed" });
    expect(c.resultHash).not.toBe(a.resultHash);
    expect(c.inputHash).not.toBe(a.inputHash);
    expect(hasNonFinite(a)).toBe(false);
    expect(a.resultHash).toMatch(/^[0-9a-f]{64}$/);
  });

  it("a run's numbers do not depend on the run before it on this thread, and the next run leaves its result as it was", () => {
    // The next run reuses a finished run's memory (kernel-memory.ts): values left in it must
    // not leak into sums or tallies, and no result may be a view into it.
    const spec = baseSpec({ members: 3_001, thresholds: [1.5, 2], horizons: [2050, 2100] });
    const other = baseSpec({
      seed: "other",
      members: 4_500,
      thresholds: [1, 3],
      horizons: [2030],
      model: { ...baseSpec().model, constraint: { from: 2011, to: 2020, observed: 1.0, sd: 0.1, internalVariability: 0.21 } },
    });
    const first = runEnsemble(spec);
    const text = JSON.stringify(first);
    runEnsemble(other);
    const again = runEnsemble(spec);
    expect(again).toEqual(first);
    expect(JSON.stringify(first)).toBe(text);
  });

  it("defaults written out or left out give the same inputHash", () => {
    const spec = baseSpec({ members: 50 });
    const { baseline: _b, percentiles: _p, thresholds: _t, horizons: _h, ...rest } = spec;
    expect(runEnsemble(rest).inputHash).toBe(runEnsemble(spec).inputHash);
  });

  it("implied TCR of a fixed climate equals the closed form (Geoffroy et al. 2013a ramp solution, computed: 2.0290 K for F2x = 3.71)", () => {
    const spec = baseSpec({ members: 3, model: { ...baseSpec().model, climate: fixedClimate(), agents: {} } });
    const result = runEnsemble(spec);
    expect(result.implied.tcr.p50).toBeCloseTo(2.029, 3);
    expect(result.implied.ecs.p50).toBeCloseTo(3.71 / 1.13, 10);
  });

  it("crossing years: percentiles among never-crossers are null and the never share is reported", () => {
    const spec = baseSpec({ members: 400, thresholds: [0.5, 1.5, 50] });
    const crossing = runEnsemble(spec).pathways[0]!.crossing;
    expect(crossing["50"]).toEqual({ p5: null, p17: null, p50: null, p83: null, p95: null, never: 1 });
    const low = crossing["0.5"]!;
    expect(low.never).toBeLessThan(0.05);
    expect(low.p5!).toBeLessThanOrEqual(low.p50!);
    expect(low.p50!).toBeGreaterThan(1900);
  });

  it("reports set-up progress before the first year is simulated, within set-up's share of the bar", () => {
    const fractions: number[] = [];
    runEnsemble(baseSpec({ members: 20 }), { onProgress: (f) => fractions.push(f) });
    const setup = fractions.filter((f) => f <= SETUP_SHARE);
    // One report per sampled input and one for the correlation step and the end of set-up.
    expect(setup.length).toBeGreaterThanOrEqual(3);
    expect(fractions[0]).toBeGreaterThan(0);
    expect(setup.at(-1)).toBe(SETUP_SHARE);
  });

  it("reports progress and can be cancelled", () => {
    const fractions: number[] = [];
    runEnsemble(baseSpec({ members: 20 }), { onProgress: (f) => fractions.push(f) });
    expect(fractions.at(-1)).toBe(1);
    expect(fractions.every((f, i) => i === 0 || f >= fractions[i - 1]!)).toBe(true);
    expect(() => runEnsemble(baseSpec({ members: 20 }), { shouldCancel: () => true })).toThrow(/cancelled/);
  });
});
