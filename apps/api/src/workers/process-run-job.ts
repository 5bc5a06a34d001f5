import { runJobPayloadSchema, type RunResult } from "@plumeline/contracts";
import { recordAudit } from "../modules/audit/audit.service.js";
import type { ResultDocument } from "../modules/results/result-document.js";
import { storeRunResult } from "../modules/results/store-run-result.js";
import type { RunModel } from "../modules/runs/run.model.js";
import type { ClaimedJob, JobQueue } from "../queue/job-queue.js";
import { EngineThreadCrashed, type EngineOutcome, type EngineRunner } from "./engine-thread-client.js";
import { processClaimedReplayJob } from "./process-replay-job.js";
import { OutcomeDiscarded, type StepOptions, type StepOutcome, type WorkerContext } from "./worker-step.js";
import { REPLAY_JOB_TYPE, RUN_JOB_TYPE } from "../queue/job-types.js";
import { mailRunOutcome } from "./run-notifications.js";
import { logger } from "../logging/logger.js";

/**
 * One worker step: claim the oldest queued run job, run the engine in
 * `thread`, and write the outcome (QUEUE=sqlite: the poller's step).
 */
export async function processNextRunJob(
  ctx: WorkerContext,
  queue: JobQueue,
  workerId: string,
  thread: EngineRunner,
  options: StepOptions = {},
): Promise<StepOutcome> {
  // Runs and replays share the queue, the order and the WORKERS limit.
  const job = await queue.claimNext(workerId, [RUN_JOB_TYPE, REPLAY_JOB_TYPE]);
  if (!job) return "idle";
  if (job.type === REPLAY_JOB_TYPE) return processClaimedReplayJob(ctx, queue, job, thread, options);
  return processClaimedRunJob(ctx, queue, job, thread, options);
}

/**
 * Runs a job this worker has claimed (from the poller above, or from a BullMQ delivery) in
 * `thread`. The result, the run's new state, the job's end and the audit row commit in ONE
 * transaction, so a run is never "succeeded" without its result. A thread crash gives the job
 * back to the queue (or fails it after its last attempt).
 */
export async function processClaimedRunJob(
  ctx: WorkerContext,
  queue: JobQueue,
  job: ClaimedJob,
  thread: EngineRunner,
  options: StepOptions = {},
): Promise<StepOutcome> {
  const workerId = job.lockedBy;
  const payload = job.type === RUN_JOB_TYPE ? runJobPayloadSchema.safeParse(job.payload) : null;
  const run = payload?.success ? await ctx.models.Run.findByPk(payload.data.runId) : null;
  if (!run) {
    const reason = payload?.success ? `run ${payload.data.runId} no longer exists` : "job payload is not a run job";
    await ctx.sequelize.transaction((t) => queue.finish(job.id, workerId, "failed", t, reason));
    return "failed";
  }
  await run.update({ status: "running", startedAt: new Date(), progress: 0, error: null });

  const progress = throttledProgress(ctx, queue, job, run, thread, options.progressWriteMs ?? 500);
  let outcome: EngineOutcome;
  try {
    outcome = await thread.run(run.spec, progress.report);
  } catch (error) {
    await progress.flush();
    if (!(error instanceof EngineThreadCrashed)) throw error;
    const stopping = options.isStopping?.() ?? false;
    return giveBack(ctx, queue, job, run, stopping ? "the server shut down while the run was in progress" : error.message, stopping);
  }
  await progress.flush();
  return recordRunOutcome(ctx, queue, job, run, outcome);
}

/** Progress writes at most every `everyMs`, one at a time; each doubles as heartbeat and cancel check. */
function throttledProgress(ctx: WorkerContext, queue: JobQueue, job: ClaimedJob, run: RunModel, thread: EngineRunner, everyMs: number) {
  let last = 0;
  let chain: Promise<void> = Promise.resolve();
  let writing = false;
  return {
    report: (fraction: number) => {
      const now = Date.now();
      if (writing || now - last < everyMs) return;
      last = now;
      writing = true;
      chain = chain
        .then(async () => {
          const beat = await queue.heartbeat(job.id, job.lockedBy, fraction);
          if (beat.cancelRequested) thread.cancel();
          await ctx.models.Run.update({ progress: fraction }, { where: { id: run.id, status: "running" } });
        })
        .catch((error: unknown) => logger.error({ err: error, runId: run.id }, "writing run progress failed"))
        .finally(() => (writing = false));
    },
    flush: () => chain,
  };
}

/**
 * Writes a run job's end. The result (one compressed document), the run's new state, the job's
 * end (guarded: only while `job.lockedBy` holds it) and the audit row commit in ONE short
 * transaction, so a run is never "succeeded" without its result and never stored twice.
 * `compressed`: the result as it came back through the queue, stored as it is.
 */
