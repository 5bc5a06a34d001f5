/**
 * Entry of an engine worker thread. It runs one ensemble at a time, synchronously, off the
 * server's event loop. Progress goes back by message (throttled here); cancellation comes in
 * through shared memory, because a thread busy in a synchronous loop never reads its messages.
 */
import { parentPort } from "node:worker_threads";
import { runEnsemble } from "@plumeline/engine";
import type { RunResult } from "@plumeline/contracts";
import type { FromEngineThread, ToEngineThread } from "./engine-thread-protocol.js";

const PROGRESS_EVERY_MS = 200;

if (!parentPort) throw new Error("engine-thread.ts must run as a worker thread");
const port = parentPort;
const post = (message: FromEngineThread) => port.postMessage(message);

/** The engine may report progress as a fraction or as { done, total }; both become 0–1. */
function fractionOf(progress: unknown): number | null {
  if (typeof progress === "number") return progress;
  if (progress && typeof progress === "object") {
    const p = progress as { fraction?: number; done?: number; total?: number };
    if (typeof p.fraction === "number") return p.fraction;
    if (typeof p.done === "number" && typeof p.total === "number" && p.total > 0) return p.done / p.total;
  }
  return null;
}

port.on("message", (message: ToEngineThread) => {
  if (message.type !== "run") return;
  const cancel = new Int32Array(message.cancelFlag);
  const cancelled = () => Atomics.load(cancel, 0) === 1;
  let lastPost = 0;
  try {
    const result = runEnsemble(message.spec, {
      onProgress: (progress: unknown) => {
        const fraction = fractionOf(progress);
        const now = Date.now();
        if (fraction === null || now - lastPost < PROGRESS_EVERY_MS) return;
        lastPost = now;
        post({ type: "progress", fraction: Math.min(1, Math.max(0, fraction)) });
      },
      // The engine asks between simulated years and stops when told to.
      shouldCancel: cancelled,
    });
    // The engine's own RunResult type is the contract's shape; the worker re-checks it on arrival.
    post(cancelled() ? { type: "cancelled" } : { type: "done", result: result as unknown as RunResult });
  } catch (error) {
    if (cancelled()) post({ type: "cancelled" });
    else post({ type: "failed", message: error instanceof Error ? error.message : String(error) });
  }
});
