import {
  IMPACT_DEFAULT_MEMBERS,
  IMPACT_MAX_PATHWAYS,
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
import { Op } from "sequelize";
import { badRequest, notFound } from "../../errors/app-error.js";
import type { PathwayModel } from "../pathways/pathway.model.js";
import { buildRunSpec } from "../runs/build-run-spec.js";
import { ImpactCache } from "./impact-cache.js";
import { runPreviewEnsembles } from "./impact-ensembles.js";
import { getMaterialityPolicy } from "../settings/materiality.service.js";
import { impactPathways, impactSide, impliedDifferences } from "./impact-summary.js";
import { materialityFirings } from "./materiality-check.js";
import type { ModelVersionModel } from "./model-version.model.js";

type Ctx = Pick<AppContext, "models">;
type Computed = Omit<ModelVersionImpact, "cached" | "materiality">;

/** Loaded on first use, as in the runs module: only endpoints that need the engine depend on it. */
const loadEngine = () => import("@plumeline/engine");

const cache = new ImpactCache<Computed>();

/** The pathway the demo seed calls "Harbourline Middle" — the fallback when neither version pins a pathway. */
const SEEDED_MIDDLE_NAME = demoPathways.find((p) => p.key === "harbourline-middle")?.name ?? "Harbourline Middle";

/** Percentiles the preview reports: the version's own plus 5, 50 and 95, which the differences need. */
function previewPercentiles(version: ModelVersionModel): number[] {
  return [...new Set([...version.defaults.percentiles, 5, 50, 95])].sort((a, b) => a - b);
}

/**
 * The pathways to preview on: those asked for (each must exist), else every pathway the version
 * pins, else every one its comparison pins, else the seeded middle pathway. A pinned id whose
 * pathway has gone is skipped (pins are checked when saved; this only guards old rows).
 */
export async function resolvePathways(ctx: Ctx, requested: string[] | undefined, version: ModelVersionModel, against: ModelVersionModel): Promise<PathwayModel[]> {
  if (requested) {
    const found = await ctx.models.Pathway.findAll({ where: { id: { [Op.in]: requested } } });
    const byId = new Map(found.map((p) => [p.id, p]));
    const errors: ErrorDetail[] = requested.flatMap((id, i) => {
      if (requested.indexOf(id) !== i) return [{ path: `pathwayIds[${i}]`, message: `repeats pathway ${id}` }];
      return byId.has(id) ? [] : [{ path: `pathwayIds[${i}]`, message: `pathway ${id} does not exist` }];
    });
    if (errors.length > 0) throw badRequest(errors);
    return requested.map((id) => byId.get(id)!);
  }
  for (const pinned of [version.pathwayIds ?? [], against.pathwayIds ?? []]) {
    if (pinned.length === 0) continue;
    const found = await ctx.models.Pathway.findAll({ where: { id: { [Op.in]: pinned } } });
    const byId = new Map(found.map((p) => [p.id, p]));
    const ordered = pinned.flatMap((id) => byId.get(id) ?? []).slice(0, IMPACT_MAX_PATHWAYS);
    if (ordered.length > 0) return ordered;
  }
  const seeded = await ctx.models.Pathway.findOne({ where: { name: SEEDED_MIDDLE_NAME }, order: [["createdAt", "ASC"]] });
  if (seeded) return [seeded];
  throw badRequest([{ path: "pathwayIds", message: `neither version pins a pathway and "${SEEDED_MIDDLE_NAME}" is not loaded; name a pathway` }]);
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
export function buildImpactSpecs(version: ModelVersionModel, against: ModelVersionModel, pathways: PathwayModel[], members: number): { version: RunSpec; against: RunSpec } {
  const runBody = (modelVersionId: string): CreateRunBody => ({
    modelVersionId,
    pathwayIds: pathways.map((p) => p.id),
    members,
    seed: IMPACT_SEED,
    sampling: IMPACT_SAMPLING,
    percentiles: previewPercentiles(version),
    thresholds: version.defaults.thresholds,
    horizons: version.defaults.horizons,
  });
  const mine = buildRunSpec(runBody(version.id), version, pathways);
  const theirs = buildRunSpec(runBody(against.id), against, pathways);
  const errors: ErrorDetail[] = [
    ...(mine.ok ? [] : mine.errors.map((e) => ({ ...e, message: `${version.name} v${version.versionNumber}: ${e.message}` }))),
    ...(theirs.ok ? [] : theirs.errors.map((e) => ({ ...e, message: `${against.name} v${against.versionNumber}: ${e.message}` }))),
  ];
  if (!mine.ok || !theirs.ok) throw badRequest(errors, "The preview does not make a valid engine spec.");
  return { version: mine.spec, against: theirs.spec };
}

const ref = (row: ModelVersionModel) => ({ id: row.id, name: row.name, versionNumber: row.versionNumber, status: row.status });

/**
 * The preview of `version` against `against` on `pathways`: two small seeded ensembles (every
 * pathway in each), run off the request thread, summarised per pathway with the differences,
 * then held against today's materiality policy. The numbers are cached by the pair of engine
 * input hashes (which cover the pathway set, the member count and both models); the policy is
 * applied after the cache, so changing it never serves stale firings.
 */
export async function previewImpact(
  ctx: Ctx,
  version: ModelVersionModel,
  against: ModelVersionModel,
  pathways: PathwayModel[],
  members: number,
): Promise<ModelVersionImpact> {
  const specs = buildImpactSpecs(version, against, pathways, members);
  const { inputHash } = await loadEngine();
  const key = `${inputHash(specs.version)}|${inputHash(specs.against)}`;
  const { value, cached } = cache.getOrCompute(key, async () => {
    const started = performance.now();
    const [mine, theirs] = await runPreviewEnsembles([specs.version, specs.against], version.id.slice(0, 8));
    const versionSide = impactSide(ref(version), mine!);
    const againstSide = impactSide(ref(against), theirs!);
    return {
      pathways: impactPathways(pathways, mine!, theirs!),
      members,
      seed: IMPACT_SEED,
      sampling: IMPACT_SAMPLING,
      percentiles: specs.version.percentiles,
      thresholds: specs.version.thresholds,
      version: versionSide,
      against: againstSide,
      differences: impliedDifferences(versionSide, againstSide),
      computedAt: new Date().toISOString(),
      seconds: Math.round((performance.now() - started) / 10) / 100,
    };
  });
  const computed = await value;
  const policy = await getMaterialityPolicy(ctx);
  // Names and statuses can change without changing the numbers (e.g. approval): report today's.
  return {
    ...computed,
    version: { ...computed.version, version: ref(version) },
    against: { ...computed.against, version: ref(against) },
    materiality: { policy, fired: materialityFirings(computed.pathways, policy) },
    cached,
  };
}

/** POST /api/model-versions/:id/impact: resolves the comparison and the pathways, then previews. Read-only. */
export async function modelVersionImpact(ctx: Ctx, id: string, body: ModelVersionImpactBody): Promise<ModelVersionImpact> {
  const version = await ctx.models.ModelVersion.findByPk(id);
  if (!version) throw notFound("Model version", id);
  const against = await resolveAgainst(ctx, body, version);
  const pathways = await resolvePathways(ctx, body.pathwayIds, version, against);
  return previewImpact(ctx, version, against, pathways, body.members ?? IMPACT_DEFAULT_MEMBERS);
}
