import type { SensitivityEntry } from "../spec/types.js";
import { firstOrderIndex } from "../statistics/first-order-index.js";
import { sortOrder, weightedCorrelation, weightedMidRanks } from "../statistics/weighted-spearman.js";
import type { EnsemblePlan } from "./ensemble-plan.js";
import type { PathwayWeights } from "./finish-pathway.js";

/**
 * The sensitivity budget of one pathway: for each uncertain input that can move its warming
 * (climate inputs, and the scales of agents the pathway carries) and each horizon,
 * * `varianceShare`: the input's first-order share of the variance of the horizon warming
 *   (Sobol main effect, estimated from the ensemble itself: statistics/first-order-index.ts);
 *   the shares add up to at most 1 (up to estimation noise), the rest is interactions;
 * * `index`: Spearman's rank correlation of input and warming.
 * Both are weighted under an observational constraint, so they describe the constrained
 * ensemble the pathway's percentiles describe. `inputOrders` caches each input's member
 * order across pathways (the weights change per pathway, the order does not).
 * Cost O(inputs · n log n) once, then O(n) per input and horizon (+ a sort per horizon).
 */
export function sensitivityBudget(
  plan: EnsemblePlan,
  pathwayIndex: number,
  weighting: PathwayWeights,
  inputOrders: Map<number, Uint32Array>,
): SensitivityEntry[] {
  const entries: SensitivityEntry[] = [];
  if (plan.members < 3 || plan.horizons.length === 0) return entries;
  const pathway = plan.pathways[pathwayIndex]!;
  const { weights, totalWeight, effectiveMembers } = weighting;
  const relevant = plan.inputs
    .map((input, i) => ({ input, i }))
    .filter(({ input }) => input.distribution.type !== "fixed" && (input.kind === "climate" || pathway.agents.includes(input.name as never)));
  const inputRanks = relevant.map(({ i }) => {
    let order = inputOrders.get(i);
    if (!order) inputOrders.set(i, (order = sortOrder(plan.columns[i]!)));
    return { order, ranks: weightedMidRanks(plan.columns[i]!, order, weights, totalWeight) };
  });
  plan.horizons.forEach((year, h) => {
    const warming = plan.state.horizonTemperature[h]!;
    const warmingRanks = weightedMidRanks(warming, sortOrder(warming), weights, totalWeight);
    relevant.forEach(({ input }, j) => {
      const { order, ranks } = inputRanks[j]!;
      entries.push({
        input: input.name,
        horizon: year,
        index: weightedCorrelation(ranks, warmingRanks, weights, totalWeight),
        varianceShare: firstOrderIndex(order, warming, weights, totalWeight, effectiveMembers),
      });
    });
  });
  return entries;
}
