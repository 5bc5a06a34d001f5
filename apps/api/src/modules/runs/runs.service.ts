import { randomUUID } from "node:crypto";
import type { CreateRunBody, ErrorDetail, ListRunsQuery, Page, Run, RUN_SORT_KEYS, RunSummary } from "@plumeline/contracts";
import { Op, type WhereOptions } from "sequelize";
import type { Literal } from "sequelize/lib/utils";
import { createdBetween } from "../../db/paging/date-range.js";
import { findPage, type SortColumns } from "../../db/paging/find-page.js";
import { anyContains, personMatches } from "../../db/paging/like-pattern.js";
import type { AppContext } from "../../context.js";
import { badRequest, conflict, forbidden, notFound } from "../../errors/app-error.js";
import type { RequestUser } from "../../middleware/request-context.js";
import { RUN_JOB_TYPE } from "../../queue/job-types.js";
import { jobSignal } from "../../queue/job-signal.js";
import { createSqlJobQueue } from "../../queue/sql-job-queue.js";
import { recordAudit } from "../audit/audit.service.js";
import type { ModelVersionModel } from "../model-versions/model-version.model.js";
import { lockPathways } from "../pathways/pathways.service.js";
import { resolvePerilLens } from "../peril-profiles/resolve-peril-lens.js";
import { buildRunSpec } from "./build-run-spec.js";
import { assertRunQueueRoom } from "./queued-run-limit.js";
import type { RunModel } from "./run.model.js";

/**
 * The engine is loaded on first use, not at import: the app (and every module's tests) can
 * start while the engine package is being rebuilt, and only run endpoints depend on it.
 */
const loadEngine = () => import("@plumeline/engine");

type Ctx = Pick<AppContext, "models" | "sequelize" | "mailer" | "config">;
type RunSortKey = (typeof RUN_SORT_KEYS)[number];

const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);
/** Columns a list needs: the spec (all pathway series) stays out, so the queue screen stays fast. */
const SUMMARY_ATTRIBUTES = [
  "id", "name", "status", "progress", "exploratory", "modelVersionId", "pathwayIds", "members", "seed", "sampling",
  "perilProfileIds", "portfolioId", "createdBy", "createdAt", "startedAt", "finishedAt", "error", "jobId",
];

async function present(ctx: Pick<Ctx, "models">, rows: RunModel[]): Promise<RunSummary[]> {
  const versionIds = [...new Set(rows.map((r) => r.modelVersionId))];
  const userIds = [...new Set(rows.map((r) => r.createdBy))];
  // Only a run still in progress can be waiting for its worker to confirm a cancel.
  const activeJobIds = rows.filter((r) => (r.status === "queued" || r.status === "running") && r.jobId).map((r) => r.jobId!);
  const [versions, users, cancelling] = await Promise.all([
    ctx.models.ModelVersion.findAll({ where: { id: { [Op.in]: versionIds } }, attributes: ["id", "name", "versionNumber", "status"] }),
    ctx.models.User.findAll({ where: { id: { [Op.in]: userIds } }, attributes: ["id", "name"] }),
    activeJobIds.length === 0
      ? Promise.resolve([])
      : ctx.models.Job.findAll({ where: { id: { [Op.in]: activeJobIds }, cancelRequested: true }, attributes: ["id"] }),
  ]);
  const cancelRequested = new Set(cancelling.map((j) => j.id));
  const versionById = new Map(versions.map((v) => [v.id, v]));
  const nameById = new Map(users.map((u) => [u.id, u.name]));
  return rows.map((r) => {
    const v = versionById.get(r.modelVersionId);
    return {
      id: r.id,
      name: r.name,
      status: r.status,
      progress: r.progress,
      exploratory: r.exploratory,
      modelVersion: { id: r.modelVersionId, name: v?.name ?? "?", versionNumber: v?.versionNumber ?? 0, status: v?.status ?? "draft" },
      pathwayIds: r.pathwayIds,
      members: r.members,
      seed: r.seed,
      sampling: r.sampling,
      perilProfileIds: r.perilProfileIds ?? [],
      portfolioId: r.portfolioId ?? null,
      createdBy: r.createdBy,
      createdByName: nameById.get(r.createdBy) ?? null,
      createdAt: r.createdAt.toISOString(),
      startedAt: iso(r.startedAt),
      finishedAt: iso(r.finishedAt),
      error: r.error ?? null,
      cancelRequested: (r.status === "queued" || r.status === "running") && r.jobId !== null && cancelRequested.has(r.jobId),
    };
  });
}

