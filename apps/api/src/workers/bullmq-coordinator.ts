import { Op } from "sequelize";
import { decompressResult, type ResultDocument } from "../modules/results/result-document.js";
import { createBullmqTransport, type BullmqTransport, type EngineBullJob } from "../queue/bullmq-transport.js";
import { encodeSpec } from "../queue/engine-job-protocol.js";
import type { JobQueue } from "../queue/job-queue.js";
import { jobSignal } from "../queue/job-signal.js";
import type { JobModel } from "../queue/job.model.js";
import { BULLMQ_HOLDER, type EngineJobKindHandler } from "./engine-job-kind.js";
import type { EngineOutcome } from "./engine-thread-client.js";
import { OutcomeDiscarded, type WorkerContext } from "./worker-step.js";
import { startRemoteEngineWorker, type RemoteEngineWorker } from "./remote-engine-worker.js";
import type { WorkerPool } from "./worker-pool.js";
import { logger } from "../logging/logger.js";

export interface BullmqCoordinatorOptions {
  redisUrl: string;
  queueName?: string;
  /** Engine threads of a worker inside this process (config WORKERS); 0 = this process computes nothing. */
  workers: number;
  /** Job types and what recording them means, by the job row's `type`. */
  kinds: Record<string, EngineJobKindHandler>;
  /** How often the reconcile sweep compares rows with BullMQ and publishes undispatched rows. */
  reconcileMs?: number;
  /** Least time between two progress writes of one job to the database. */
  progressWriteMs?: number;
  /** For the in-process worker: BullMQ lock (a killed worker's job moves on this long after). */
  workerLockMs?: number;
}

export interface BullmqCoordinator extends WorkerPool {
  readonly transport: BullmqTransport;
  /** The engine worker inside this process (null with WORKERS=0). */
  readonly localWorker: RemoteEngineWorker | null;
  /** One reconcile sweep now (publish undispatched rows; settle what the events did not). */
  reconcile(): Promise<void>;
}

const TERMINAL = new Set(["succeeded", "failed", "cancelled"]);

/**
 * QUEUE=bullmq on the API's side (apps/api/QUEUE.md). The API stays the only writer of the
 * SQLite file: it publishes each job row with its spec (the outbox), records the workers'
 * events — started, progress, given back, finished — into the rows, stores the compressed
 * result a worker returns in the same short transaction as the run's end, and removes the
 * BullMQ job once that is written. Events are handled one at a time in arrival order; a
 * periodic sweep settles anything an event did not (the API was down, Redis lost a job).
 */
