import { createRequire } from "node:module";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { Worker } from "node:worker_threads";
import type { RunResult, RunSpec } from "@plumeline/contracts";
import type { FromEngineThread } from "./engine-thread-protocol.js";

export type EngineOutcome = { kind: "done"; result: RunResult; contractWarning?: string } | { kind: "cancelled" } | { kind: "failed"; message: string };

/** Thrown when the thread itself dies (crash, out of memory, terminated): the job may be retried. */
export class EngineThreadCrashed extends Error {
  override name = "EngineThreadCrashed";
}

/**
 * How to start the thread's code. From a compiled build (.js next to this file) it is a plain
 * worker file. From TypeScript sources (`node --import tsx`, vitest) Node 20 does not pass
 * module loaders on to worker threads, so a two-line bootstrap registers tsx's ESM hooks
 * inside the thread (tsx's public `tsx/esm/api`) and then imports engine-thread.ts.
 */
function threadEntry(): { entry: URL | string; eval: boolean } {
  if (!import.meta.url.endsWith(".ts")) return { entry: new URL("./engine-thread.js", import.meta.url), eval: false };
  const require = createRequire(import.meta.url);
  const tsxPackage = require.resolve("tsx/package.json");
  const exportsMap = (require("tsx/package.json") as { exports: Record<string, { import?: { default?: string } }> }).exports;
  const esmApi = pathToFileURL(path.join(path.dirname(tsxPackage), exportsMap["./esm/api"]?.import?.default ?? "dist/esm/api/index.mjs")).href;
  const target = new URL("./engine-thread.ts", import.meta.url).href;
  // A bootstrap that fails has no logger yet (it could not load one); its stderr reaches the parent.
  const code =
    `import(${JSON.stringify(esmApi)}).then((tsx) => { tsx.register(); return import(${JSON.stringify(target)}); })` +
    `.catch((error) => { console.error("[engine-thread] could not start:", error); process.exit(1); });`;
  return { entry: code, eval: true };
}

/** One long-lived engine thread; `run` sends it one ensemble at a time. */
export class EngineThread {
  private worker: Worker;
  private busy: { settle: (outcome: EngineOutcome) => void; fail: (error: Error) => void; onProgress: (f: number) => void } | null = null;
  private cancelFlag = new Int32Array(new SharedArrayBuffer(4));
  private exited = false;

  constructor(readonly name: string) {
    const { entry, eval: isCode } = threadEntry();
    this.worker = new Worker(entry, { eval: isCode, name });
    this.worker.on("message", (message: FromEngineThread) => this.onMessage(message));
    this.worker.on("error", (error) => this.crash(`engine thread ${name} crashed: ${error.message}`));
    this.worker.on("exit", (code) => {
      this.exited = true;
      this.crash(`engine thread ${name} exited with code ${code}`);
    });
  }

  get alive(): boolean {
    return !this.exited;
  }

  run(spec: RunSpec, onProgress: (fraction: number) => void = () => {}): Promise<EngineOutcome> {
    if (this.busy) return Promise.reject(new Error(`engine thread ${this.name} is busy`));
    if (this.exited) return Promise.reject(new EngineThreadCrashed(`engine thread ${this.name} has exited`));
    Atomics.store(this.cancelFlag, 0, 0);
    return new Promise<EngineOutcome>((resolve, reject) => {
      this.busy = { settle: resolve, fail: reject, onProgress };
      this.worker.postMessage({ type: "run", spec, cancelFlag: this.cancelFlag.buffer });
    });
  }

  /** Asks the running ensemble to stop at the next year boundary. */
  cancel(): void {
    Atomics.store(this.cancelFlag, 0, 1);
  }

  async terminate(): Promise<void> {
    if (!this.exited) await this.worker.terminate();
  }

  private onMessage(message: FromEngineThread): void {
    const busy = this.busy;
    if (!busy) return;
    if (message.type === "progress") { busy.onProgress(message.fraction); return; }
    this.busy = null;
    if (message.type === "done")
      busy.settle({ kind: "done", result: message.result, ...(message.contractWarning ? { contractWarning: message.contractWarning } : {}) });
    else if (message.type === "cancelled") busy.settle({ kind: "cancelled" });
    else busy.settle({ kind: "failed", message: message.message });
  }

  private crash(reason: string): void {
    const busy = this.busy;
    this.busy = null;
    busy?.fail(new EngineThreadCrashed(reason));
  }
}
