import { randomUUID } from "node:crypto";
import {
  createModelVersionBodySchema,
  type ChangeClass,
  type CreateModelVersionBody,
  type ErrorDetail,
  type ModelVersion,
  type ModelSpec,
  type ModelVersionDefaults,
  type ModelVersionDiff,
  type ModelVersionSummary,
  type UpdateModelVersionBody,
  type ListModelVersionsQuery,
  type MODEL_VERSION_SORT_KEYS,
  type Page,
} from "@plumeline/contracts";
import { literal, Op, type Transaction, type WhereOptions } from "sequelize";
import type { Literal } from "sequelize/lib/utils";
import { createdBetween } from "../../db/paging/date-range.js";
import { findPage, type SortColumns } from "../../db/paging/find-page.js";
import { anyContains, personMatches } from "../../db/paging/like-pattern.js";
import type { AppContext } from "../../context.js";
import { badRequest, conflict, forbidden, notFound } from "../../errors/app-error.js";
import type { RequestUser } from "../../middleware/request-context.js";
import { recordAudit } from "../audit/audit.service.js";
import { lockPathways } from "../pathways/pathways.service.js";
import { diffModelVersions } from "./model-version-diff.js";
import { mailDecided, mailSubmitted } from "./model-version-mail.js";
import type { ModelVersionModel } from "./model-version.model.js";
import { releasePathwayLocks } from "../pathways/release-pathway-locks.js";
import { assertEngineAcceptsModel } from "./engine-model-check.js";
import { checkMinorChange, type MaterialityCheck } from "./materiality-gate.js";
import { placeInLine } from "./model-version-line.js";

type Ctx = Pick<AppContext, "models" | "sequelize" | "mailer" | "config">;

const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);

async function userNames(ctx: Pick<Ctx, "models">, ids: Array<string | null>): Promise<Map<string, string>> {
  const wanted = [...new Set(ids.filter((x): x is string => !!x))];
  if (wanted.length === 0) return new Map();
  const users = await ctx.models.User.findAll({ where: { id: { [Op.in]: wanted } }, attributes: ["id", "name"] });
  return new Map(users.map((u) => [u.id, u.name]));
}

function toSummary(row: ModelVersionModel, names: Map<string, string>): ModelVersionSummary {
  return {
    id: row.id,
    name: row.name,
    versionNumber: row.versionNumber,
    status: row.status,
    parentId: row.parentId ?? null,
    changeClass: row.changeClass ?? null,
    authorId: row.authorId,
    authorName: names.get(row.authorId) ?? null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    submittedAt: iso(row.submittedAt),
    decidedBy: row.decidedBy ?? null,
    decidedByName: row.decidedBy ? (names.get(row.decidedBy) ?? null) : null,
    decidedAt: iso(row.decidedAt),
  };
}

function toFull(row: ModelVersionModel, names: Map<string, string>): ModelVersion {
  return {
    ...toSummary(row, names),
    model: row.model,
    defaults: row.defaults,
    notes: row.notes,
    submissionNote: row.submissionNote ?? null,
    decisionComment: row.decisionComment ?? null,
    retiredAt: iso(row.retiredAt),
    pathwayIds: row.pathwayIds ?? [],
    perilProfileIds: row.perilProfileIds ?? [],
  };
}

export async function presentModelVersion(ctx: Pick<Ctx, "models">, row: ModelVersionModel): Promise<ModelVersion> {
  return toFull(row, await userNames(ctx, [row.authorId, row.decidedBy]));
}

const MODEL_VERSION_SORT_COLUMNS: SortColumns<(typeof MODEL_VERSION_SORT_KEYS)[number]> = {
  updatedAt: ["updatedAt", "versionNumber"],
  createdAt: ["createdAt"],
  name: ["name", "versionNumber"],
  versionNumber: ["versionNumber"],
  status: ["status", "updatedAt"],
};

/** No other version was drafted from this one (parent_id names the version a draft started from). */
const UNDRAFTED_SQL = "id NOT IN (SELECT parent_id FROM model_versions WHERE parent_id IS NOT NULL)";

/**
 * One page of model versions: `q` in name and notes, `author` in the author's name or email,
 * status, mine, undrafted (or drafted from), created from/to.
 */