export function startBullmqCoordinator(ctx: WorkerContext, queue: JobQueue, options: BullmqCoordinatorOptions): Promise<BullmqCoordinator> {
  const kindOf = (row: JobModel) => options.kinds[row.type];
  const transport = createBullmqTransport(ctx.models.Job, {
    redisUrl: options.redisUrl,
    queueName: options.queueName,
    async dataOf(row) {
      const kind = kindOf(row);
      if (!kind) throw new Error(`job type ${row.type} has no engine worker`);
      return { jobId: row.id, kind: kind.kind, ...encodeSpec(await kind.specOf(row)) };
    },
    async onUnpublishable(row, reason) {
      if (!(await queue.claim(row.id, BULLMQ_HOLDER))) return;
      await ctx.sequelize.transaction((t) => queue.finish(row.id, BULLMQ_HOLDER, "failed", t, reason));
    },
  });
  const progressWriteMs = options.progressWriteMs ?? 250;
  let stopping = false;
  // Events are recorded one after another, in the order BullMQ published them.
  let chain: Promise<void> = Promise.resolve();
  const inTurn = (label: string, step: () => Promise<void>) => {
    chain = chain.then(step).catch((error: unknown) => {
      if (!stopping) logger.error({ err: error, event: label }, "recording a BullMQ event failed");
    });
    return chain;
  };

  async function started(jobId: string): Promise<void> {
    const claimed = await queue.claim(jobId, BULLMQ_HOLDER);
    if (!claimed) return; // cancelled while queued, or already running (a second event)
    const row = await ctx.models.Job.findByPk(jobId);
    if (row) await kindOf(row)?.started(row);
  }

  async function givenBack(jobId: string, reason: string): Promise<void> {
    const [moved] = await ctx.models.Job.update(
      { status: "queued", lockedBy: null, lockedAt: null, lastError: reason, progress: 0 },
      { where: { id: jobId, status: "running", lockedBy: BULLMQ_HOLDER } },
    );
    if (moved !== 1) return;
    const row = await ctx.models.Job.findByPk(jobId);
    if (row) await kindOf(row)?.requeued(row, reason);
  }

  /** Records a job BullMQ has finished (completed or failed), then removes it from Redis. */
  async function settle(jobId: string, known?: EngineBullJob): Promise<void> {
    const bull = known ?? (await transport.getJob(jobId));
    if (!bull) return;
    const state = await bull.getState();
    if (state !== "completed" && state !== "failed") return;
    let row = await ctx.models.Job.findByPk(jobId);
    if (row && row.status === "queued") {
      // Its start event was missed: take the row first, so the outcome is written by its holder.
      await queue.claim(jobId, BULLMQ_HOLDER);
      row = await ctx.models.Job.findByPk(jobId);
    }
    const kind = row ? kindOf(row) : undefined;
    if (row && kind && row.status === "running" && row.lockedBy === BULLMQ_HOLDER) {
      const { outcome, compressed } = outcomeOf(bull, state);
      try {
        await kind.finished(row, outcome, compressed);
      } catch (error) {
        if (!(error instanceof OutcomeDiscarded)) throw error;
      }
    }
    // Written (or already written before, or not ours): Redis need not keep it.
    await bull.remove().catch(() => undefined);
  }

  const lastProgress = new Map<string, number>();
  async function progressed(jobId: string, fraction: number): Promise<void> {
    const now = Date.now();
    if (now - (lastProgress.get(jobId) ?? 0) < progressWriteMs) return;
    lastProgress.set(jobId, now);
    const row = await ctx.models.Job.findByPk(jobId, { attributes: ["id", "type", "payload", "status"] });
    if (!row || row.status !== "running") return;
    await ctx.models.Job.update({ progress: fraction, heartbeatAt: new Date() }, { where: { id: jobId, status: "running" } });
    await kindOf(row)?.progressed(row, fraction);
  }

  async function reconcile(): Promise<void> {
    await transport.publishPending();
    const types = Object.keys(options.kinds);
    const rows = await ctx.models.Job.findAll({
      where: {
        type: { [Op.in]: types },
        [Op.or]: [{ status: "running" }, { status: "queued", dispatchedAt: { [Op.ne]: null } }],
      },
    });
    let lost = 0;
    for (const row of rows) {
      const bull = await transport.getJob(row.id);
      if (!bull) {
        // Redis no longer has it (emptied, or a different Redis): publish it again.
        const [again] = await ctx.models.Job.update(
          { status: "queued", lockedBy: null, lockedAt: null, dispatchedAt: null, progress: 0 },
          { where: { id: row.id, status: { [Op.in]: ["queued", "running"] }, updatedAt: row.updatedAt } },
        );
        if (again === 1 && row.status === "running") await kindOf(row)?.requeued(row, "Redis no longer held the job; it was published again");
        lost += again;
        continue;
      }
      const state = await bull.getState();
      if (state === "completed" || state === "failed") await inTurn(`the end of job ${row.id}`, () => settle(row.id, bull));
      else if (state === "active" && row.status === "queued") await inTurn(`the start of job ${row.id}`, () => started(row.id));
      else if ((state === "waiting" || state === "delayed" || state === "prioritized") && row.status === "running")
        await inTurn(`the return of job ${row.id}`, () => givenBack(row.id, "BullMQ gave the job back to its queue"));
      // A cancel request lost on its way to Redis is sent again (setting the key twice is harmless).
      if (row.cancelRequested && !TERMINAL.has(row.status)) await transport.requestCancel(row.id);
    }
    if (lost > 0) await transport.publishPending();
  }

  transport.events.on("active", ({ jobId }) => void inTurn(`the start of job ${jobId}`, () => started(jobId)));
  transport.events.on("progress", ({ jobId, data }) => {
    if (typeof data === "number") progressed(jobId, data).catch((error: unknown) => logger.error({ err: error, jobId }, "recording BullMQ job progress failed"));
  });
  transport.events.on("stalled", ({ jobId }) =>
    void inTurn(`the return of job ${jobId}`, () => givenBack(jobId, "the worker running it stopped answering (its lock expired); BullMQ handed it to another worker")),
  );
  transport.events.on("completed", ({ jobId }) => void inTurn(`the end of job ${jobId}`, () => settle(jobId)));
  transport.events.on("failed", ({ jobId }) => void inTurn(`the end of job ${jobId}`, () => settle(jobId)));

  const publishNow = () => void transport.publishPending().catch((error: unknown) => logger.error({ err: error }, "publishing queued jobs to BullMQ failed"));
  const cancelNow = (jobId: string) => void transport.requestCancel(jobId).catch((error: unknown) => logger.error({ err: error, jobId }, "sending a cancel request to BullMQ failed"));
  jobSignal.on("enqueued", publishNow);
  jobSignal.on("cancel-requested", cancelNow);
  // The first sweep runs in the background: the server starts even while Redis is unreachable.
  void reconcile().catch((error: unknown) => logger.error({ err: error }, "reconciling runs with BullMQ failed"));
  const timer = setInterval(() => void reconcile().catch((error: unknown) => logger.error({ err: error }, "reconciling runs with BullMQ failed")), options.reconcileMs ?? 5_000);
  timer.unref();

  const localWorker =
    options.workers > 0
      ? startRemoteEngineWorker({
          redisUrl: options.redisUrl,
          concurrency: options.workers,
          queueName: transport.queueName,
          name: `api-${process.pid}`,
          ...(options.workerLockMs ? { lockDurationMs: options.workerLockMs, stalledIntervalMs: Math.max(500, options.workerLockMs / 2) } : {}),
        })
      : null;

  return Promise.resolve({
    size: options.workers,
    transport,
    localWorker,
    reconcile: () => reconcile(),
    notify: publishNow,
    async stop() {
      stopping = true;
      clearInterval(timer);
      jobSignal.off("enqueued", publishNow);
      jobSignal.off("cancel-requested", cancelNow);
      await localWorker?.close();
      await chain;
      await transport.close();
    },
  });
}

