import os from "node:os";
import { issueDetails } from "@plumeline/contracts";
import { z } from "zod";

/**
 * Settings of a stateless engine worker (`pnpm worker`). Deliberately separate from the API's
 * config: a worker reads no data folder, database file or secret, so it never creates one.
 */
const workerEnvSchema = z.object({
  REDIS_URL: z.url({ error: "must be a redis:// URL, e.g. redis://10.0.0.5:6379" }),
  WORKERS: z.coerce.number().int().min(1).max(64).optional(),
  /** BullMQ's job lock; a killed worker's job moves to another worker this long after it stopped renewing. */
  WORKER_LOCK_MS: z.coerce.number().int().min(1000).max(600_000).default(30_000),
  WORKER_NAME: z.string().min(1).max(100).optional(),
});

export interface WorkerConfig {
  redisUrl: string;
  /** Engine threads, one job each; default one per core. */
  workers: number;
  lockDurationMs: number;
  name: string;
}

export function loadWorkerConfig(env: NodeJS.ProcessEnv = process.env): WorkerConfig {
  const parsed = workerEnvSchema.safeParse(env);
  if (!parsed.success) {
    const lines = issueDetails(parsed.error).map((detail) => `${detail.path}: ${detail.message}`);
    throw new Error(`Invalid worker configuration:\n  ${lines.join("\n  ")}`);
  }
  const e = parsed.data;
  return {
    redisUrl: e.REDIS_URL,
    workers: e.WORKERS ?? os.availableParallelism(),
    lockDurationMs: e.WORKER_LOCK_MS,
    name: e.WORKER_NAME ?? `${os.hostname()}:${process.pid}`,
  };
}
