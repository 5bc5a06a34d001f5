import { randomUUID } from "node:crypto";
import {
  issueDetails,
  perilProfileSchema,
  perilScalingSchema,
  type CurveRange,
  type PerilCurve,
  type PerilProfile,
  type PerilProfileBody,
  type PerilProfileRecord,
  type UpdatePerilProfileBody,
  type ListPerilProfilesQuery,
  type PERIL_PROFILE_SORT_KEYS,
  type Page,
} from "@plumeline/contracts";
import { Op, type Transaction, type WhereOptions } from "sequelize";
import type { Literal } from "sequelize/lib/utils";
import { createdBetween } from "../../db/paging/date-range.js";
import { findPage, type SortColumns } from "../../db/paging/find-page.js";
import { anyContains, personMatches } from "../../db/paging/like-pattern.js";
import type { AppContext } from "../../context.js";
import { badRequest, conflict, forbidden, notFound } from "../../errors/app-error.js";
import type { RequestUser } from "../../middleware/request-context.js";
import { recordAudit } from "../audit/audit.service.js";
import { perilCurve } from "./peril-curve.js";
import { isLocked, profileDependants, type ProfileDependants } from "./peril-profile-locks.js";
import type { PerilProfileModel } from "./peril-profile.model.js";

type Ctx = Pick<AppContext, "models" | "sequelize">;

/**
 * The engine's view of a stored profile (what a run spec carries). The stored scaling is read
 * through the shared schema, so a table saved before tables stated their return period (a bare
 * `points` list) comes back as one table for 10-year events, the stated default.
 */
export function toEngineProfile(row: PerilProfileModel): PerilProfile {
  return {
    id: row.id,
    name: row.name,
    peril: row.peril,
    region: row.region,
    metric: row.metric,
    baselineWarming: row.baselineWarming,
    scaling: perilScalingSchema.parse(row.scaling),
    ...(row.source ? { source: row.source } : {}),
  };
}