export async function listModelVersions(ctx: Ctx, user: RequestUser, query: ListModelVersionsQuery): Promise<Page<ModelVersionSummary>> {
  const conditions: Array<WhereOptions | Literal> = [...createdBetween(query)];
  if (query.status) conditions.push({ status: query.status });
  if (query.mine === "true") conditions.push({ authorId: user.id });
  if (query.undrafted) conditions.push(literal(query.undrafted === "true" ? UNDRAFTED_SQL : `NOT (${UNDRAFTED_SQL})`));
  if (query.q) conditions.push(anyContains(ctx.sequelize, ["name", "notes"], query.q));
  if (query.author) conditions.push(personMatches(ctx.sequelize, "author_id", query.author));
  const { rows, total } = await findPage(ctx.models.ModelVersion, { conditions, page: query, sortColumns: MODEL_VERSION_SORT_COLUMNS });
  const names = await userNames(ctx, rows.flatMap((r) => [r.authorId, r.decidedBy]));
  return { items: rows.map((r) => toSummary(r, names)), total };
}

export async function findModelVersion(ctx: Pick<Ctx, "models">, id: string, transaction?: Transaction): Promise<ModelVersionModel> {
  const row = await ctx.models.ModelVersion.findByPk(id, transaction ? { transaction } : {});
  if (!row) throw notFound("Model version", id);
  return row;
}

export async function getModelVersion(ctx: Ctx, id: string): Promise<ModelVersion> {
  return presentModelVersion(ctx, await findModelVersion(ctx, id));
}

/** Pinned ids must exist and not repeat: every missing or repeated one is named by its list field. */
async function checkPinned(
  field: "pathwayIds" | "perilProfileIds",
  noun: string,
  ids: string[] | undefined,
  findExisting: (ids: string[]) => Promise<Array<{ id: string }>>,
): Promise<ErrorDetail[]> {
  if (!ids || ids.length === 0) return [];
  const have = new Set((await findExisting(ids)).map((r) => r.id));
  const firstAt = new Map<string, number>();
  return ids.flatMap((id, i) => {
    const first = firstAt.get(id);
    if (first !== undefined) return [{ path: `${field}[${i}]`, message: `repeats ${noun} ${id} (already ${field}[${first}])` }];
    firstAt.set(id, i);
    return have.has(id) ? [] : [{ path: `${field}[${i}]`, message: `${noun} ${id} does not exist` }];
  });
}

/** Referenced ids must exist: every missing one is named. */
async function checkReferences(
  ctx: Ctx,
  parentId: string | null | undefined,
  pathwayIds: string[] | undefined,
  perilProfileIds: string[] | undefined,
  transaction: Transaction,
) {
  const errors: ErrorDetail[] = [];
  let parent: ModelVersionModel | null = null;
  if (parentId) {
    parent = await ctx.models.ModelVersion.findByPk(parentId, { transaction });
    if (!parent) errors.push({ path: "parentId", message: `model version ${parentId} does not exist` });
  }
  errors.push(
    ...(await checkPinned("pathwayIds", "pathway", pathwayIds, (ids) =>
      ctx.models.Pathway.findAll({ where: { id: { [Op.in]: ids } }, attributes: ["id"], transaction }),
    )),
    ...(await checkPinned("perilProfileIds", "peril profile", perilProfileIds, (ids) =>
      ctx.models.PerilProfile.findAll({ where: { id: { [Op.in]: ids } }, attributes: ["id"], transaction }),
    )),
  );
  if (errors.length > 0) throw badRequest(errors);
  return parent;
}

export async function createModelVersion(ctx: Ctx, user: RequestUser, body: CreateModelVersionBody): Promise<ModelVersion> {
  const input = createModelVersionBodySchema.parse(body);
  await assertEngineAcceptsModel(input.model, input.defaults);
  const row = await ctx.sequelize.transaction(async (transaction) => {
    const parent = await checkReferences(ctx, input.parentId, input.pathwayIds, input.perilProfileIds, transaction);
    const id = randomUUID();
    const { familyId, versionNumber } = await placeInLine(ctx, { id, name: input.name, parent }, transaction);
    const created = await ctx.models.ModelVersion.create(
      {
        id,
        familyId,
        versionNumber,
        name: input.name,
        status: "draft",
        parentId: input.parentId ?? null,
        model: input.model,
        defaults: input.defaults,
        notes: input.notes,
        pathwayIds: input.pathwayIds,
        perilProfileIds: input.perilProfileIds,
        authorId: user.id,
      },
      { transaction },
    );
    await recordAudit(
      ctx,
      {
        actorId: user.id,
        action: "model-version.created",
        entityType: "model-version",
        entityId: id,
        summary: `Draft model version "${created.name}" v${created.versionNumber} created${parent ? ` from "${parent.name}" v${parent.versionNumber}` : ""}.`,
        data: { parentId: created.parentId, familyId },
      },
      transaction,
    );
    return created;
  });
  return presentModelVersion(ctx, row);
}

