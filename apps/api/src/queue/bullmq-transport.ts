import { Queue, Worker } from "bullmq";
import { Redis } from "ioredis";
import type { JobModel } from "./job.model.js";
import { logger } from "../logging/logger.js";

/** One BullMQ queue carries every job type; the job row says what the job is. */
export const BULLMQ_QUEUE_NAME = "plumeline-jobs";

/** What a BullMQ job carries: only the id of the job row, which stays the source of truth. */
export interface DeliveredJob {
  jobId: string;
}

export interface BullmqTransport {
  /**
   * The outbox sweep: publishes every queued job row not yet dispatched, oldest first, and marks
   * it dispatched. Called after a run's transaction commits, on start-up and periodically, so a
   * crash between commit and publish only delays the job. Returns how many rows it published.
   */
  publishPending(): Promise<number>;
  /** Starts receiving deliveries, at most `concurrency` at a time in this process. */
  consume(concurrency: number, deliver: (delivered: DeliveredJob) => Promise<void>): void;
  /** Stops receiving (waits for deliveries in progress), then closes the Redis connections. */
  close(): Promise<void>;
  /** The BullMQ queue, for tests and diagnostics (job counts). */
  readonly queue: Queue<DeliveredJob>;
}

/**
 * BullMQ over Redis as a transport only. Delivery is at least once: a crash after publishing
 * but before marking the row publishes it again, and a worker that died mid-job has its BullMQ
 * job redelivered by BullMQ's stalled-job check. That is safe because the receiver takes the
 * row with the table's guarded claim (queued -> running only if still queued): a second
 * delivery of a job that is running, finished or cancelled changes nothing.
 */
export function createBullmqTransport(Job: typeof JobModel, options: { redisUrl: string; queueName?: string }): BullmqTransport {
  const name = options.queueName ?? BULLMQ_QUEUE_NAME;
  // BullMQ's blocking worker commands need maxRetriesPerRequest: null (its documented requirement).
  const connect = () => new Redis(options.redisUrl, { maxRetriesPerRequest: null });
  const queueConnection = connect();
  const queue = new Queue<DeliveredJob>(name, { connection: queueConnection });
  const logError = throttledErrorLog();
  queue.on("error", logError);
  let worker: Worker<DeliveredJob> | null = null;
  let workerConnection: Redis | null = null;
  // Publishing runs one sweep at a time per process; sweeps in other processes may overlap,
  // which at worst publishes a row twice (see the class comment).
  let sweeping: Promise<number> = Promise.resolve(0);

  async function sweep(): Promise<number> {
    let published = 0;
    for (;;) {
      const rows = await Job.findAll({
        where: { status: "queued", dispatchedAt: null },
        order: [["createdAt", "ASC"], ["id", "ASC"]],
        limit: 50,
        attributes: ["id", "type", "updatedAt"],
      });
      if (rows.length === 0) return published;
      for (const row of rows) {
        await queue.add(row.type, { jobId: row.id }, { removeOnComplete: true, removeOnFail: true, attempts: 1 });
        // Guarded by updatedAt: if the row moved on meanwhile (claimed, re-queued), that change
        // decides whether it needs publishing again, not this stale read.
        await Job.update({ dispatchedAt: new Date() }, { where: { id: row.id, status: "queued", dispatchedAt: null, updatedAt: row.updatedAt } });
        published++;
      }
    }
  }

  return {
    queue,
    publishPending() {
      sweeping = sweeping.catch(() => 0).then(sweep);
      return sweeping;
    },
    consume(concurrency, deliver) {
      if (worker) throw new Error("this transport is already consuming");
      workerConnection = connect();
      worker = new Worker<DeliveredJob>(name, async (job) => deliver(job.data), { connection: workerConnection, concurrency });
      worker.on("error", logError);
    },
    async close() {
      // With Redis unreachable a graceful close would wait for ever: give it a few seconds.
      const graceful = (async () => {
        await worker?.close();
        await sweeping.catch(() => 0);
        await queue.close();
      })();
      const wait = queueConnection.status === "ready" ? CLOSE_TIMEOUT_MS : 0;
      await Promise.race([graceful.catch(() => undefined), new Promise((resolve) => setTimeout(resolve, wait).unref())]);
      for (const connection of [workerConnection, queueConnection]) {
        if (connection && connection.status !== "end") connection.disconnect();
      }
    },
  };
}

const CLOSE_TIMEOUT_MS = 5_000;

/** Redis errors repeat on every reconnect attempt: log the first and then one a minute at most. */
function throttledErrorLog(): (error: Error) => void {
  let last = 0;
  return (error) => {
    const now = Date.now();
    if (now - last < 60_000) return;
    last = now;
    logger.error({ err: error }, "Redis connection error (logged at most once a minute; ioredis keeps reconnecting)");
  };
}
