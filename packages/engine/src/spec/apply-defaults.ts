import { DEFAULT_INTERNAL_VARIABILITY } from "./constraint-defaults.js";
import type { RunSpec, RunSpecInput } from "./types.js";

/**
 * The spec with every default filled in, as the engine contract states them: baseline 1850–1900,
 * percentiles 5/17/50/83/95, thresholds 1.5/2/3 K, horizons 2030/2050/2100, no
 * correlations, no constraint (a constraint's internal variability: 0.21 K, constraint-defaults.ts),
 * the AR6 concentration expression. The input hash is taken
 * of this form, so writing a default out or leaving it out gives the same hash. The peril
 * lens parts (`perils`, `portfolio`) are copied only when given, so specs without them keep
 * the hashes they had before the lens existed; when given they are part of the hash.
 */
export function applyDefaults(input: RunSpecInput | RunSpec): RunSpec {
  const model = input.model;
  const spec: RunSpec = {
    seed: input.seed,
    members: input.members,
    sampling: input.sampling,
    baseline: input.baseline ?? [1850, 1900],
    percentiles: input.percentiles ?? [5, 17, 50, 83, 95],
    thresholds: input.thresholds ?? [1.5, 2, 3],
    horizons: input.horizons ?? [2030, 2050, 2100],
    pathways: input.pathways,
    model: {
      climate: model.climate,
      agents: model.agents ?? {},
      correlations: model.correlations ?? [],
      constraint: model.constraint ? { ...model.constraint, internalVariability: model.constraint.internalVariability ?? DEFAULT_INTERNAL_VARIABILITY } : null,
      forcingExpression: model.forcingExpression ?? "ar6",
    },
  };
  if (input.perils !== undefined) spec.perils = input.perils;
  if (input.portfolio !== undefined && input.portfolio !== null) spec.portfolio = input.portfolio;
  return spec;
}