function refuseUnlessEditableDraft(row: ModelVersionModel, user: RequestUser, verb: string): void {
  if (row.status === "approved" || row.status === "retired")
    throw conflict(`Model version "${row.name}" v${row.versionNumber} is ${row.status} and cannot change. Create a new version from it.`, "model_version_immutable");
  if (row.status !== "draft")
    throw conflict(`Model version "${row.name}" v${row.versionNumber} is ${row.status}; only a draft can be ${verb}.`, "model_version_not_draft");
  if (row.authorId !== user.id) throw forbidden(`Only the author of a draft can ${verb.replace(/ed$/, "")} it.`, "not_author");
}

export async function updateModelVersion(ctx: Ctx, user: RequestUser, id: string, body: UpdateModelVersionBody): Promise<ModelVersion> {
  await ctx.sequelize.transaction(async (transaction) => {
    const row = await findModelVersion(ctx, id, transaction);
    refuseUnlessEditableDraft(row, user, "edited");
    if (body.parentId === id) throw badRequest([{ path: "parentId", message: "cannot be the version itself" }]);
    if (body.model !== undefined || body.defaults !== undefined)
      // The route validated the body with the contracts schema, so these are parsed (defaults applied).
      await assertEngineAcceptsModel((body.model ?? row.model) as ModelSpec, (body.defaults ?? row.defaults) as ModelVersionDefaults);
    const newParent = await checkReferences(ctx, body.parentId, body.pathwayIds, body.perilProfileIds, transaction);
    const changes: Record<string, unknown> = Object.fromEntries(Object.entries(body).filter(([, v]) => v !== undefined));
    const before = `"${row.name}" v${row.versionNumber}`; // as it was known until this edit
    // A new name or parent can move the draft to another line of descent, and so renumber it.
    let renumbered = "";
    if (body.name !== undefined || body.parentId !== undefined) {
      const parentId = body.parentId !== undefined ? body.parentId : row.parentId;
      const parent = body.parentId !== undefined ? newParent : parentId ? await ctx.models.ModelVersion.findByPk(parentId, { transaction }) : null;
      const place = await placeInLine(ctx, { id: row.id, name: body.name ?? row.name, parent }, transaction);
      if (place.familyId !== row.familyId) {
        Object.assign(changes, place);
        renumbered = `; renumbered v${place.versionNumber} in its line of descent`;
      }
    }
    await row.update(changes, { transaction });
    await recordAudit(
      ctx,
      {
        actorId: user.id,
        action: "model-version.updated",
        entityType: "model-version",
        entityId: id,
        summary: `Draft ${before} edited (${Object.keys(body).filter((k) => body[k as keyof typeof body] !== undefined).join(", ") || "no fields"})${renumbered}.`,
        data: { fields: Object.keys(changes) },
      },
      transaction,
    );
  });
  return getModelVersion(ctx, id);
}

/** Governed content compared by the diff: what a reviewer signs off on. */
function governed(row: ModelVersionModel) {
  return { name: row.name, model: row.model, defaults: row.defaults, notes: row.notes, pathwayIds: row.pathwayIds ?? [], perilProfileIds: row.perilProfileIds ?? [] };
}

export async function diffModelVersion(ctx: Ctx, id: string, againstId?: string): Promise<ModelVersionDiff> {
  const row = await findModelVersion(ctx, id);
  const otherId = againstId ?? row.parentId;
  if (!otherId) return { against: null, changes: diffModelVersions({}, governed(row)) };
  const other = await findModelVersion(ctx, otherId);
  return {
    against: { id: other.id, name: other.name, versionNumber: other.versionNumber },
    changes: diffModelVersions(governed(other), governed(row)),
  };
}

