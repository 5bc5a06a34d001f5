/**
 * @plumeline/engine — pure TypeScript numerics of Plumeline: no I/O, no DOM, no Node APIs.
 * The worker-thread runner lives in the "./node" entry.
 */
export { runEnsemble, type RunOptions, type StageTimes, type PathwayMembers } from "./ensemble/run-ensemble.js";
export { memberTable, type MemberTable } from "./ensemble/member-table.js";
export { memberTableCsv } from "./ensemble/member-table-csv.js";
export { preparePlan } from "./ensemble/prepare-plan.js";
export { applyDefaults } from "./spec/apply-defaults.js";
export { DEFAULT_INTERNAL_VARIABILITY } from "./spec/constraint-defaults.js";
export { validateSpec } from "./spec/validate-spec.js";
export { SpecError, RunCancelledError } from "./spec/spec-error.js";
export {
  MAX_MEMBERS,
  MAX_PATHWAY_YEARS,
  MAX_THRESHOLDS,
  MAX_HORIZONS,
  MAX_PERCENTILES,
  MAX_PATHWAYS_PER_RUN,
  MIN_YEAR,
  MAX_YEAR,
} from "./spec/limits.js";
export * from "./spec/types.js";
export { inputHash, resultHash } from "./hash/run-hashes.js";
export { canonicalHash } from "./hash/sha256-hex.js";
export { engineVersion } from "./version.js";
export { PercentileSelector } from "./summary/percentile-selector.js";
export { weightedPosition } from "./summary/weighted-positions.js";
export * from "./random/create-random.js";
export {
  quantileOf,
  quantilesOf,
  sampleOf,
  cdfOf,
  densityOf,
  validateDistribution,
  summarizeDistribution,
  densityCurve,
  fitRange,
  standardNormalQuantile,
  standardNormalCdf,
} from "./distributions/index.js";
export * from "./peril/index.js";
