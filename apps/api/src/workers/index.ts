import type { AppContext } from "../context.js";
import { createSqlJobQueue } from "../queue/sql-job-queue.js";
import { startWorkerPool, type WorkerPool } from "./worker-pool.js";

/**
 * Starts the run workers for this server (called once by server.ts after migrating) and
 * registers their shutdown with the context. QUEUE=bullmq is accepted by config for a
 * multi-machine set-up but has no implementation yet, so it fails fast here.
 */
export async function startWorkers(ctx: AppContext): Promise<WorkerPool> {
  if (ctx.config.queue !== "sqlite")
    throw new Error(`QUEUE=${ctx.config.queue} is not implemented yet; use QUEUE=sqlite (the default)`);
  const pool = await startWorkerPool(ctx, createSqlJobQueue(ctx.models.Job), { size: ctx.config.workers });
  ctx.onClose(() => pool.stop());
  return pool;
}