const RUN_SORT_COLUMNS: SortColumns<RunSortKey> = { createdAt: ["createdAt"], name: ["name"], status: ["status"], members: ["members"] };

/** One page of runs: `q` in the name, `author` in the creator's name or email, status, mine, exploratory, created from/to. */
export async function listRuns(ctx: Ctx, user: RequestUser, query: ListRunsQuery): Promise<Page<RunSummary>> {
  const conditions: Array<WhereOptions | Literal> = [...createdBetween(query)];
  if (query.mine === "true") conditions.push({ createdBy: user.id });
  if (query.exploratory) conditions.push({ exploratory: query.exploratory === "true" });
  if (query.status) conditions.push({ status: query.status });
  if (query.q) conditions.push(anyContains(ctx.sequelize, ["name"], query.q));
  if (query.author) conditions.push(personMatches(ctx.sequelize, "created_by", query.author));
  const { rows, total } = await findPage(ctx.models.Run, { conditions, page: query, sortColumns: RUN_SORT_COLUMNS, attributes: SUMMARY_ATTRIBUTES });
  return { items: await present(ctx, rows), total };
}

export async function findRun(ctx: Pick<Ctx, "models">, id: string): Promise<RunModel> {
  const row = await ctx.models.Run.findByPk(id);
  if (!row) throw notFound("Run", id);
  return row;
}

export async function getRun(ctx: Ctx, id: string): Promise<Run> {
  const row = await findRun(ctx, id);
  const [summary] = await present(ctx, [row]);
  // The manifest names each pathway; its series (agents, ~24 kB of JSON each) stay unread, since
  // a page showing a running run asks for this several times a second.
  const pathways = await ctx.models.Pathway.findAll({
    where: { id: { [Op.in]: row.pathwayIds } },
    attributes: ["id", "name", "checksum", "source", "vintage"],
  });
  const byId = new Map(pathways.map((p) => [p.id, p]));
  return {
    ...summary!,
    manifest: {
      engineVersion: row.engineVersion ?? null,
      inputHash: row.inputHash,
      resultHash: row.resultHash ?? null,
      spec: row.spec,
      pathways: row.pathwayIds.map((pid) => {
        const p = byId.get(pid);
        return { id: pid, name: p?.name ?? "?", checksum: p?.checksum ?? "", source: p?.source ?? "", vintage: p?.vintage ?? "" };
      }),
    },
  };
}

/**
 * Creates a run and its queue job in ONE transaction: the spec is built from the model
 * version and pathways and validated against the engine contract first; pathways are locked
 * (their numbers are now part of a record). A run on a version that is not approved is
 * exploratory, for ever.
 */
