/**
 * Entry of an engine worker thread: runs one ensemble at a time off the server's event loop.
 * It calls the engine's parallel runner, which samples here and spreads members over its own
 * helper threads (all cores for large ensembles, one thread for small ones; results are
 * bit-identical either way), so one big run is as fast as the engine CLI. Progress goes back
 * by message (throttled); cancellation comes in through shared memory and is handed to the
 * engine as an AbortSignal, which it checks between simulated years.
 */
import { parentPort } from "node:worker_threads";
import { runResultSchema } from "@plumeline/contracts";
import { runEnsembleParallel, startEngineThreads } from "@plumeline/engine/node";
import type { FromEngineThread, ToEngineThread } from "./engine-thread-protocol.js";

const PROGRESS_EVERY_MS = 200;
const CANCEL_POLL_MS = 50;

if (!parentPort) throw new Error("engine-thread.ts must run as a worker thread");

const port = parentPort;
const post = (message: FromEngineThread) => port.postMessage(message);

// The engine's helper threads start now, not inside the first big run (they are kept between
// runs). A thread that cannot start shows its error in the first run that needs it.
startEngineThreads().catch(() => {});

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
