import { replayJobPayloadSchema } from "@plumeline/contracts";
import { Op } from "sequelize";
import { recordAudit } from "../modules/audit/audit.service.js";
import type { RunReplayModel } from "../modules/runs/run-replay.model.js";
import type { ClaimedJob, JobQueue } from "../queue/job-queue.js";
import type { JobModel } from "../queue/job.model.js";
import { BULLMQ_HOLDER, type EngineJobKindHandler } from "./engine-job-kind.js";
import { EngineThreadCrashed, type EngineOutcome, type EngineRunner } from "./engine-thread-client.js";
import { OutcomeDiscarded, type StepOptions, type StepOutcome, type WorkerContext } from "./worker-step.js";
import { logger } from "../logging/logger.js";

const replayIdOf = (payload: unknown) => replayJobPayloadSchema.parse(payload).replayId;

async function replayAndRun(ctx: WorkerContext, payload: unknown) {
  const replay = await ctx.models.RunReplay.findByPk(replayIdOf(payload));
  const run = replay ? await ctx.models.Run.findByPk(replay.runId) : null;
  return { replay, run };
}

/**
 * Writes a replay's end: the job's end (guarded by its holder, first, so a second report writes
 * nothing), the replay's hash and whether it matched, and the audit row, in one transaction.
 */
export async function recordReplayOutcome(
  ctx: WorkerContext,
  queue: JobQueue,
  job: Pick<ClaimedJob, "id" | "lockedBy" | "attempts">,
  replay: RunReplayModel,
  runName: string,
  runEngineVersion: string | null,
  outcome: EngineOutcome,
): Promise<"succeeded" | "failed" | "cancelled"> {
  const status = outcome.kind === "done" ? "succeeded" : outcome.kind;
  const error = outcome.kind === "failed" ? outcome.message : outcome.kind === "cancelled" ? "the replay was stopped" : null;
  await ctx.sequelize.transaction(async (transaction) => {
    const finished = await queue.finish(job.id, job.lockedBy, status, transaction, error ?? undefined);
    if (!finished) throw new OutcomeDiscarded(`job ${job.id} is no longer held by ${job.lockedBy}; outcome discarded`);
    if (outcome.kind === "done") {
      const matched = outcome.result.resultHash === replay.resultHash;
      const engine = outcome.result.engineVersion;
      await replay.update(
        { status, progress: 1, matched, replayHash: outcome.result.resultHash, engineVersion: engine, error: null, finishedAt: new Date() },
        { transaction },
      );
      await recordAudit(
        ctx,
        {
          actorId: replay.requestedBy,
          action: "run.replayed",
          entityType: "run",
          entityId: replay.runId,
          summary: `Run "${runName}" replayed: result hash ${matched ? "matches" : "DIFFERS"} (engine ${engine}${runEngineVersion !== engine ? `, run made with ${runEngineVersion}` : ""}).`,
          data: { replayId: replay.id, matched, resultHash: replay.resultHash, replayHash: outcome.result.resultHash, engineVersion: engine },
        },
        transaction,
      );
    } else {
      await replay.update({ status, error, finishedAt: new Date() }, { transaction });
      await recordAudit(
        ctx,
        { actorId: replay.requestedBy, action: "run.replay-failed", entityType: "run", entityId: replay.runId, summary: `Replay of run "${runName}" did not finish: ${error}.`, data: { replayId: replay.id, error } },
        transaction,
      );
    }
  });
  return status;
}

/** QUEUE=sqlite: runs a claimed replay job in `thread`, as processClaimedRunJob does for runs. */
export async function processClaimedReplayJob(ctx: WorkerContext, queue: JobQueue, job: ClaimedJob, thread: EngineRunner, options: StepOptions = {}): Promise<StepOutcome> {
  const { replay, run } = await replayAndRun(ctx, job.payload);
  if (!replay || !run) {
    await ctx.sequelize.transaction((t) => queue.finish(job.id, job.lockedBy, "failed", t, "the replay or its run no longer exists"));
    return "failed";
  }
  await replay.update({ status: "running", startedAt: new Date(), progress: 0 });
  const everyMs = options.progressWriteMs ?? 500;
  let last = 0;
  let chain: Promise<unknown> = Promise.resolve();
  const report = (fraction: number) => {
    const now = Date.now();
    if (now - last < everyMs) return;
    last = now;
    chain = chain
      .then(() => queue.heartbeat(job.id, job.lockedBy, fraction))
      .then(() => ctx.models.RunReplay.update({ progress: fraction }, { where: { id: replay.id, status: "running" } }))
      .catch((error: unknown) => logger.error({ err: error, replayId: replay.id }, "writing replay progress failed"));
  };
  let outcome: EngineOutcome;
  try {
    outcome = await thread.run(run.spec, report);
  } catch (error) {
    await chain;
    if (!(error instanceof EngineThreadCrashed)) throw error;
    const stopping = options.isStopping?.() ?? false;
    const status = await queue.release(job.id, job.lockedBy, error.message, { refundAttempt: stopping });
    if (status === null) return "failed";
    await replay.update({ status, progress: 0, error: status === "queued" ? null : error.message, finishedAt: status === "queued" ? null : new Date() });
    return status === "queued" ? "requeued" : status;
  }
  await chain;
  return recordReplayOutcome(ctx, queue, job, replay, run.name, run.engineVersion ?? null, outcome);
}

/** Replays through BullMQ (engine-job-kind.ts): the replay row mirrors its job. */
export function replayJobKind(ctx: WorkerContext, queue: JobQueue): EngineJobKindHandler {
  return {
    kind: "replay",
    async specOf(row: JobModel) {
      const { run } = await replayAndRun(ctx, row.payload);
      if (!run) throw new Error("the replay or its run no longer exists");
      return run.spec;
    },
    async started(row) {
      await ctx.models.RunReplay.update({ status: "running", startedAt: new Date(), progress: 0 }, { where: { id: replayIdOf(row.payload), status: { [Op.in]: ["queued", "running"] } } });
    },
    async progressed(row, fraction) {
      await ctx.models.RunReplay.update({ progress: fraction }, { where: { id: replayIdOf(row.payload), status: "running" } });
    },
    async requeued(row) {
      await ctx.models.RunReplay.update({ status: "queued", progress: 0 }, { where: { id: replayIdOf(row.payload), status: "running" } });
    },
    async finished(row, outcome) {
      const { replay, run } = await replayAndRun(ctx, row.payload);
      if (!replay || !run) throw new OutcomeDiscarded("the replay or its run no longer exists");
      await recordReplayOutcome(ctx, queue, { id: row.id, lockedBy: BULLMQ_HOLDER, attempts: row.attempts }, replay, run.name, run.engineVersion ?? null, outcome);
    },
  };
}
