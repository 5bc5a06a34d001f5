import { describe, expect, it } from "vitest";
import type { RunSpec } from "../spec/types.js";
import { runEnsemble } from "./run-ensemble.js";
import { baseSpec, fixedClimate } from "./test-support/specs.js";

/*
 * With the climate fixed, the two-layer model is linear in forcing, so a member's warming at a
 * horizon is Σ_k s_k·D_k, D_k the warming agent k's series alone causes at scale 1 (not CO2:
 * its scale also sets the member's feedback). For independent scales s_k ~ Normal(1, sd_k)
 * the first-order variance shares are D_k² sd_k² / Σ_j D_j² sd_j² and they add up to 1
 * (closed form of a linear model; Saltelli et al. 2008, Global Sensitivity Analysis: The
 * Primer, Section 1.2 — from memory).
 */
const YEARS = 351;
const series = (amplitude: number, power: number) => Array.from({ length: YEARS }, (_, t) => amplitude * (t / (YEARS - 1)) ** power);
const AGENTS = {
  ozone: { erf: series(0.6, 2) },
  "aerosol-cloud": { erf: series(-1.2, 3) },
  "land-use": { erf: series(-0.3, 1.5) },
  "other-wmghg": { erf: series(2.5, 2.5) },
};
const SDS = { ozone: 0.5, "aerosol-cloud": 0.6, "land-use": 0.5, "other-wmghg": 0.1 } as const;

function spec(agents: Partial<typeof AGENTS>, members: number, scales: boolean): RunSpec {
  const base = baseSpec();
  return baseSpec({
    members,
    thresholds: [],
    pathways: [{ id: "linear", name: "Linear", startYear: 1750, agents }],
    model: {
      ...base.model,
      climate: fixedClimate(),
      agents: scales
        ? Object.fromEntries(Object.keys(agents).map((a) => [a, { scale: { type: "normal", mean: 1, sd: SDS[a as keyof typeof SDS] } }]))
        : {},
    },
  });
}

// Ensembles of thousands of members: a generous timeout for a busy shared machine.
describe("sensitivity budget", { timeout: 60_000 }, () => {
  it("variance shares of forcing scales match the linear closed form at every horizon", () => {
    const result = runEnsemble(spec(AGENTS, 20_000, true)).pathways[0]!;
    const alone = Object.fromEntries(
      Object.keys(AGENTS).map((a) => [a, runEnsemble(spec({ [a]: AGENTS[a as keyof typeof AGENTS] }, 1, false)).pathways[0]!.horizons]),
    );
    for (const [h, year] of [2030, 2050, 2100].entries()) {
      const parts = Object.keys(AGENTS).map((a) => (alone[a]![h]!.temperature.p50! * SDS[a as keyof typeof SDS]) ** 2);
      const total = parts.reduce((s, v) => s + v, 0);
      Object.keys(AGENTS).forEach((a, k) => {
        const entry = result.sensitivity.find((e) => e.input === a && e.horizon === year)!;
        expect(Math.abs(entry.varianceShare! - parts[k]! / total)).toBeLessThan(0.01);
      });
      const sum = result.sensitivity.filter((e) => e.horizon === year).reduce((s, e) => s + e.varianceShare!, 0);
      expect(Math.abs(sum - 1)).toBeLessThan(0.02);
    }
  });

  it("under a constraint the budget is weighted: an input the constraint pins down loses its share", () => {
    // The constraint window's warming is dominated by the aerosol scale; weighting narrows it,
    // so its weighted share falls below its unweighted share (the other scales' grow).
    const unweighted = spec(AGENTS, 5_000, true);
    const weighted = { ...unweighted, model: { ...unweighted.model, constraint: { from: 2011, to: 2020, observed: 1.0, sd: 0.05 } } };
    const before = runEnsemble(unweighted).pathways[0]!.sensitivity.find((e) => e.input === "aerosol-cloud" && e.horizon === 2030)!;
    const after = runEnsemble(weighted).pathways[0]!.sensitivity.find((e) => e.input === "aerosol-cloud" && e.horizon === 2030)!;
    expect(after.varianceShare!).toBeLessThan(before.varianceShare! - 0.1);
  });
});
