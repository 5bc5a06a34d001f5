import { describe, expect, it } from "vitest";
import { applyDefaults } from "../spec/apply-defaults.js";
import { constraintWeights, likelihoodSd } from "./constraint-weights.js";
import { runEnsemble } from "./run-ensemble.js";
import { baseSpec } from "./test-support/specs.js";

// Ensembles of thousands of members: a generous timeout for a busy shared machine.
describe("constraint likelihood with internal variability", { timeout: 60_000 }, () => {
  it("weights members by a normal likelihood with sd √(sd_obs² + sd_iv²), largest weight 1", () => {
    // Observed 1.09 K with sd 0.076 (IPCC AR6 WGI SPM A.1.2, 0.95–1.20 read as 5–95 %) and
    // internal variability 0.21 K: total sd √(0.076² + 0.21²) = 0.22333 (computed).
    const constraint = { from: 2011, to: 2020, observed: 1.09, sd: 0.076, internalVariability: 0.21 };
    const sd = Math.sqrt(0.076 ** 2 + 0.21 ** 2);
    expect(likelihoodSd(constraint)).toBeCloseTo(0.22333, 5);
    const window = Float64Array.from([1.09, 0.8, 1.5, 1.2]);
    const out = new Float64Array(4);
    const { totalWeight } = constraintWeights(window, constraint, out);
    window.forEach((x, m) => expect(out[m]).toBeCloseTo(Math.exp(-0.5 * ((x - 1.09) / sd) ** 2), 14));
    expect(totalWeight).toBeCloseTo(out.reduce((a, b) => a + b, 0), 14);
  });

  it("defaults internal variability to 0.21 K (AR6 WGI SPM A.1.3: −0.2 to +0.2 °C likely, read as 17–83 %) and reports it", () => {
    // 0.2 / z(0.83) = 0.2 / 0.9541652531 = 0.2096 → 0.21 (standard normal quantile).
    expect(Math.abs(0.2 / 0.9541652531 - 0.21)).toBeLessThan(0.001);
    const input = baseSpec({ members: 200 });
    const spec = applyDefaults({ ...input, model: { ...input.model, constraint: { from: 2011, to: 2020, observed: 1.0, sd: 0.08 } } });
    expect(spec.model.constraint!.internalVariability).toBe(0.21);
    const result = runEnsemble(spec).pathways[0]!.constraint!;
    expect(result.internalVariability).toBe(0.21);
    expect(result.likelihoodSd).toBeCloseTo(Math.sqrt(0.08 ** 2 + 0.21 ** 2), 15);
  });
});
