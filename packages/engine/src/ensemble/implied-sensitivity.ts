import type { PercentileSet } from "../spec/types.js";
import { PercentileSelector } from "../summary/percentile-selector.js";
import type { EnsemblePlan } from "./ensemble-plan.js";
import type { PathwayWeights } from "./finish-pathway.js";
import { percentileSet } from "./percentile-set.js";

/**
 * The ensemble's implied equilibrium sensitivity (ECS = F2x/λ, which is the sampled ECS) and
 * transient response (each member's own TCR, implied-tcr.ts, worked out during set-up), as
 * percentiles weighted like the first pathway. `selector`: the run's own, so its O(members)
 * buffers are not made again (finish-workspace.ts).
 */
export function impliedSensitivities(
  plan: EnsemblePlan,
  percentiles: number[],
  weighting: PathwayWeights,
  selector: PercentileSelector = new PercentileSelector(),
): { ecs: PercentileSet; tcr: PercentileSet } {
  const { weights, totalWeight } = weighting;
  return {
    ecs: percentileSet(selector, plan.climate.ecs, percentiles, weights, totalWeight),
    tcr: percentileSet(selector, plan.tcr, percentiles, weights, totalWeight),
  };
}