/** What a finished BullMQ job means for its row: the returned (compressed) result, a confirmed cancel, or the failure's reason. */
function outcomeOf(bull: EngineBullJob, state: "completed" | "failed"): { outcome: EngineOutcome; compressed?: ResultDocument } {
  if (state === "failed") {
    const reason = /stalled more than allowable limit/.test(bull.failedReason ?? "")
      ? "the workers running it stopped answering too many times (BullMQ: job stalled more than allowable limit)"
      : (bull.failedReason ?? "unknown failure");
    const attempts = bull.opts.attempts ?? 1;
    return { outcome: { kind: "failed", message: attempts > 1 ? `${reason} (after ${bull.attemptsMade} of ${attempts} attempts)` : reason } };
  }
  const returned = bull.returnvalue;
  if (returned?.kind === "cancelled") return { outcome: { kind: "cancelled" } };
  if (returned?.kind !== "done") return { outcome: { kind: "failed", message: "the worker returned no result" } };
  try {
    const document = Buffer.from(returned.resultGz, "base64");
    const result = decompressResult(document);
    return {
      outcome: { kind: "done", result, ...(returned.contractWarning ? { contractWarning: returned.contractWarning } : {}) },
      compressed: { document, jsonBytes: returned.jsonBytes },
    };
  } catch (error) {
    return { outcome: { kind: "failed", message: `the worker's result could not be read: ${error instanceof Error ? error.message : String(error)}` } };
  }
}