export async function createRun(ctx: Ctx, user: RequestUser, body: CreateRunBody): Promise<RunSummary> {
  const { inputHash } = await loadEngine();
  const run = await ctx.sequelize.transaction(async (transaction) => {
    await assertRunQueueRoom(ctx, user.id, transaction);
    const errors: ErrorDetail[] = [];
    const version: ModelVersionModel | null = await ctx.models.ModelVersion.findByPk(body.modelVersionId, { transaction });
    if (!version) errors.push({ path: "modelVersionId", message: `model version ${body.modelVersionId} does not exist` });
    const pathways = await ctx.models.Pathway.findAll({ where: { id: { [Op.in]: body.pathwayIds } }, transaction });
    const byId = new Map(pathways.map((p) => [p.id, p]));
    body.pathwayIds.forEach((id, i) => {
      if (!byId.has(id)) errors.push({ path: `pathwayIds[${i}]`, message: `pathway ${id} does not exist` });
    });
    // A run that does not name peril profiles uses the ones its model version pins ([] opts out).
    const perilProfileIds = body.perilProfileIds ?? version?.perilProfileIds ?? [];
    const peril = await resolvePerilLens(ctx, { ...body, perilProfileIds }, transaction); // peril lens: profiles + portfolio rows copied into the spec
    errors.push(...peril.errors);
    if (errors.length > 0 || !version) throw badRequest(errors);
    if (version.status === "retired")
      throw conflict(`Model version "${version.name}" v${version.versionNumber} is retired; new runs need a current version.`, "model_version_retired");
    const ordered = body.pathwayIds.map((id) => byId.get(id)!);
    const built = buildRunSpec(body, version, ordered, peril.spec);
    if (!built.ok) throw badRequest(built.errors, "The run does not make a valid engine spec.");

    const id = randomUUID();
    const exploratory = version.status !== "approved";
    const created = await ctx.models.Run.create(
      {
        id,
        name: body.name?.trim() || `${version.name} v${version.versionNumber} · ${ordered.map((p) => p.name).join(", ")}`.slice(0, 120),
        modelVersionId: version.id,
        pathwayIds: body.pathwayIds,
        members: body.members,
        seed: body.seed,
        sampling: body.sampling,
        spec: built.spec,
        // The engine's own hash of the spec (defaults applied), so the result's inputHash matches.
        inputHash: inputHash(built.spec),
        exploratory,
        status: "queued",
        progress: 0,
        perilProfileIds,
        portfolioId: body.portfolioId ?? null,
        createdBy: user.id,
      },
      { transaction },
    );
    const jobId = await createSqlJobQueue(ctx.models.Job).enqueue(RUN_JOB_TYPE, { runId: id }, transaction);
    await created.update({ jobId }, { transaction });
    await lockPathways(ctx, body.pathwayIds, transaction);
    await recordAudit(
      ctx,
      {
        actorId: user.id,
        action: "run.created",
        entityType: "run",
        entityId: id,
        summary: `Run "${created.name}" queued: ${body.members} members, seed "${body.seed}", ${exploratory ? "EXPLORATORY" : "approved"} model version v${version.versionNumber}.`,
        data: { jobId, inputHash: created.inputHash, modelVersionId: version.id, pathwayIds: body.pathwayIds, exploratory },
      },
      transaction,
    );
    return created;
  });
  jobSignal.emit("enqueued");
  const [summary] = await present(ctx, [run]);
  return summary!;
}

/**
 * Owner cancels: a queued run stops at once; a running one at its next simulated year, once its
 * worker confirms. Idempotent: cancelling a run whose cancel is already under way, or that
 * ended cancelled, answers its current state and writes nothing (no second audit row).
 */
export async function cancelRun(ctx: Ctx, user: RequestUser, id: string): Promise<RunSummary> {
  const run = await findRun(ctx, id);
  if (run.createdBy !== user.id) throw forbidden("Only the person who started a run can cancel it.", "not_owner");
  if (run.status === "succeeded" || run.status === "failed")
    throw conflict(`Run "${run.name}" is already ${run.status}.`, "run_finished");
  if (run.status === "queued" || run.status === "running") {
    const outcome = await ctx.sequelize.transaction(async (transaction) => {
      const outcome = run.jobId ? await createSqlJobQueue(ctx.models.Job).requestCancel(run.jobId, transaction) : "finished";
      if (outcome === "finished") throw conflict(`Run "${run.name}" finished meanwhile.`, "run_finished");
      if (outcome === "already") return outcome;
      if (outcome === "cancelled") await run.update({ status: "cancelled", finishedAt: new Date() }, { transaction });
      await recordAudit(
        ctx,
        {
          actorId: user.id,
          action: outcome === "cancelled" ? "run.cancelled" : "run.cancel-requested",
          entityType: "run",
          entityId: id,
          summary: outcome === "cancelled" ? `Run "${run.name}" cancelled before it started.` : `Cancellation of running run "${run.name}" requested.`,
        },
        transaction,
      );
      return outcome;
    });
    // QUEUE=bullmq: the worker may be on another machine; the transport passes the request on through Redis.
    if (outcome !== "already" && run.jobId) jobSignal.emit("cancel-requested", run.jobId);
  }
  await run.reload({ attributes: SUMMARY_ATTRIBUTES });
  const [summary] = await present(ctx, [run]);
  return summary!;
}
