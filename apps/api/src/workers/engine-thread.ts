/**
 * Entry of an engine worker thread: runs one ensemble at a time off the server's event loop.
 * It calls the engine's parallel runner, which for large ensembles shares the work out to its
 * own helper threads (one per core; started by the first large run and kept for the next ones)
 * and runs small ones here; results are bit-identical either way, so one big run is as fast
 * as the engine CLI. Helpers are not started ahead: each costs ~20 MB while idle, and an
 * engine thread that only ever runs small ensembles (impact previews) never needs them. Progress goes back
 * by message (throttled); cancellation comes in through shared memory and is handed to the
 * engine as an AbortSignal, which it checks between simulated years.
 */
import { parentPort } from "node:worker_threads";
import { runResultSchema } from "@plumeline/contracts";
import { runEnsembleParallel } from "@plumeline/engine/node";
import type { FromEngineThread, ToEngineThread } from "./engine-thread-protocol.js";

const PROGRESS_EVERY_MS = 200;
const CANCEL_POLL_MS = 50;

if (!parentPort) throw new Error("engine-thread.ts must run as a worker thread");

const port = parentPort;
const post = (message: FromEngineThread) => port.postMessage(message);

port.on("message", (message: ToEngineThread) => {
  if (message.type !== "run") return;
  void run(message);
});

async function run(message: ToEngineThread): Promise<void> {
  const cancel = new Int32Array(message.cancelFlag);
  const cancelled = () => Atomics.load(cancel, 0) === 1;
  const controller = new AbortController();
  const watch = setInterval(() => {
    if (cancelled()) controller.abort();
  }, CANCEL_POLL_MS);
  let lastPost = 0;
  try {
    const result = await runEnsembleParallel(message.spec, {
      signal: controller.signal,
      onProgress: (fraction) => {
        const now = Date.now();
        if (now - lastPost < PROGRESS_EVERY_MS) return;
        lastPost = now;
        post({ type: "progress", fraction: Math.min(1, Math.max(0, fraction)) });
      },
    });
    if (cancelled()) { post({ type: "cancelled" }); return; }
    // Checked against the contracts schema here, so a large result never stalls the server thread.
    const checked = runResultSchema.safeParse(result);
    const issue = checked.success ? null : checked.error.issues[0];
    post({
      type: "done",
      result: result,
      ...(issue ? { contractWarning: `${issue.path.join(".")}: ${issue.message}` } : {}),
    });
  } catch (error) {
    if (cancelled()) post({ type: "cancelled" });
    else post({ type: "failed", message: error instanceof Error ? error.message : String(error) });
  } finally {
    clearInterval(watch);
  }
}
