import type { SensitivityEntry } from "../spec/types.js";
import { firstOrderIndex } from "../statistics/first-order-index.js";
import { sortOrder } from "../statistics/sort-order.js";
import { weightedCorrelation, weightedMidRanks } from "../statistics/weighted-spearman.js";
import type { EnsemblePlan } from "./ensemble-plan.js";
import type { FinishWorkspace } from "./finish-workspace.js";
import type { PathwayWeights } from "./finish-pathway.js";

/**
 * The sensitivity budget of one pathway: for each uncertain input that can move its warming
 * (climate inputs, and the scales of agents the pathway carries) and each horizon,
 * * `varianceShare`: the input's first-order share of the variance of the horizon warming
 *   (Sobol main effect, estimated from the ensemble itself: statistics/first-order-index.ts);
 *   the shares add up to at most 1 (up to estimation noise), the rest is interactions;
 * * `index`: Spearman's rank correlation of input and warming.
 * Both are weighted under an observational constraint, so they describe the constrained
 * ensemble the pathway's percentiles describe. `work.inputOrders` caches each input's member
 * order across pathways (the weights change per pathway, the order does not); the ranks go
 * into the workspace's arrays (finish-workspace.ts).
 * Cost O(inputs · n log n) once, then O(n) per input and horizon (+ a sort per horizon).
 */
export function sensitivityBudget(
  plan: EnsemblePlan,
  pathwayIndex: number,
  weighting: PathwayWeights,
  work: FinishWorkspace,
): SensitivityEntry[] {
  if (plan.members < 3 || plan.horizons.length === 0) return [];
  const pathway = plan.pathways[pathwayIndex]!;
  const { weights, totalWeight, effectiveMembers } = weighting;
  const relevant = plan.inputs
    .map((input, i) => ({ input, i }))
    .filter(({ input }) => input.distribution.type !== "fixed" && (input.kind === "climate" || pathway.agents.includes(input.name as never)));
  // One input's ranks at a time, with every horizon's warming ranks held instead: at
  // 1,000,000 members and 15 inputs that is 3 + 1 rank arrays (32 MB) rather than 15 + 1
  // (128 MB). Every entry is the same computation on the same values as when each input's
  // ranks were held at once, so the same numbers; entries stay in horizon-then-input order.
  const warmingRanks = plan.horizons.map((_, h) => {
    const warming = plan.state.horizonTemperature[h]!;
    return weightedMidRanks(warming, sortOrder(warming, work.sort, work.warmingOrder), weights, totalWeight, work.warmingRanks[h]);
  });
  const entries = new Array<SensitivityEntry>(plan.horizons.length * relevant.length);
  const ranks = work.inputRanks;
  relevant.forEach(({ input, i }, j) => {
    let order = work.inputOrders.get(i);
    if (!order) work.inputOrders.set(i, (order = sortOrder(plan.columns[i]!, work.sort)));
    weightedMidRanks(plan.columns[i]!, order, weights, totalWeight, ranks);
    plan.horizons.forEach((year, h) => {
      entries[h * relevant.length + j] = {
        input: input.name,
        horizon: year,
        index: weightedCorrelation(ranks, warmingRanks[h]!, weights, totalWeight),
        varianceShare: firstOrderIndex(order, plan.state.horizonTemperature[h]!, weights, totalWeight, effectiveMembers),
      };
    });
  });
  return entries;
}
