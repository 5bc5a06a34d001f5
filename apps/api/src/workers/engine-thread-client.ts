import { Worker } from "node:worker_threads";
import type { RunResult, RunSpec } from "@plumeline/contracts";
import type { FromEngineThread } from "./engine-thread-protocol.js";
import { threadEntry } from "./thread-entry.js";

export type EngineOutcome = { kind: "done"; result: RunResult; contractWarning?: string } | { kind: "cancelled" } | { kind: "failed"; message: string };

/** Thrown when the thread itself dies (crash, out of memory, terminated): the job may be retried. */
export class EngineThreadCrashed extends Error {
  override name = "EngineThreadCrashed";
}

/** What a job step needs of an engine thread: run one ensemble, or ask the running one to stop. */
export interface EngineRunner {
  run(spec: RunSpec, onProgress?: (fraction: number) => void): Promise<EngineOutcome>;
  cancel(): void;
}

/** One long-lived engine thread; `run` sends it one ensemble at a time. */
export class EngineThread implements EngineRunner {
  private worker: Worker;
  private busy: { settle: (outcome: EngineOutcome) => void; fail: (error: Error) => void; onProgress: (f: number) => void } | null = null;
  private cancelFlag = new Int32Array(new SharedArrayBuffer(4));
  private exited = false;

  constructor(readonly name: string) {
    const { entry, eval: isCode } = threadEntry(import.meta.url, "engine-thread");
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