function toRecord(row: PerilProfileModel, dependants: ProfileDependants | undefined, createdByName: string | null): PerilProfileRecord {
  const lock = dependants?.lock ?? { modelVersions: [], runIds: [] };
  return {
    ...toEngineProfile(row),
    locked: isLocked(lock),
    lockedBy: lock,
    copiedFrom: row.copiedFrom,
    createdBy: row.createdBy,
    createdByName,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

async function present(ctx: Ctx, rows: PerilProfileModel[]): Promise<PerilProfileRecord[]> {
  const [dependants, users] = await Promise.all([
    profileDependants(ctx.sequelize, rows.map((r) => r.id)),
    ctx.models.User.findAll({ where: { id: { [Op.in]: [...new Set(rows.map((r) => r.createdBy))] } }, attributes: ["id", "name"] }),
  ]);
  const names = new Map(users.map((u) => [u.id, u.name]));
  return rows.map((r) => toRecord(r, dependants.get(r.id), names.get(r.createdBy) ?? null));
}

const PERIL_PROFILE_SORT_COLUMNS: SortColumns<(typeof PERIL_PROFILE_SORT_KEYS)[number]> = {
  peril: ["peril", "region", "name"],
  region: ["region", "peril", "name"],
  name: ["name"],
  updatedAt: ["updatedAt"],
  createdAt: ["createdAt"],
};

/** One page of peril profiles: `q` in name, peril, region and source; `author` in the creator's name or email; metric; created from/to. */
export async function listPerilProfiles(ctx: Ctx, query: ListPerilProfilesQuery): Promise<Page<PerilProfileRecord>> {
  const conditions: Array<WhereOptions | Literal> = [...createdBetween(query)];
  if (query.metric) conditions.push({ metric: query.metric });
  if (query.q) conditions.push(anyContains(ctx.sequelize, ["name", "peril", "region", "source"], query.q));
  if (query.author) conditions.push(personMatches(ctx.sequelize, "created_by", query.author));
  const { rows, total } = await findPage(ctx.models.PerilProfile, { conditions, page: query, sortColumns: PERIL_PROFILE_SORT_COLUMNS });
  return { items: await present(ctx, rows), total };
}

export async function findPerilProfile(ctx: Pick<Ctx, "models">, id: string, transaction?: Transaction): Promise<PerilProfileModel> {
  const row = await ctx.models.PerilProfile.findByPk(id, transaction ? { transaction } : {});
  if (!row) throw notFound("Peril profile", id);
  return row;
}

export async function getPerilProfile(ctx: Ctx, id: string): Promise<PerilProfileRecord> {
  const [record] = await present(ctx, [await findPerilProfile(ctx, id)]);
  return record!;
}

/** Creates a profile owned by `user`; `origin` says how (form, copy of …, seed) in the audit trail. */
export async function createPerilProfile(
  ctx: Ctx,
  user: Pick<RequestUser, "id">,
  body: PerilProfileBody,
  options: { id?: string; copiedFrom?: string | null; origin?: string } = {},
): Promise<PerilProfileRecord> {
  const id = options.id ?? randomUUID();
  const profile = parseProfile({ ...body, id });
  const row = await ctx.sequelize.transaction(async (transaction) => {
    const created = await ctx.models.PerilProfile.create(
      { ...storedFields(profile), id, copiedFrom: options.copiedFrom ?? null, createdBy: user.id },
      { transaction },
    );
    await recordAudit(
      ctx,
      {
        actorId: user.id,
        action: "peril-profile.created",
        entityType: "peril-profile",
        entityId: id,
        summary: `Peril profile "${profile.name}" (${profile.peril}, ${profile.region}, ${profile.metric}) created${options.origin ? ` from ${options.origin}` : ""}.`,
        data: { profile, copiedFrom: options.copiedFrom ?? null },
      },
      transaction,
    );
    return created;
  });
  const [record] = await present(ctx, [row]);
  return record!;
}

/**
 * Edits a profile: only its creator, and only while no approved model version pins it and no
 * run used it (409 — copy it instead). The merged profile is validated as a whole.
 */
export async function updatePerilProfile(ctx: Ctx, user: RequestUser, id: string, body: UpdatePerilProfileBody): Promise<PerilProfileRecord> {
  await ctx.sequelize.transaction(async (transaction) => {
    const row = await findPerilProfile(ctx, id, transaction);
    await refuseIfLocked(ctx, row, "edited", transaction);
    if (row.createdBy !== user.id) throw forbidden("Only the person who created a peril profile can edit it; copy it to make your own.", "not_owner");
    const before = toEngineProfile(row);
    const merged = parseProfile({ ...before, ...body, id });
    await row.update(storedFields(merged), { transaction });
    await recordAudit(
      ctx,
      {
        actorId: user.id,
        action: "peril-profile.updated",
        entityType: "peril-profile",
        entityId: id,
        summary: `Peril profile "${merged.name}" edited (${Object.keys(body).join(", ") || "no fields"}).`,
        data: { before, after: merged },
      },
      transaction,
    );
  });
  return getPerilProfile(ctx, id);
}

/** Deletes a profile: creator only; refused while locked or while a draft model version names it. */
export async function deletePerilProfile(ctx: Ctx, user: RequestUser, id: string): Promise<void> {
  await ctx.sequelize.transaction(async (transaction) => {
    const row = await findPerilProfile(ctx, id, transaction);
    const dependants = await refuseIfLocked(ctx, row, "deleted", transaction);
    if (row.createdBy !== user.id) throw forbidden("Only the person who created a peril profile can delete it.", "not_owner");
    if (dependants.drafts.length > 0)
      throw conflict(
        `Peril profile "${row.name}" is named by model version ${dependants.drafts.map((v) => `"${v.name}" v${v.versionNumber} (${v.status})`).join(", ")}; remove it there first.`,
        "peril_profile_in_use",
      );
    await row.destroy({ transaction });
    await recordAudit(
      ctx,
      {
        actorId: user.id,
        action: "peril-profile.deleted",
        entityType: "peril-profile",
        entityId: id,
        summary: `Peril profile "${row.name}" deleted.`,
        data: { profile: toEngineProfile(row) },
      },
      transaction,
    );
  });
}

/** A new, unlocked profile with the same content, owned by whoever copies it. */
export async function copyPerilProfile(ctx: Ctx, user: RequestUser, id: string, name?: string): Promise<PerilProfileRecord> {
  const source = await findPerilProfile(ctx, id);
  const { id: _id, ...content } = toEngineProfile(source);
  const copyName = (name ?? `${source.name} (copy)`).slice(0, 120);
  return createPerilProfile(ctx, user, { ...content, name: copyName }, { copiedFrom: id, origin: `a copy of "${source.name}"` });
}

export async function perilProfileCurve(ctx: Ctx, id: string, range: CurveRange): Promise<PerilCurve> {
  return perilCurve(toEngineProfile(await findPerilProfile(ctx, id)), range);
}

/**
 * The stored profiles a run names, in the order it names them, as the engine takes them.
 * Unknown ids come back as field details (`perilProfileIds[i]`).
 */
export async function resolvePerilProfiles(
  ctx: Pick<Ctx, "models">,
  ids: readonly string[],
  transaction?: Transaction,
): Promise<{ profiles: PerilProfile[]; errors: Array<{ path: string; message: string }> }> {
  const rows = ids.length
    ? await ctx.models.PerilProfile.findAll({ where: { id: { [Op.in]: [...ids] } }, ...(transaction ? { transaction } : {}) })
    : [];
  const byId = new Map(rows.map((r) => [r.id, r]));
  const errors: Array<{ path: string; message: string }> = [];
  const profiles: PerilProfile[] = [];
  ids.forEach((id, i) => {
    const row = byId.get(id);
    if (row) profiles.push(toEngineProfile(row));
    else errors.push({ path: `perilProfileIds[${i}]`, message: `peril profile ${id} does not exist` });
  });
  return { profiles, errors };
}

async function refuseIfLocked(ctx: Ctx, row: PerilProfileModel, verb: string, transaction: Transaction): Promise<ProfileDependants> {
  const dependants = (await profileDependants(ctx.sequelize, [row.id], transaction)).get(row.id)!;
  if (isLocked(dependants.lock)) {
    const by = [
      ...dependants.lock.modelVersions.map((v) => `${v.status} model version "${v.name}" v${v.versionNumber}`),
      ...(dependants.lock.runIds.length ? [`${dependants.lock.runIds.length} run${dependants.lock.runIds.length === 1 ? "" : "s"}`] : []),
    ].join(" and ");
    throw conflict(`Peril profile "${row.name}" is locked (used by ${by}) and cannot be ${verb}. Copy it instead.`, "peril_profile_locked");
  }
  return dependants;
}

/** Validates a full profile with the shared schema; issues become 400 details on the body's fields. */
function parseProfile(candidate: unknown): PerilProfile {
  const parsed = perilProfileSchema.safeParse(candidate);
  if (!parsed.success) throw badRequest(issueDetails(parsed.error));
  return parsed.data;
}

function storedFields(p: PerilProfile) {
  return {
    name: p.name,
    peril: p.peril,
    region: p.region,
    metric: p.metric,
    baselineWarming: p.baselineWarming,
    scaling: p.scaling,
    source: p.source ?? null,
  };
}
