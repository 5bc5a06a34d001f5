import {
  IMPACT_DEFAULT_MEMBERS,
  IMPACT_SAMPLING,
  IMPACT_SEED,
  type CreateRunBody,
  type ErrorDetail,
  type ModelVersionImpact,
  type ModelVersionImpactBody,
  type RunSpec,
} from "@plumeline/contracts";
import { demoPathways } from "@plumeline/seeds";
import type { AppContext } from "../../context.js";
import { badRequest } from "../../errors/app-error.js";
import type { PathwayModel } from "../pathways/pathway.model.js";
import { buildRunSpec } from "../runs/build-run-spec.js";
import { ImpactCache } from "./impact-cache.js";
import { runPreviewEnsembles } from "./impact-ensembles.js";
import { impactDifferences, impactSide } from "./impact-summary.js";
import type { ModelVersionModel } from "./model-version.model.js";
import { findModelVersion } from "./model-versions.service.js";

type Ctx = Pick<AppContext, "models">;
type Computed = Omit<ModelVersionImpact, "cached">;

/** Loaded on first use, as in the runs module: only endpoints that need the engine depend on it. */
const loadEngine = () => import("@plumeline/engine");

const cache = new ImpactCache<Computed>();

/** The pathway the demo seed calls "Harbourline Middle" — the fallback when no pathway is pinned. */
const SEEDED_MIDDLE_NAME = demoPathways.find((p) => p.key === "harbourline-middle")?.name ?? "Harbourline Middle";

/** Percentiles the preview reports: the version's own plus 5, 50 and 95, which the differences need. */
function previewPercentiles(version: ModelVersionModel): number[] {
  return [...new Set([...version.defaults.percentiles, 5, 50, 95])].sort((a, b) => a - b);
}

async function resolvePathway(ctx: Ctx, body: ModelVersionImpactBody, version: ModelVersionModel, against: ModelVersionModel): Promise<PathwayModel> {
  if (body.pathwayId) {
    const chosen = await ctx.models.Pathway.findByPk(body.pathwayId);
    if (!chosen) throw badRequest([{ path: "pathwayId", message: `pathway ${body.pathwayId} does not exist` }]);
    return chosen;
  }
  for (const id of [...(version.pathwayIds ?? []), ...(against.pathwayIds ?? [])]) {
    const pinned = await ctx.models.Pathway.findByPk(id);
    if (pinned) return pinned;
  }
  const seeded = await ctx.models.Pathway.findOne({ where: { name: SEEDED_MIDDLE_NAME }, order: [["createdAt", "ASC"]] });
  if (seeded) return seeded;
  throw badRequest([{ path: "pathwayId", message: `neither version pins a pathway and "${SEEDED_MIDDLE_NAME}" is not loaded; name a pathway` }]);
}

async function resolveAgainst(ctx: Ctx, body: ModelVersionImpactBody, version: ModelVersionModel): Promise<ModelVersionModel> {
  const againstId = body.againstId ?? version.parentId;
  if (!againstId)
    throw badRequest([{ path: "againstId", message: `"${version.name}" v${version.versionNumber} has no parent; name a version to compare against` }]);
  if (againstId === version.id) throw badRequest([{ path: "againstId", message: "must be another version than the one previewed" }]);
  const against = await ctx.models.ModelVersion.findByPk(againstId);
  if (!against) throw badRequest([{ path: "againstId", message: `model version ${againstId} does not exist` }]);
  return against;
}

/**
 * The two engine specs, built exactly as a run on each version would be (buildRunSpec): same
 * seed, member count, sampling and pathway; the reviewed version's percentiles (plus 5/50/95),
 * thresholds and horizons on both sides so the tables line up; each version's own model and
 * baseline. A spec the engine contract refuses is a 400 naming the side and the field.
 */
export function buildImpactSpecs(version: ModelVersionModel, against: ModelVersionModel, pathway: PathwayModel, members: number): { version: RunSpec; against: RunSpec } {
  const runBody = (modelVersionId: string): CreateRunBody => ({
    modelVersionId,
    pathwayIds: [pathway.id],
    members,
    seed: IMPACT_SEED,
    sampling: IMPACT_SAMPLING,
    percentiles: previewPercentiles(version),
    thresholds: version.defaults.thresholds,
    horizons: version.defaults.horizons,
  });
  const mine = buildRunSpec(runBody(version.id), version, [pathway]);
  const theirs = buildRunSpec(runBody(against.id), against, [pathway]);
  const errors: ErrorDetail[] = [
    ...(mine.ok ? [] : mine.errors.map((e) => ({ ...e, message: `${version.name} v${version.versionNumber}: ${e.message}` }))),
    ...(theirs.ok ? [] : theirs.errors.map((e) => ({ ...e, message: `${against.name} v${against.versionNumber}: ${e.message}` }))),
  ];
  if (!mine.ok || !theirs.ok) throw badRequest(errors, "The preview does not make a valid engine spec.");
  return { version: mine.spec, against: theirs.spec };
}

const ref = (row: ModelVersionModel) => ({ id: row.id, name: row.name, versionNumber: row.versionNumber, status: row.status });

/**
 * Effect of a model version on key outputs: a small seeded preview ensemble of the version and
 * of its comparison (parent by default) on one pathway, run off the request thread, summarised
 * side by side with the differences. Cached by the pair of engine input hashes. Read-only.
 */
export async function modelVersionImpact(ctx: Ctx, id: string, body: ModelVersionImpactBody): Promise<ModelVersionImpact> {
  const version = await findModelVersion(ctx, id);
  const against = await resolveAgainst(ctx, body, version);
  const pathway = await resolvePathway(ctx, body, version, against);
  const members = body.members ?? IMPACT_DEFAULT_MEMBERS;
  const specs = buildImpactSpecs(version, against, pathway, members);
  const { inputHash } = await loadEngine();
  const key = `${inputHash(specs.version)}|${inputHash(specs.against)}`;
  const { value, cached } = cache.getOrCompute(key, async () => {
    const started = performance.now();
    const [mine, theirs] = await runPreviewEnsembles([specs.version, specs.against], version.id.slice(0, 8));
    const versionSide = impactSide(ref(version), mine!);
    const againstSide = impactSide(ref(against), theirs!);
    return {
      pathway: { id: pathway.id, name: pathway.name },
      members,
      seed: IMPACT_SEED,
      sampling: IMPACT_SAMPLING,
      percentiles: specs.version.percentiles,
      thresholds: specs.version.thresholds,
      version: versionSide,
      against: againstSide,
      differences: impactDifferences(versionSide, againstSide),
      computedAt: new Date().toISOString(),
      seconds: Math.round((performance.now() - started) / 10) / 100,
    };
  });
  const computed = await value;
  // Names and statuses can change without changing the numbers (e.g. approval): report today's.
  return { ...computed, version: { ...computed.version, version: ref(version) }, against: { ...computed.against, version: ref(against) }, cached };
}
