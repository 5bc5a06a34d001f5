import { randomUUID } from "node:crypto";
import type { Replay } from "@plumeline/contracts";
import { Op } from "sequelize";
import type { AppContext } from "../../context.js";
import { conflict, notFound } from "../../errors/app-error.js";
import type { RequestUser } from "../../middleware/request-context.js";
import { REPLAY_JOB_TYPE } from "../../queue/job-types.js";
import { jobSignal } from "../../queue/job-signal.js";
import { createSqlJobQueue } from "../../queue/sql-job-queue.js";
import { recordAudit } from "../audit/audit.service.js";
import type { RunReplayModel } from "./run-replay.model.js";
import { findRun } from "./runs.service.js";

type Ctx = Pick<AppContext, "models" | "sequelize">;

export function presentReplay(r: RunReplayModel): Replay {
  return {
    id: r.id,
    runId: r.runId,
    status: r.status,
    progress: r.progress,
    matched: r.matched ?? null,
    resultHash: r.resultHash ?? null,
    replayHash: r.replayHash ?? null,
    engineVersion: r.engineVersion ?? null,
    error: r.error ?? null,
    requestedBy: r.requestedBy,
    createdAt: r.createdAt.toISOString(),
    finishedAt: r.finishedAt ? r.finishedAt.toISOString() : null,
  };
}

/**
 * Queues a replay of a finished run: the same queue and WORKERS limit as runs (a replay of a
 * million-member run costs what the run cost), and at most one replay waiting or running per
 * person, so nobody can start engine work without limit. The replay row, its job and the audit
 * row commit together.
 */
export async function requestReplay(ctx: Ctx, user: RequestUser, runId: string): Promise<Replay> {
  const run = await findRun(ctx, runId);
  if (run.status !== "succeeded" || !run.resultHash)
    throw conflict(`Run "${run.name}" is ${run.status}; only a finished run can be replayed.`, "run_not_finished");
  const replay = await ctx.sequelize.transaction(async (transaction) => {
    const open = await ctx.models.RunReplay.findOne({
      where: { requestedBy: user.id, status: { [Op.in]: ["queued", "running"] } },
      attributes: ["id", "runId"],
      transaction,
    });
    if (open)
      throw conflict(
        `You already have a replay waiting or running (of run ${open.runId}); one replay at a time per person — wait for it to finish.`,
        "replay_in_progress",
      );
    const id = randomUUID();
    const jobId = await createSqlJobQueue(ctx.models.Job).enqueue(REPLAY_JOB_TYPE, { replayId: id }, transaction);
    const created = await ctx.models.RunReplay.create(
      { id, runId, jobId, requestedBy: user.id, status: "queued", progress: 0, resultHash: run.resultHash },
      { transaction },
    );
    await recordAudit(
      ctx,
      { actorId: user.id, action: "run.replay-requested", entityType: "run", entityId: runId, summary: `Replay of run "${run.name}" queued.`, data: { replayId: id, jobId } },
      transaction,
    );
    return created;
  });
  jobSignal.emit("enqueued");
  return presentReplay(replay);
}

export async function getReplay(ctx: Pick<Ctx, "models">, runId: string, replayId: string): Promise<Replay> {
  const replay = await ctx.models.RunReplay.findOne({ where: { id: replayId, runId } });
  if (!replay) throw notFound("Replay", replayId);
  return presentReplay(replay);
}

/** The run's replays, newest first (the page shows the latest and its progress). */
export async function listReplays(ctx: Pick<Ctx, "models">, runId: string): Promise<Replay[]> {
  await findRun(ctx, runId);
  const rows = await ctx.models.RunReplay.findAll({ where: { runId }, order: [["createdAt", "DESC"]], limit: 20 });
  return rows.map(presentReplay);
}
