import { Queue, QueueEvents, type Job } from "bullmq";
import { Redis } from "ioredis";
import { throttledErrorLog } from "../workers/remote-engine-worker.js";
import type { JobModel } from "./job.model.js";
import { BULLMQ_QUEUE_NAME, CANCEL_KEY_TTL_SECONDS, cancelKey, type EngineJobData, type EngineJobReturn } from "./engine-job-protocol.js";

export type EngineBullJob = Job<EngineJobData, EngineJobReturn>;

export interface BullmqTransport {
  readonly queueName: string;
  readonly queue: Queue<EngineJobData, EngineJobReturn>;
  /** Workers' job events (active, progress, completed, failed, stalled) as BullMQ publishes them. */
  readonly events: QueueEvents;
  /**
   * The outbox sweep: publishes every queued job row not yet dispatched, oldest first, and marks
   * it dispatched. Called after a run's transaction commits, on start-up and periodically, so a
   * crash between commit and publish only delays the job. Returns how many rows it published.
   */
  publishPending(): Promise<number>;
  /** Asks whichever worker holds the job to stop (a key in Redis), and takes it out of the wait list if no worker has it yet. */
  requestCancel(jobId: string): Promise<void>;
  getJob(jobId: string): Promise<EngineBullJob | undefined>;
  close(): Promise<void>;
}

export interface BullmqTransportOptions {
  redisUrl: string;
  queueName?: string;
  /** What to publish for a job row: its spec and kind, read from the API's own tables. */
  dataOf(row: JobModel): Promise<EngineJobData>;
  /** A row whose data cannot be built (its run is gone): the caller ends it with this reason. */
  onUnpublishable(row: JobModel, reason: string): Promise<void>;
}

/** BullMQ keeps this many events in its stream; results are fetched from the job itself, not from events. */
const EVENTS_MAX_LEN = 1000;

/**
 * BullMQ over Redis on the API's side: publishes job rows with everything a stateless worker
 * needs (engine-job-protocol.ts), listens to the workers' events, and passes cancellation on.
 * A BullMQ job's id is its row's id, so publishing a row twice (a crash between publishing and
 * marking it) adds nothing: BullMQ ignores a job id it already holds.
 */
export function createBullmqTransport(Job: typeof JobModel, options: BullmqTransportOptions): BullmqTransport {
  const queueName = options.queueName ?? BULLMQ_QUEUE_NAME;
  const connect = () => new Redis(options.redisUrl, { maxRetriesPerRequest: null });
  const queueConnection = connect();
  const eventsConnection = connect();
  const logError = throttledErrorLog("bullmq");
  queueConnection.on("error", logError);
  eventsConnection.on("error", logError);
  const queue = new Queue<EngineJobData, EngineJobReturn>(queueName, { connection: queueConnection, streams: { events: { maxLen: EVENTS_MAX_LEN } } });
  queue.on("error", logError);
  const events = new QueueEvents(queueName, { connection: eventsConnection, autorun: true });
  events.on("error", logError);
  // One sweep at a time per process; sweeps of other API processes may overlap, harmlessly.
  let sweeping: Promise<number> = Promise.resolve(0);

  async function sweep(): Promise<number> {
    let published = 0;
    for (;;) {
      const rows = await Job.findAll({
        where: { status: "queued", dispatchedAt: null },
        order: [["createdAt", "ASC"], ["id", "ASC"]],
        limit: 20,
      });
      if (rows.length === 0) return published;
      for (const row of rows) {
        let data: EngineJobData;
        try {
          data = await options.dataOf(row);
        } catch (error) {
          await options.onUnpublishable(row, error instanceof Error ? error.message : String(error));
          continue;
        }
        await queue.add(row.type, data, {
          jobId: row.id,
          attempts: row.maxAttempts,
          backoff: { type: "exponential", delay: 2000 },
          // Kept until the API has recorded the outcome; the API removes it then.
          removeOnComplete: false,
          removeOnFail: false,
        });
        // Guarded by updatedAt: if the row moved on meanwhile (cancelled), that change decides.
        await Job.update({ dispatchedAt: new Date() }, { where: { id: row.id, status: "queued", dispatchedAt: null, updatedAt: row.updatedAt } });
        published++;
      }
    }
  }

  return {
    queueName,
    queue,
    events,
    publishPending() {
      sweeping = sweeping.catch(() => 0).then(sweep);
      return sweeping;
    },
    async requestCancel(jobId) {
      await queueConnection.set(cancelKey(queueName, jobId), "1", "EX", CANCEL_KEY_TTL_SECONDS);
      const job = await queue.getJob(jobId);
      const state = job ? await job.getState() : "unknown";
      // Not taken by a worker yet: out of the queue. (One that a worker takes meanwhile sees the key and stops at once.)
      if (job && (state === "waiting" || state === "delayed" || state === "prioritized")) await job.remove().catch(() => undefined);
    },
    getJob: (jobId) => queue.getJob(jobId),
    async close() {
      // With Redis unreachable a graceful close would wait for ever: give it a few seconds.
      const graceful = (async () => {
        await sweeping.catch(() => 0);
        await events.close();
        await queue.close();
      })();
      const wait = queueConnection.status === "ready" ? CLOSE_TIMEOUT_MS : 0;
      await Promise.race([graceful.catch(() => undefined), new Promise((resolve) => setTimeout(resolve, wait).unref())]);
      for (const connection of [eventsConnection, queueConnection]) if (connection.status !== "end") connection.disconnect();
    },
  };
}

const CLOSE_TIMEOUT_MS = 5_000;
