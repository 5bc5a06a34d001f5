import { loadWorkerConfig } from "./worker-config.js";
import { startRemoteEngineWorker } from "./workers/remote-engine-worker.js";

/**
 * `pnpm worker`: a stateless engine worker for QUEUE=bullmq. Needs REDIS_URL (the Redis the
 * API uses) and optionally WORKERS (engine threads); no database, no data folder.
 */
function main(): void {
  const config = loadWorkerConfig();
  const worker = startRemoteEngineWorker({
    redisUrl: config.redisUrl,
    concurrency: config.workers,
    name: config.name,
    lockDurationMs: config.lockDurationMs,
    stalledIntervalMs: Math.max(1000, Math.floor(config.lockDurationMs / 2)),
  });
  worker.worker.on("ready", () => console.log(`[worker ${config.name}] ready: ${config.workers} engine thread(s), Redis ${redactedUrl(config.redisUrl)}`));
  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    console.log(`[worker ${config.name}] ${signal}: shutting down`);
    const forced = setTimeout(() => process.exit(1), 10_000);
    forced.unref();
    await worker.close();
    process.exit(0);
  };
  process.on("SIGINT", () => void stop("SIGINT"));
  process.on("SIGTERM", () => void stop("SIGTERM"));
}

/** The Redis URL without its password, for the log. */
function redactedUrl(url: string): string {
  const parsed = new URL(url);
  if (parsed.password) parsed.password = "***";
  return parsed.toString();
}

try {
  main();
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
}