export async function recordRunOutcome(
  ctx: WorkerContext,
  queue: JobQueue,
  job: Pick<ClaimedJob, "id" | "lockedBy" | "attempts">,
  run: RunModel,
  outcome: EngineOutcome,
  compressed?: ResultDocument,
): Promise<"succeeded" | "failed" | "cancelled"> {
  const finishedAt = new Date();
  let status: "succeeded" | "failed" | "cancelled" = outcome.kind === "done" ? "succeeded" : outcome.kind;
  let error = outcome.kind === "failed" ? outcome.message : null;
  if (outcome.kind === "done") {
    if (outcome.contractWarning) logger.warn({ runId: run.id, at: outcome.contractWarning }, "run result deviates from the contract schema");
    const problem = resultProblem(outcome.result, run);
    if (problem) {
      status = "failed";
      error = `the engine returned an unusable result: ${problem}`;
    }
  }
  await ctx.sequelize.transaction(async (transaction) => {
    // The guard first: a holder that lost the job (or a second report of one outcome) writes nothing.
    const finished = await queue.finish(job.id, job.lockedBy, status, transaction, error ?? undefined);
    if (!finished) throw new OutcomeDiscarded(`job ${job.id} is no longer held by ${job.lockedBy}; outcome discarded`);
    if (status === "succeeded" && outcome.kind === "done") {
      await storeRunResult(ctx.models, run.id, outcome.result, transaction, compressed);
      await run.update(
        { status, progress: 1, finishedAt, engineVersion: outcome.result.engineVersion, resultHash: outcome.result.resultHash, error: null },
        { transaction },
      );
    } else {
      await run.update({ status, finishedAt, error }, { transaction });
    }
    await recordAudit(
      ctx,
      {
        actorId: null,
        action: `run.${status}`,
        entityType: "run",
        entityId: run.id,
        summary:
          status === "succeeded"
            ? `Run "${run.name}" finished (${run.members} members, result hash ${run.resultHash}).`
            : status === "cancelled"
              ? `Run "${run.name}" was cancelled while running.`
              : `Run "${run.name}" failed: ${error}`,
        data: { jobId: job.id, attempt: job.attempts, workerId: job.lockedBy, resultHash: run.resultHash, error },
      },
      transaction,
    );
  });
  await mailRunOutcome(ctx, run);
  return status;
}

/**
 * What the stored result must carry for the API to serve it: hashes, engine version and one
 * entry per pathway of the spec. A deviation from the full contract schema is only logged
 * by the engine thread (the contract and the engine evolve together; a run is not thrown away
 * over a new field).
 */
function resultProblem(result: RunResult, run: RunModel): string | null {
  if (typeof result?.resultHash !== "string" || typeof result.inputHash !== "string") return "it has no hashes";
  if (typeof result.engineVersion !== "string") return "it has no engine version";
  const ids = (result.pathways ?? []).map((p) => p.id);
  if (ids.join("|") !== run.spec.pathways.map((p) => p.id).join("|")) return "its pathways do not match the spec";
  return null;
}

/** The thread died under the job: back to the queue while attempts remain, else failed with the reason. */
async function giveBack(ctx: WorkerContext, queue: JobQueue, job: ClaimedJob, run: RunModel, reason: string, refundAttempt = false): Promise<StepOutcome> {
  const status = await queue.release(job.id, job.lockedBy, reason, { refundAttempt });
  if (status === null) return "failed";
  const runStatus = status === "queued" ? "queued" : status;
  await run.update({
    status: runStatus,
    progress: 0,
    error: status === "queued" ? null : `${reason} (after ${job.attempts} attempt${job.attempts === 1 ? "" : "s"})`,
    finishedAt: status === "queued" ? null : new Date(),
  });
  await recordAudit(ctx, {
    actorId: null,
    action: status === "queued" ? "run.requeued" : `run.${runStatus}`,
    entityType: "run",
    entityId: run.id,
    summary: status === "queued" ? `Run "${run.name}" went back to the queue: ${reason}.` : `Run "${run.name}" ${runStatus}: ${reason}.`,
    data: { jobId: job.id, attempt: job.attempts, reason },
  });
  if (runStatus === "failed") await mailRunOutcome(ctx, run);
  return status === "queued" ? "requeued" : runStatus === "cancelled" ? "cancelled" : "failed";
}

/** After start-up re-queueing, bring each affected run's state in line with its job. */
export async function syncRunsWithRequeuedJobs(ctx: WorkerContext, jobs: Array<{ id: string; status: "queued" | "failed" }>): Promise<void> {
  for (const { id, status } of jobs) {
    const job = await ctx.models.Job.findByPk(id);
    if (job?.type === REPLAY_JOB_TYPE) {
      const replayId = (job.payload as { replayId?: string }).replayId ?? "";
      await ctx.models.RunReplay.update(
        { status, progress: 0, error: status === "failed" ? job.lastError : null, finishedAt: status === "failed" ? new Date() : null },
        { where: { id: replayId } },
      );
      continue;
    }
    const payload = runJobPayloadSchema.safeParse(job?.payload);
    if (!job || !payload.success) continue;
    const run = await ctx.models.Run.findByPk(payload.data.runId);
    if (!run) continue;
    await run.update({
      status,
      progress: 0,
      error: status === "failed" ? job.lastError : null,
      finishedAt: status === "failed" ? new Date() : null,
    });
    await recordAudit(ctx, {
      actorId: null,
      action: status === "queued" ? "run.requeued" : "run.failed",
      entityType: "run",
      entityId: run.id,
      summary: `Run "${run.name}" was left running by a stopped server; ${status === "queued" ? "it is queued again" : "it has no attempts left and failed"}.`,
      data: { jobId: id, reason: job.lastError },
    });
    if (status === "failed") await mailRunOutcome(ctx, run);
  }
}
