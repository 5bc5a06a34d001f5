import { kishEffectiveSize } from "../statistics/index.js";
import { SpecError } from "../spec/spec-error.js";
import type { ObservationalConstraint } from "../spec/types.js";

/**
 * Importance weights of an observational constraint: each member's Gaussian likelihood of
 * the observed warming given its own mean anomaly over the window,
 * w = exp(−½((x − observed)/σ)²) with σ = √(sd² + internalVariability²) — a member's forced
 * warming plus internal variability plus observational error (independent) is what was
 * observed — scaled so the largest weight is 1 (the scale cancels in
 * every weighted statistic and keeps the weights away from underflow). Also returns the sum
 * (in member order) and Kish's effective sample size (Σw)²/Σw² (Kish 1965, Survey Sampling).
 */
export function constraintWeights(
  windowMean: Float64Array,
  constraint: ObservationalConstraint,
  out: Float64Array,
): { totalWeight: number; effectiveMembers: number } {
  const n = windowMean.length;
  let best = Infinity;
  for (let m = 0; m < n; m++) {
    const z = Math.abs(windowMean[m]! - constraint.observed);
    if (z < best) best = z;
  }
  const sd = likelihoodSd(constraint);
  const offset = -0.5 * (best / sd) ** 2;
  let total = 0;
  for (let m = 0; m < n; m++) {
    const z = (windowMean[m]! - constraint.observed) / sd;
    const w = Math.exp(-0.5 * z * z - offset);
    out[m] = w;
    total += w;
  }
  if (!(total > 0) || !Number.isFinite(total))
    throw new SpecError("model.constraint", "leaves no member with weight: the observed value is far from every member's warming");
  return { totalWeight: total, effectiveMembers: kishEffectiveSize(out.subarray(0, n)) };
}

/** The likelihood's sd: observational uncertainty and internal variability, independent, in quadrature. */
export function likelihoodSd(constraint: ObservationalConstraint): number {
  return Math.sqrt(constraint.sd * constraint.sd + constraint.internalVariability * constraint.internalVariability);
}
