import { constraintWeights } from "./constraint-weights.js";
import type { EnsemblePlan } from "./ensemble-plan.js";
import type { PathwayWeights } from "./finish-pathway.js";

/** Weights of the current pathway once its first pass is done: constraint weights, or none. */
export function weighPathway(plan: EnsemblePlan): PathwayWeights {
  if (!plan.constraint) return { weights: null, totalWeight: plan.members, effectiveMembers: plan.members };
  const { totalWeight, effectiveMembers } = constraintWeights(plan.state.windowMean, plan.constraint, plan.state.weights);
  return { weights: plan.state.weights, totalWeight, effectiveMembers };
}
