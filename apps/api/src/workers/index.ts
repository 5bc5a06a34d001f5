import type { AppContext } from "../context.js";
import { createSqlJobQueue } from "../queue/sql-job-queue.js";
import { startBullmqCoordinator } from "./bullmq-coordinator.js";
import { REPLAY_JOB_TYPE, RUN_JOB_TYPE } from "../queue/job-types.js";
import { replayJobKind } from "./process-replay-job.js";
import { runJobKind } from "./run-job-kind.js";
import { startWorkerPool, type WorkerPool } from "./worker-pool.js";

/**
 * Starts the run workers for this server (called once by server.ts after migrating) and
 * registers their shutdown with the context. QUEUE=sqlite: engine threads in this process poll
 * the jobs table. QUEUE=bullmq: jobs and their specs travel over Redis to stateless workers
 * (`pnpm worker`, and WORKERS threads in this process unless WORKERS=0); this process records
 * what they report (apps/api/QUEUE.md).
 */
export async function startWorkers(ctx: AppContext): Promise<WorkerPool> {
  const queue = createSqlJobQueue(ctx.models.Job);
  const pool =
    ctx.config.queue === "bullmq"
      ? await startBullmqCoordinator(ctx, queue, {
          redisUrl: requireRedisUrl(ctx.config.redisUrl),
          workers: ctx.config.workers,
          kinds: { [RUN_JOB_TYPE]: runJobKind(ctx, queue), [REPLAY_JOB_TYPE]: replayJobKind(ctx, queue) },
        })
      : await startWorkerPool(ctx, queue, { size: ctx.config.workers });
  ctx.onClose(() => pool.stop());
  return pool;
}

/** Config already refuses QUEUE=bullmq without REDIS_URL; this keeps the type honest. */
function requireRedisUrl(url: string | undefined): string {
  if (!url) throw new Error("REDIS_URL: required when QUEUE=bullmq");
  return url;
}
