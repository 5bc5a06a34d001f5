import type { AppContext } from "../context.js";
import { createSqlJobQueue } from "../queue/sql-job-queue.js";
import { startBullmqWorkerPool } from "./bullmq-worker-pool.js";
import { startWorkerPool, type WorkerPool } from "./worker-pool.js";

/**
 * Starts the run workers for this server (called once by server.ts after migrating) and
 * registers their shutdown with the context. QUEUE=sqlite: workers poll the jobs table.
 * QUEUE=bullmq: jobs travel over Redis to whichever process takes them; the jobs table is
 * still the record every worker claims from (apps/api/QUEUE.md).
 */
export async function startWorkers(ctx: AppContext): Promise<WorkerPool> {
  const queue = createSqlJobQueue(ctx.models.Job);
  const pool =
    ctx.config.queue === "bullmq"
      ? await startBullmqWorkerPool(ctx, queue, { size: ctx.config.workers, redisUrl: requireRedisUrl(ctx.config.redisUrl) })
      : await startWorkerPool(ctx, queue, { size: ctx.config.workers });
  ctx.onClose(() => pool.stop());
  return pool;
}

/** Config already refuses QUEUE=bullmq without REDIS_URL; this keeps the type honest. */
function requireRedisUrl(url: string | undefined): string {
  if (!url) throw new Error("REDIS_URL: required when QUEUE=bullmq");
  return url;
}
