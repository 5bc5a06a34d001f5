import os from "node:os";
import type { JobQueue } from "../queue/job-queue.js";
import { jobSignal } from "../queue/job-signal.js";
import { EngineThreadSupply } from "./engine-thread-supply.js";
import { processNextRunJob, syncRunsWithRequeuedJobs } from "./process-run-job.js";
import type { WorkerContext } from "./worker-step.js";
import { logger } from "../logging/logger.js";

export interface WorkerPoolOptions {
  /** Jobs run at once, each in an engine thread of its own (config WORKERS; default one per core). */
  size: number;
  /** How often an idle worker looks for queued jobs it was not told about (other processes). */
  pollMs?: number;
  progressWriteMs?: number;
}

export interface WorkerPool {
  readonly size: number;
  /** Wakes idle workers now (a job was just queued). */
  notify(): void;
  /** Stops taking jobs, ends the threads, gives interrupted jobs back to the queue. */
  stop(): Promise<void>;
}

/**
 * Starts `size` workers. First, jobs left "running" by a process that died are re-queued
 * (or failed, out of attempts); then each worker loops: claim, run in an engine thread,
 * write the outcome. The engine threads come from one supply (engine-thread-supply.ts): one
 * is kept ready, more start only while more jobs run at once, and a thread that died or ran
 * a large ensemble is replaced.
 */
export async function startWorkerPool(ctx: WorkerContext, queue: JobQueue, options: WorkerPoolOptions): Promise<WorkerPool> {
  const requeued = await queue.requeueAbandoned();
  await syncRunsWithRequeuedJobs(ctx, requeued);

  const pollMs = options.pollMs ?? 1000;
  let stopping = false;
  const wakers = new Set<() => void>();
  const notify = () => {
    for (const wake of [...wakers]) wake();
  };
  jobSignal.on("enqueued", notify);
  const host = `${os.hostname()}:${process.pid}`;
  const supply = new EngineThreadSupply(`${host}:engine`);
  if (options.size > 0) supply.prestart();

  const sleep = () =>
    new Promise<void>((resolve) => {
      const done = () => {
        clearTimeout(timer);
        wakers.delete(done);
        resolve();
      };
      const timer = setTimeout(done, pollMs);
      wakers.add(done);
    });

  async function loop(slot: number): Promise<void> {
    const workerId = `${host}:worker-${slot}`;
    const thread = supply.runner();
    while (!stopping) {
      try {
        const outcome = await processNextRunJob(ctx, queue, workerId, thread, {
          progressWriteMs: options.progressWriteMs,
          isStopping: () => stopping,
        });
        if (outcome === "idle" && !stopping) await sleep();
      } catch (error) {
        logger.error({ err: error, workerId }, "run worker step failed");
        if (!stopping) await sleep();
      }
    }
  }

  const loops = Array.from({ length: options.size }, (_, slot) => loop(slot));
  return {
    size: options.size,
    notify,
    async stop() {
      stopping = true;
      jobSignal.off("enqueued", notify);
      notify();
      await supply.stop();
      await Promise.allSettled(loops);
    },
  };
}
