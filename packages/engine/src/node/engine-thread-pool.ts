import { availableParallelism } from "node:os";
import { Worker } from "node:worker_threads";
import { RunCancelledError } from "../spec/spec-error.js";
import type { FromWorker, ToWorker } from "./worker-messages.js";

/**
 * The parallel runner's helper threads, kept between runs. Starting a worker thread costs
 * about 0.1 s of CPU (a new JavaScript heap, the engine's modules, the kernels compiled and
 * warmed): measured on W1 at 100,000 members on 2 cores, that was most of what two threads
 * lost against one. A long-lived process (the API server, a queue worker) pays it once; a
 * run takes idle threads and gives them back when it ends. Idle threads are unref'd, so
 * they never keep a process alive.
 */

/** One helper thread: each order gets one reply, in the order the orders went out. */
export class EngineThread {
  private readonly worker: Worker;
  /** Resolves once the thread has loaded the engine (its first message). */
  readonly booted: Promise<void>;
  /** Orders sent and not answered yet, oldest first. */
  private readonly waiting: { answer: (reply: FromWorker) => void; fail: (error: Error) => void }[] = [];
  private dead: Error | null = null;
  private up = false;

  constructor() {
    this.worker = new Worker(workerEntry());
    this.booted = new Promise((resolve, reject) => {
      this.worker.on("message", (reply: FromWorker) => {
        if (reply.kind === "booted") {
          this.up = true;
          resolve();
          return;
        }
        this.waiting.shift()?.answer(reply);
      });
      this.worker.on("exit", (code) => this.die(new Error(`an engine thread exited (code ${code})`)));
      this.worker.on("error", (error: Error) => {
        reject(error);
        this.die(error);
      });
    });
    this.booted.catch(() => {}); // a thread that fails to start fails its first request instead
  }

  private die(error: Error): void {
    this.dead ??= error;
    for (const order of this.waiting.splice(0)) order.fail(error);
  }

  /** Sends one order; resolves with the reply, rejects with the worker's error, a failure or a cancellation. */
  request(order: ToWorker): Promise<FromWorker> {
    if (this.dead) return Promise.reject(this.dead);
    return new Promise((resolve, reject) => {
      this.waiting.push({
        answer: (reply) => {
          if (reply.kind === "failed") reject(Object.assign(new Error(reply.message), { stack: reply.stack }));
          else if (reply.kind === "cancelled") reject(new RunCancelledError());
          else resolve(reply);
        },
        fail: reject,
      });
      this.worker.postMessage(order);
    });
  }

  /** Tells the thread to let go of the run's plan (no reply), so an idle thread holds no run's memory. */
  release(): void {
    if (!this.dead) this.worker.postMessage({ kind: "release" } satisfies ToWorker);
  }

  /** True once the thread has loaded the engine and warmed up (and is not dead). */
  get isBooted(): boolean {
    return this.up && this.dead === null;
  }

  /** True while the thread is alive and has no order outstanding: it may serve another run. */
  get reusable(): boolean {
    return this.dead === null && this.waiting.length === 0;
  }

  hold(): void {
    this.worker.ref();
  }

  park(): void {
    this.worker.unref();
  }

  stop(): void {
    this.dead ??= new Error("engine thread stopped");
    void this.worker.terminate();
  }
}

const idle: EngineThread[] = [];

/** Threads kept idle now, ready for a run. */
export function idleEngineThreads(): number {
  return idle.length;
}

/** Takes `count` threads: idle ones first, then new ones (whose start overlaps the caller's own work). */
export function takeEngineThreads(count: number): EngineThread[] {
  const taken = idle.splice(0, count);
  while (taken.length < count) taken.push(new EngineThread());
  for (const thread of taken) thread.hold();
  return taken;
}

/**
 * Gives threads back after a run. Only threads with no order outstanding are kept (a
 * thread still finishing a pass after a failure elsewhere would answer the next run's first
 * order with this run's reply); the others stop. At most as many as the machine has cores
 * stay idle.
 */
export function returnEngineThreads(threads: EngineThread[]): void {
  const keep = availableParallelism();
  for (const thread of threads) {
    if (thread.reusable && idle.length < keep) {
      thread.park();
      idle.push(thread);
    } else thread.stop();
  }
}

/**
 * Starts the helper threads a run with `threads` computing threads uses (default: one per
 * core), so the first big run does not pay their start. For long-lived processes: call once
 * at start-up. Resolves when they are ready.
 */
export async function startEngineThreads(threads = availableParallelism()): Promise<void> {
  const wanted = threads - idle.length;
  if (wanted <= 0) return;
  const started = Array.from({ length: wanted }, () => new EngineThread());
  await Promise.all(started.map((thread) => thread.booted));
  returnEngineThreads(started);
}

/**
 * The worker script beside this file: compiled JavaScript in dist. Under the test runner
 * (TypeScript sources) a small ES-module bootstrap registers tsx in the worker, then loads
 * the .ts worker (Node 20 does not apply --import loaders given in a worker's execArgv).
 */
function workerEntry(): URL {
  if (!import.meta.url.endsWith(".ts")) return new URL("./ensemble-worker.js", import.meta.url);
  const worker = new URL("./ensemble-worker.ts", import.meta.url).href;
  const tsx = import.meta.resolve("tsx/esm/api");
  const bootstrap = `import { register } from ${JSON.stringify(tsx)}; register(); await import(${JSON.stringify(worker)});`;
  return new URL(`data:text/javascript,${encodeURIComponent(bootstrap)}`);
}
