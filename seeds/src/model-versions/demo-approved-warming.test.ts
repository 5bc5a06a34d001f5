import { runSpecSchema } from "@plumeline/contracts";
import { engineVersion, runEnsemble } from "@plumeline/engine";
import { describe, expect, it } from "vitest";
import { demoPathways } from "../pathways/harbourline-pathways.js";
import { APPROVED_REPRODUCES, demoModelVersions } from "./harbourline-core.js";

/**
 * The approved demo version run through the engine, against the assessed values and against
 * what its approval comment says it reproduces.
 * * Observed GMST 2011–2020 vs 1850–1900: 1.09 [0.95 to 1.20] K, 5–95 % (IPCC AR6 WGI SPM A.1.2).
 * * Human-induced warming 2010–2019: 1.07 [0.8 to 1.3] K, likely range (AR6 WGI SPM A.1.3).
 * * Total anthropogenic ERF 1750–2019: 2.72 [1.96 to 3.48] W m-2, 5–95 % (AR6 WGI SPM A.4.1).
 */
const OBSERVED = { p5: 0.95, p50: 1.09, p95: 1.2 };
const HUMAN_INDUCED_LIKELY = { low: 0.8, high: 1.3 };
const AR6_ERF = { p5: 1.96, p50: 2.72, p95: 3.48 };

const approved = demoModelVersions.filter((v) => v.approve);
const middle = demoPathways.find((p) => p.key === "harbourline-middle")!;

const runs = new Map<boolean, ReturnType<typeof runEnsemble>>();
function runApproved(constrained: boolean) {
  if (!runs.has(constrained)) runs.set(constrained, runOnce(constrained));
  return runs.get(constrained)!;
}

function runOnce(constrained: boolean) {
  const version = approved[0]!;
  const spec = runSpecSchema.parse({
    seed: "demo-approved-warming",
    members: 3000,
    sampling: "latin-hypercube",
    baseline: [1850, 1900],
    percentiles: [5, 17, 50, 83, 95],
    thresholds: [1.5],
    horizons: [2030],
    pathways: [{ id: middle.key, name: middle.name, startYear: middle.startYear, agents: middle.agents }],
    model: constrained ? version.body.model : { ...version.body.model, constraint: null },
  });
  return runEnsemble(spec);
}

describe("the approved demo version", () => {
  it("is the only approved one, constrained by the observed 2011–2020 warming", () => {
    expect(approved).toHaveLength(1);
    expect(approved[0]!.body.model.constraint).toMatchObject({ from: 2011, to: 2020, observed: 1.09 });
  });

  it("reproduces the observed 2011–2020 warming: weighted median within 0.03 K of 1.09, the observed 5–95 % range inside its own", () => {
    const window = runApproved(true).pathways[0]!.constraint!.windowWarmingPosterior;
    expect(Math.abs(window.p50! - OBSERVED.p50)).toBeLessThan(0.03);
    // The constraint allows a decade's internal variability (0.21 K, AR6 SPM A.1.3), so the forced
    // warming is not pinned to the observational range: the observed range must lie within the
    // ensemble's 5–95 %, and the ensemble's 17–83 % within AR6's likely human-induced range.
    expect(window.p5!).toBeLessThanOrEqual(OBSERVED.p5);
    expect(window.p95!).toBeGreaterThanOrEqual(OBSERVED.p95);
    expect(window.p17!).toBeGreaterThanOrEqual(HUMAN_INDUCED_LIKELY.low);
    expect(window.p83!).toBeLessThanOrEqual(HUMAN_INDUCED_LIKELY.high);
    // And its spread is the constraint's doing: the prior's 5–95 % is at least 0.3 K wider.
    const prior = runApproved(true).pathways[0]!.constraint!.windowWarmingPrior;
    expect(prior.p95! - prior.p5! - (window.p95! - window.p5!)).toBeGreaterThan(0.3);
    // The approval comment's numbers (measured at 5,000 members) hold at 3,000 to within 0.02 K.
    for (const k of ["p5", "p17", "p50", "p83", "p95"] as const)
      expect(Math.abs(window[k]! - APPROVED_REPRODUCES.warming2011to2020[k])).toBeLessThan(0.02);
  });

  it("leaves few members above 1.5 K in 2019 (under 6 %, weighted)", () => {
    const result = runApproved(true);
    const i = result.pathways[0]!.years.indexOf(2019);
    expect(result.pathways[0]!.exceedance["1.5"]![i]!).toBeLessThan(0.06);
  });

  it("was measured with this engine (a new engine version means re-measuring the comment's numbers)", () => {
    expect(APPROVED_REPRODUCES.engineVersion).toBe(engineVersion);
  });

  it("gives the 2019 forcing its comment states once the constraint weights the members", () => {
    const result = runApproved(true);
    const i = result.pathways[0]!.years.indexOf(2019);
    const solar = (middle.agents.solar as { erf: number[] }).erf[2019 - 1750]!;
    for (const k of ["p5", "p50", "p95"] as const)
      expect(Math.abs(result.pathways[0]!.forcing[k]![i]! - solar - APPROVED_REPRODUCES.erf2019Weighted[k])).toBeLessThan(0.03);
  });

  it("samples AR6's 2019 total anthropogenic ERF before the constraint weights it, as its comment says", () => {
    const result = runApproved(false);
    const i = result.pathways[0]!.years.indexOf(2019);
    const solar = (middle.agents.solar as { erf: number[] }).erf[2019 - 1750]!; // natural, unscaled
    const forcing = result.pathways[0]!.forcing;
    for (const k of ["p5", "p50", "p95"] as const) {
      const value = forcing[k]![i]! - solar;
      expect(Math.abs(value - AR6_ERF[k])).toBeLessThan(k === "p50" ? 0.05 : 0.12);
      expect(Math.abs(value - APPROVED_REPRODUCES.erf2019[k])).toBeLessThan(0.03);
    }
  });

  it("says only what it reproduces: the comment quotes the measured numbers and claims no AR6 ranges wholesale", () => {
    const comment = approved[0]!.approve!.comment;
    const { warming2011to2020: w, erf2019: f } = APPROVED_REPRODUCES;
    expect(comment).toContain(`${w.p50.toFixed(2)} [${w.p5.toFixed(2)}–${w.p95.toFixed(2)}] K`);
    expect(comment).toContain(`${f.p50.toFixed(2)} [${f.p5.toFixed(2)} to ${f.p95.toFixed(2)}] W m-2`);
    expect(comment).not.toMatch(/ranges reproduced/i);
  });
});
