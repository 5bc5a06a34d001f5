import { issueDetails, runSpecSchema, type CreateRunBody, type ErrorDetail, type RunSpec } from "@plumeline/contracts";
import type { ModelVersionModel } from "../model-versions/model-version.model.js";
import type { PathwayModel } from "../pathways/pathway.model.js";
import type { PerilSpecPart } from "../peril-profiles/resolve-peril-lens.js";

/**
 * The engine spec for a run: the model version's `model` and defaults, the run's own choices
 * (members, seed, sampling, optional percentiles/thresholds/horizons), and the pathways'
 * series in the order the run lists them, plus copies of the peril profiles and portfolio rows
 * the run names (resolvePerilLens). Validated with the engine contract's schema, so a
 * spec the engine would refuse never reaches the queue; problems come back as field details.
 */
export function buildRunSpec(
  body: CreateRunBody,
  version: ModelVersionModel,
  pathways: PathwayModel[],
  peril: PerilSpecPart = {},
): { ok: true; spec: RunSpec } | { ok: false; errors: ErrorDetail[] } {
  const candidate = {
    seed: body.seed,
    members: body.members,
    sampling: body.sampling,
    baseline: version.defaults.baseline,
    percentiles: body.percentiles ?? version.defaults.percentiles,
    thresholds: body.thresholds ?? version.defaults.thresholds,
    horizons: body.horizons ?? version.defaults.horizons,
    pathways: pathways.map((p) => ({ id: p.id, name: p.name, startYear: p.startYear, agents: p.agents })),
    model: version.model,
    ...peril,
  };
  const parsed = runSpecSchema.safeParse(candidate);
  if (parsed.success) return { ok: true, spec: parsed.data };
  return {
    ok: false,
    errors: issueDetails(parsed.error, { prefix: "spec.", fallback: "spec" }),
  };
}
