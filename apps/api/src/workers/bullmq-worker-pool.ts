import type { JobQueue } from "../queue/job-queue.js";
import { jobSignal } from "../queue/job-signal.js";
import { createBullmqTransport, type BullmqTransport, type DeliveredJob } from "../queue/bullmq-transport.js";
import { EngineThread } from "./engine-thread-client.js";
import { processClaimedRunJob, syncRunsWithRequeuedJobs, type StepOutcome, type WorkerContext } from "./process-run-job.js";
import type { WorkerPool } from "./worker-pool.js";
import { lockedByDeadLocalProcess, processWorkerPrefix, workerIdFor } from "./worker-identity.js";
import { logger } from "../logging/logger.js";

export interface BullmqWorkerPoolOptions {
  /** Engine threads = BullMQ concurrency in this process (config WORKERS). */
  size: number;
  redisUrl: string;
  queueName?: string;
  /** How often the sweep re-queues abandoned jobs and publishes undispatched rows. */
  sweepMs?: number;
  /**
   * A running job whose heartbeat is older than this is taken as abandoned by a dead machine.
   * Heartbeats come with progress writes (every `progressWriteMs` while the engine runs), so
   * this must comfortably exceed the longest quiet stretch: storing a large result.
   */
  staleAfterMs?: number;
  progressWriteMs?: number;
  /** Distinguishes pools in one process (tests simulate two machines); default `<host>:<pid>`. */
  workerPrefix?: string;
}

export interface BullmqWorkerPool extends WorkerPool {
  readonly transport: BullmqTransport;
  /** Per outcome, how many deliveries this pool handled; "skipped" = the row was not queued any more. */
  readonly deliveries: Record<StepOutcome | "skipped", number>;
  /** One sweep now: re-queue abandoned jobs, publish undispatched rows. */
  sweep(): Promise<void>;
}

/**
 * QUEUE=bullmq workers (apps/api/QUEUE.md). On start: re-queue jobs abandoned by dead processes,
 * publish every undispatched row (the outbox), then take BullMQ deliveries — each names a job
 * row, which this pool claims with the table's guarded update before running the engine, so
 * a duplicate delivery (or one for a cancelled job) is skipped. After a run is created in this
 * process the runs service's "enqueued" signal publishes it at once; a periodic sweep covers
 * everything else (rows created by other processes that died before publishing, re-queued jobs).
 */
export async function startBullmqWorkerPool(ctx: WorkerContext, queue: JobQueue, options: BullmqWorkerPoolOptions): Promise<BullmqWorkerPool> {
  const transport = createBullmqTransport(ctx.models.Job, { redisUrl: options.redisUrl, queueName: options.queueName });
  const staleAfterMs = options.staleAfterMs ?? 120_000;
  const prefix = options.workerPrefix ?? processWorkerPrefix();
  const deliveries: BullmqWorkerPool["deliveries"] = { idle: 0, succeeded: 0, failed: 0, cancelled: 0, requeued: 0, skipped: 0 };
  let stopping = false;
  let stopped: Promise<void> | undefined;

  const abandonedFilter = () => ({ heartbeatBefore: new Date(Date.now() - staleAfterMs), lockedByDeadProcess: lockedByDeadLocalProcess });
  const sweep = async () => {
    await syncRunsWithRequeuedJobs(ctx, await queue.requeueAbandoned(abandonedFilter()));
    await transport.publishPending();
  };
  const sweepLogged = () => sweep().catch((error: unknown) => logger.error({ err: error }, "BullMQ sweep failed"));

  // Re-queueing is SQL and finishes before any delivery; publishing waits for Redis, so it
  // does not hold up the server's start when Redis is not reachable yet.
  try {
    await syncRunsWithRequeuedJobs(ctx, await queue.requeueAbandoned(abandonedFilter()));
  } catch (error) {
    await transport.close();
    throw error;
  }
  void transport.publishPending().catch((error: unknown) => logger.error({ err: error }, "publishing queued jobs to BullMQ failed"));

  // One engine thread per slot; BullMQ never runs more than `size` deliveries at once here.
  const slots = Array.from({ length: options.size }, (_, slot) => ({ id: workerIdFor(prefix, slot), thread: null as EngineThread | null, busy: false }));

  async function deliver({ jobId }: DeliveredJob): Promise<void> {
    if (stopping) return giveDeliveryBack(jobId);
    const slot = slots.find((s) => !s.busy);
    if (!slot) return giveDeliveryBack(jobId);
    slot.busy = true;
    try {
      const claimed = await queue.claim(jobId, slot.id);
      if (!claimed) {
        deliveries.skipped++;
        return;
      }
      if (stopping) {
        // Shutdown began between the delivery and the claim: hand the job straight back.
        await queue.release(claimed.id, slot.id, "the server shut down before the run started", { refundAttempt: true });
        return;
      }
      if (!slot.thread?.alive) slot.thread = new EngineThread(slot.id);
      const outcome = await processClaimedRunJob(ctx, queue, claimed, slot.thread, {
        progressWriteMs: options.progressWriteMs,
        isStopping: () => stopping,
      });
      deliveries[outcome]++;
      // Given back (thread crash, shutdown): the row is undispatched again; publish it now.
      if (outcome === "requeued" && !stopping) void transport.publishPending().catch(() => undefined);
    } finally {
      slot.busy = false;
    }
  }

  /** This process will not run the job after all: mark the row undispatched so a sweep publishes it again. */
  async function giveDeliveryBack(jobId: string): Promise<void> {
    await ctx.models.Job.update({ dispatchedAt: null }, { where: { id: jobId, status: "queued" } });
  }

  const publishNow = () => void transport.publishPending().catch((error: unknown) => logger.error({ err: error }, "publishing queued jobs to BullMQ failed"));
  jobSignal.on("enqueued", publishNow);
  const timer = setInterval(() => void sweepLogged(), options.sweepMs ?? 10_000);
  timer.unref();
  transport.consume(options.size, deliver);

  return {
    size: options.size,
    transport,
    deliveries,
    sweep,
    notify: publishNow,
    stop() {
      stopped ??= stopOnce();
      return stopped;
    },
  };

  async function stopOnce(): Promise<void> {
    stopping = true;
    clearInterval(timer);
    jobSignal.off("enqueued", publishNow);
    // Ending the threads makes deliveries in progress give their jobs back (attempt refunded),
    // so closing the BullMQ worker, which waits for them, does not wait for whole runs.
    await Promise.all(slots.map((s) => s.thread?.terminate() ?? Promise.resolve()));
    await transport.close();
    // Jobs given back during shutdown are published by the next sweep of any process.
  }
}
