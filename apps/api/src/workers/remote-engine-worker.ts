import { UnrecoverableError, Worker, type Job } from "bullmq";
import { Redis } from "ioredis";
import { compressResult } from "../modules/results/result-document.js";
import { BULLMQ_QUEUE_NAME, cancelKey, decodeSpec, type EngineJobData, type EngineJobReturn } from "../queue/engine-job-protocol.js";
import { EngineThread, EngineThreadCrashed } from "./engine-thread-client.js";
import { logger } from "../logging/logger.js";

export interface RemoteEngineWorkerOptions {
  redisUrl: string;
  /** Engine threads = jobs at once in this process (setting WORKERS). */
  concurrency: number;
  queueName?: string;
  /** Names this process in logs; default `<host>:<pid>`. */
  name?: string;
  /**
   * BullMQ's lock on a job: renewed every half of it while the job runs. A worker that dies
   * stops renewing; after this long BullMQ's stalled-job check hands the job to another worker.
   */
  lockDurationMs?: number;
  /** How often this worker runs BullMQ's stalled-job check. */
  stalledIntervalMs?: number;
  /** Least time between two progress reports of one job (each is a Redis write and an event). */
  progressEveryMs?: number;
}

export interface RemoteEngineWorker {
  readonly worker: Worker<EngineJobData, EngineJobReturn>;
  /** Stops taking jobs; jobs in progress are ended and go back to BullMQ for another worker. */
  close(): Promise<void>;
}

const CANCEL_POLL_MS = 250;

/**
 * A stateless engine worker (`pnpm worker`, or inside the API when QUEUE=bullmq and WORKERS > 0):
 * takes jobs from BullMQ, runs each in one of its engine threads, reports progress with
 * BullMQ's job progress, stops when the API sets the job's cancel key in Redis, and returns
 * the result gzip-compressed as the job's return value. It opens no database and reads no
 * file of the data folder: everything it needs comes with the job.
 *
 * Failures: the engine refusing the spec is deterministic, so the job fails at once
 * (UnrecoverableError, no retry); a crashed engine thread fails the attempt and BullMQ retries
 * it (the job's `attempts`). A killed worker stops renewing its lock and BullMQ's stalled-job
 * check gives the job to another worker.
 */
export function startRemoteEngineWorker(options: RemoteEngineWorkerOptions): RemoteEngineWorker {
  const queueName = options.queueName ?? BULLMQ_QUEUE_NAME;
  const progressEveryMs = options.progressEveryMs ?? 250;
  // BullMQ's blocking commands need maxRetriesPerRequest: null (its documented requirement);
  // cancel checks use a connection of their own so they never wait behind a blocking read.
  const connection = new Redis(options.redisUrl, { maxRetriesPerRequest: null });
  const control = new Redis(options.redisUrl, { maxRetriesPerRequest: null });
  const threads: EngineThread[] = [];
  const idle: EngineThread[] = [];
  let closing = false;
  const logError = throttledErrorLog(options.name ?? "worker");
  connection.on("error", logError);
  control.on("error", logError);

  const takeThread = (): EngineThread => {
    for (;;) {
      const thread = idle.pop();
      if (!thread) break;
      if (thread.alive) return thread;
    }
    const thread = new EngineThread(`${options.name ?? "worker"}-engine-${threads.length}`);
    threads.push(thread);
    return thread;
  };

  async function runJob(job: Job<EngineJobData, EngineJobReturn>): Promise<EngineJobReturn> {
    const key = cancelKey(queueName, job.data.jobId);
    if ((await control.exists(key)) === 1) return { kind: "cancelled" };
    let spec;
    try {
      spec = decodeSpec(job.data);
    } catch (error) {
      throw new UnrecoverableError(error instanceof Error ? error.message : String(error));
    }
    const thread = takeThread();
    let lastReport = 0;
    const report = (fraction: number) => {
      const now = Date.now();
      if (now - lastReport < progressEveryMs) return;
      lastReport = now;
      job.updateProgress(fraction).catch(logError);
    };
    const watch = setInterval(() => {
      control.exists(key).then((n) => n === 1 && thread.cancel(), logError);
    }, CANCEL_POLL_MS);
    try {
      // Reported at once, so the run leaves 0 % within a moment of being picked up.
      report(0);
      const outcome = await thread.run(spec, report);
      if (outcome.kind === "cancelled") return { kind: "cancelled" };
      if (outcome.kind === "failed") throw new UnrecoverableError(outcome.message);
      const { document, jsonBytes } = compressResult(outcome.result);
      return {
        kind: "done",
        resultGz: document.toString("base64"),
        jsonBytes,
        resultHash: outcome.result.resultHash,
        ...(outcome.contractWarning ? { contractWarning: outcome.contractWarning } : {}),
      };
    } catch (error) {
      if (error instanceof EngineThreadCrashed && closing) throw new Error(`the worker ${options.name ?? ""} shut down while the job ran`, { cause: error });
      throw error;
    } finally {
      clearInterval(watch);
      if (thread.alive) idle.push(thread);
    }
  }

  const worker = new Worker<EngineJobData, EngineJobReturn>(queueName, runJob, {
    connection,
    concurrency: options.concurrency,
    name: options.name,
    ...(options.lockDurationMs ? { lockDuration: options.lockDurationMs } : {}),
    ...(options.stalledIntervalMs ? { stalledInterval: options.stalledIntervalMs } : {}),
  });
  worker.on("error", logError);

  return {
    worker,
    async close() {
      closing = true;
      // Ending the threads ends the jobs in progress (each fails its attempt and BullMQ retries
      // it elsewhere), so closing the BullMQ worker does not wait for whole runs.
      await Promise.all(threads.map((t) => t.terminate()));
      await worker.close().catch(logError);
      connection.disconnect();
      control.disconnect();
    },
  };
}

/** Redis errors repeat on every reconnect attempt: log the first and then one a minute at most. */
export function throttledErrorLog(label: string): (error: unknown) => void {
  let last = 0;
  return (error) => {
    const now = Date.now();
    if (now - last < 60_000) return;
    last = now;
    logger.error({ err: error, source: label }, "connection error (logged at most once a minute)");
  };
}