export async function submitModelVersion(ctx: Ctx, user: RequestUser, id: string, changeClass: ChangeClass, note?: string): Promise<ModelVersion> {
  // A minor filing is held to the materiality policy first, outside the write transaction: the
  // preview takes seconds and must not hold the database. The draft must not change meanwhile.
  let materiality: MaterialityCheck | null = null;
  let checkedEditAt = 0;
  if (changeClass === "minor") {
    const before = await findModelVersion(ctx, id);
    refuseUnlessEditableDraft(before, user, "submitted");
    materiality = await checkMinorChange(ctx, before);
    checkedEditAt = before.updatedAt.getTime();
  }
  const row = await ctx.sequelize.transaction(async (transaction) => {
    const row = await findModelVersion(ctx, id, transaction);
    refuseUnlessEditableDraft(row, user, "submitted");
    if (materiality && row.updatedAt.getTime() !== checkedEditAt)
      throw conflict(`"${row.name}" v${row.versionNumber} changed while its materiality was checked; submit it again.`, "model_version_changed");
    await row.update({ status: "in-review", changeClass, submissionNote: note ?? null, submittedAt: new Date() }, { transaction });
    // The reviewer signs off on these numbers: they stop changing from now on, not at approval.
    await lockPathways(ctx, row.pathwayIds ?? [], transaction);
    await recordAudit(
      ctx,
      {
        actorId: user.id,
        action: "model-version.submitted",
        entityType: "model-version",
        entityId: id,
        summary: `"${row.name}" v${row.versionNumber} submitted for review as a ${changeClass} change.`,
        data: { changeClass, note: note ?? null, materiality },
      },
      transaction,
    );
    return row;
  });
  await mailSubmitted(ctx, row, user.name);
  return presentModelVersion(ctx, row);
}

type Decision = "approved" | "rejected";

/** Approve or reject an in-review version; the author can never decide their own (separation of duties). */
export async function decideModelVersion(ctx: Ctx, user: RequestUser, id: string, decision: Decision, comment: string): Promise<ModelVersion> {
  const row = await ctx.sequelize.transaction(async (transaction) => {
    const row = await findModelVersion(ctx, id, transaction);
    if (row.authorId === user.id)
      throw forbidden(`You wrote "${row.name}" v${row.versionNumber}; another manager must decide it.`, "self_approval_forbidden");
    if (row.status !== "in-review")
      throw conflict(`Model version "${row.name}" v${row.versionNumber} is ${row.status}; only a version in review can be ${decision}.`, "model_version_not_in_review");
    await row.update({ status: decision, decidedBy: user.id, decidedAt: new Date(), decisionComment: comment }, { transaction });
    if (decision === "approved") await lockPathways(ctx, row.pathwayIds ?? [], transaction);
    else await releasePathwayLocks(ctx.sequelize, row.pathwayIds ?? [], row.id, transaction);
    await recordAudit(
      ctx,
      {
        actorId: user.id,
        action: `model-version.${decision}`,
        entityType: "model-version",
        entityId: id,
        summary: `"${row.name}" v${row.versionNumber} ${decision} (${row.changeClass} change): ${comment}`,
        data: { comment, changeClass: row.changeClass, authorId: row.authorId },
      },
      transaction,
    );
    return row;
  });
  await mailDecided(ctx, row, user.name);
  return presentModelVersion(ctx, row);
}

/** Retire an approved version: no new runs on it; its runs stay reproducible. */
export async function retireModelVersion(ctx: Ctx, user: RequestUser, id: string, comment?: string): Promise<ModelVersion> {
  const row = await ctx.sequelize.transaction(async (transaction) => {
    const row = await findModelVersion(ctx, id, transaction);
    if (row.authorId === user.id)
      throw forbidden(`You wrote "${row.name}" v${row.versionNumber}; another manager must retire it.`, "self_approval_forbidden");
    if (row.status !== "approved")
      throw conflict(`Model version "${row.name}" v${row.versionNumber} is ${row.status}; only an approved version can be retired.`, "model_version_not_approved");
    await row.update({ status: "retired", retiredBy: user.id, retiredAt: new Date(), retireComment: comment ?? null }, { transaction });
    await recordAudit(
      ctx,
      {
        actorId: user.id,
        action: "model-version.retired",
        entityType: "model-version",
        entityId: id,
        summary: `"${row.name}" v${row.versionNumber} retired${comment ? `: ${comment}` : "."}`,
        data: { comment: comment ?? null },
      },
      transaction,
    );
    return row;
  });
  await mailDecided(ctx, row, user.name);
  return presentModelVersion(ctx, row);
}
