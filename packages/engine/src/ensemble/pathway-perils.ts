import { applyPerilLens } from "../peril/apply-peril-lens.js";
import { assemblePerilResult } from "../peril/assemble-peril-result.js";
import type { PathwayPerilResult, PerilResult } from "../peril/types.js";
import type { RunSpec } from "../spec/types.js";
import type { EnsemblePlan } from "./ensemble-plan.js";
import type { PathwayWeights } from "./finish-pathway.js";

/**
 * The peril lens of one pathway, or null when the spec asks for no perils. Must run while
 * plan.state.horizonTemperature still holds this pathway's horizon anomalies (against each
 * member's own 1850–1900 mean: validatePerilInputs requires that baseline), i.e. before the
 * next pathway's reporting pass. Members keep their own warming and (via the profile's own
 * seeded stream) their own rate, and the pathway's constraint weights apply.
 */
export function pathwayPerils(
  spec: RunSpec,
  plan: EnsemblePlan,
  pathwayIndex: number,
  weighting: PathwayWeights,
): PathwayPerilResult | null {
  const profiles = spec.perils ?? [];
  if (profiles.length === 0) return null;
  return applyPerilLens({
    pathwayId: spec.pathways[pathwayIndex]!.id,
    seed: spec.seed,
    sampling: spec.sampling,
    profiles,
    portfolio: spec.portfolio ?? null,
    horizons: spec.horizons,
    warmingAtHorizons: plan.state.horizonTemperature,
    weights: weighting.weights,
    percentiles: spec.percentiles,
  });
}

/** The result's `perils` block once every pathway is lensed; undefined when the spec has no perils. */
export function runPerils(spec: RunSpec, perPathway: (PathwayPerilResult | null)[]): PerilResult | undefined {
  const profiles = spec.perils ?? [];
  if (profiles.length === 0) return undefined;
  return assemblePerilResult(profiles, spec.portfolio ?? null, perPathway.filter((p): p is PathwayPerilResult => p !== null));
}
