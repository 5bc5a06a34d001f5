import { availableParallelism } from "node:os";
import { Worker } from "node:worker_threads";
import type { EnsemblePlan } from "../ensemble/ensemble-plan.js";
import { impliedTcr } from "../ensemble/implied-tcr.js";
import { firstPassYears, horizonsByYear } from "../ensemble/pathway-passes.js";
import { preparePlan } from "../ensemble/prepare-plan.js";
import { setupProgress, simulationProgress } from "../ensemble/progress-share.js";
import { runPipeline } from "../ensemble/run-pipeline.js";
import { WARM_MEMBERS } from "../ensemble/warm-kernels.js";
import { runEnsemble, type RunOptions, type StageTimes } from "../ensemble/run-ensemble.js";
import { RunCancelledError } from "../spec/spec-error.js";
import type { RunResult, RunSpec, RunSpecInput } from "../spec/types.js";
import { PassParticipant, type PassPause, type ReportOrder } from "./pass-participant.js";
import { CANCEL_FLAG, createPipelineControl, resetPipelineControl, type PipelineControl } from "./pipeline-control.js";
import type { FromWorker, ToWorker } from "./worker-messages.js";

/** Below this many members one thread is faster than starting workers. */
export const PARALLEL_MIN_MEMBERS = 20_000;

export interface ParallelRunOptions {
  /**
   * Computing threads, this one included (threads − 1 workers are started); default: the
   * machine's available cores when members ≥ 20,000, else 1.
   */
  threads?: number;
  onProgress?: (fraction: number) => void;
  signal?: AbortSignal;
  /** If given, filled with seconds per stage (parallel stages: thread-seconds / threads). */
  stageTimes?: StageTimes;
  /** As RunOptions.summaries: per-year forcing and imbalance series on (default) or off. */
  summaries?: RunOptions["summaries"];
  /** As RunOptions.onPathwayMembers: each pathway's members' horizon warming and weights. */
  onPathwayMembers?: RunOptions["onPathwayMembers"];
}

/**
 * runEnsemble spread over threads: sampling happens once on this thread (one seeded stream
 * per input, as in runEnsemble) into the plan's shared kernel memory; then this thread and
 * threads − 1 workers claim member blocks and years to summarise from shared counters
 * (pass-participant.ts), so a thread the machine slows down takes less of the work. This
 * thread takes its share in slices of a few milliseconds and lets its event loop run in
 * between (progress, abort, and a server's other work keep going). Results are
 * bit-identical to runEnsemble for any thread count. Rejects with SpecError for a bad spec
 * and with RunCancelledError when the signal aborts.
 *
 * Why this thread computes too (measured, W1 at 100,000 members on 2 cores): starting and
 * warming a worker costs ~0.1 s of CPU, which on two cores is taken from the sampling
 * that everything waits for; with one worker fewer that stage went from ~0.18 to ~0.14 s.
 */
export async function runEnsembleParallel(input: RunSpecInput | RunSpec, options: ParallelRunOptions = {}): Promise<RunResult> {
  const threads = Math.max(
    1,
    Math.floor(options.threads ?? (input.members >= PARALLEL_MIN_MEMBERS ? availableParallelism() : 1)),
  );
  if (threads === 1 || input.members < 2 * threads) {
    const signal = options.signal;
    return runEnsemble(input, {
      ...(options.onProgress ? { onProgress: options.onProgress } : {}),
      ...(options.stageTimes ? { stageTimes: options.stageTimes } : {}),
      ...(options.summaries ? { summaries: options.summaries } : {}),
      ...(options.onPathwayMembers ? { onPathwayMembers: options.onPathwayMembers } : {}),
      shouldCancel: () => signal?.aborted === true,
    });
  }
  // Start the workers first: their start-up overlaps with sampling on this thread. They get
  // the plan as soon as their warm-up members are built (preparePlan's EarlyPlan) and warm
  // their kernels while this thread builds the other members' propagators.
  const pool = new WorkerPool(threads - 1);
  const early: EarlyStart = {};
  try {
    const start = performance.now();
    const { spec, plan } = preparePlan(input, 2, options.summaries, {
      members: (threads - 1) * WARM_MEMBERS,
      ready: (plan) => {
        const control = createPipelineControl(Math.max(...plan.pathways.map((p) => p.years)));
        early.control = control;
        early.ready = pool.all((worker) => ({ kind: "plan", plan, control, worker }));
        early.ready.catch(() => {}); // awaited in runWithPool; if set-up refuses the spec first, the pool just stops
      },
    }, options.onProgress && ((f) => options.onProgress!(setupProgress(f))));
    if (options.stageTimes) options.stageTimes.sample += (performance.now() - start) / 1000;
    return await runWithPool(spec, plan, pool, options, early);
  } finally {
    pool.stop();
  }
}

/** The workers' start when the plan went out before set-up ended (preparePlan's EarlyPlan). */
interface EarlyStart {
  control?: PipelineControl;
  ready?: Promise<FromWorker[]>;
}

async function runWithPool(
  spec: RunSpec,
  plan: EnsemblePlan,
  pool: WorkerPool,
  options: ParallelRunOptions,
  early: EarlyStart,
): Promise<RunResult> {
  const control = early.control ?? createPipelineControl(Math.max(...plan.pathways.map((p) => p.years)));
  const onAbort = () => Atomics.store(control.flags, CANCEL_FLAG, 1);
  options.signal?.addEventListener("abort", onAbort);
  const totalYears = plan.pathways.reduce((s, p, i) => s + p.years + firstPassYears(plan, i), 0);
  let finishedYears = 0;
  const progress = options.onProgress
    ? setInterval(() => {
        const reported = control.summarised.reduce((s, v) => s + v, 0);
        options.onProgress!(simulationProgress((finishedYears + reported) / totalYears));
      }, 100)
    : null;
  try {
    await (early.ready ?? pool.all((worker) => ({ kind: "plan", plan, control, worker })));
    const participant = new PassParticipant(plan, control);
    const times = options.stageTimes;
    // Runs one pass on every thread; stage times are thread-seconds over threads.
    const everyThread = async (order: ToWorker, pass: Generator<PassPause, boolean>, meanwhile?: () => void) => {
      const replies = pool.all(() => order).catch((error: unknown) => {
        Atomics.store(control.flags, CANCEL_FLAG, 1); // a worker failed: this thread stops waiting for it
        throw error;
      });
      meanwhile?.();
      const [workers, finished] = await Promise.all([replies, runCooperatively(control, pass)]);
      if (!finished) throw new RunCancelledError();
      if (!times) return;
      const all = [...workers.flatMap((r) => (r.kind === "done" ? [r] : [])), participant.takeTimes()];
      for (const reply of all) {
        times.simulate += reply.simulateSeconds / all.length;
        times.summarise += reply.summariseSeconds / all.length;
      }
    };
    // The pipeline both runners share (ensemble/run-pipeline.ts); here its passes run on every thread.
    const pipeline = runPipeline(spec, plan, options.onPathwayMembers);
    let step = pipeline.next();
    while (!step.done) {
      const request = step.value;
      const p = request.pathway;
      resetPipelineControl(control);
      let tcr: Float64Array | undefined;
      if (request.kind === "baseline") {
        if (options.signal?.aborted) throw new RunCancelledError();
        await everyThread({ kind: "baseline", pathway: p }, participant.baseline(p));
        finishedYears += firstPassYears(plan, p);
      } else {
        const order: ReportOrder = {
          pathway: p,
          weighted: request.weighting.weights !== null,
          totalWeight: request.weighting.totalWeight,
          horizonsByYear: horizonsByYear(plan, p),
        };
        // The members' TCR is worked out here once the workers have started reporting; this
        // thread then joins them.
        await everyThread({ kind: "report", ...order }, participant.report(order), () => {
          if (p === 0) tcr = impliedTcr(plan.climate);
        });
        finishedYears += plan.pathways[p]!.years;
        control.summarised.fill(0);
      }
      const finishStart = performance.now();
      step = pipeline.next(tcr);
      if (times && request.kind === "report") times.finish += (performance.now() - finishStart) / 1000;
    }
    options.onProgress?.(1);
    return step.value;
  } finally {
    if (progress) clearInterval(progress);
    options.signal?.removeEventListener("abort", onAbort);
  }
}

/** Milliseconds this thread computes before it lets its event loop run. */
const SLICE_MS = 4;

/**
 * Runs a pass on this thread without blocking its event loop for long: between claims it
 * yields once SLICE_MS have passed, and it waits for other threads with Atomics.waitAsync.
 * Returns false if the run was cancelled.
 */
async function runCooperatively(control: PipelineControl, pass: Generator<PassPause, boolean>): Promise<boolean> {
  let sliceStart = performance.now();
  for (let step = pass.next(); ; step = pass.next()) {
    if (step.done) return step.value;
    const pause = step.value;
    if (pause === "claim") {
      if (performance.now() - sliceStart >= SLICE_MS) {
        await new Promise<void>((resolve) => setImmediate(resolve));
        sliceStart = performance.now();
      }
      continue;
    }
    for (;;) {
      const seen = Atomics.load(pause.cell, pause.index);
      if (seen >= pause.value) break;
      if (Atomics.load(control.flags, CANCEL_FLAG) !== 0) return false;
      const waiting = Atomics.waitAsync(pause.cell, pause.index, seen, 50);
      if (waiting.async) await waiting.value;
    }
    sliceStart = performance.now();
  }
}

/** A fixed set of ensemble workers driven in lock-step: each call sends one message to all and awaits all replies. */
class WorkerPool {
  private readonly workers: Worker[];

  constructor(count: number) {
    const { url } = workerEntry();
    this.workers = Array.from({ length: count }, () => new Worker(url));
  }

  all(message: (worker: number, count: number) => ToWorker): Promise<FromWorker[]> {
    const count = this.workers.length;
    return Promise.all(
      this.workers.map(
        (worker, w) =>
          new Promise<FromWorker>((resolve, reject) => {
            const cleanup = () => {
              worker.off("message", onMessage);
              worker.off("error", onError);
            };
            const onMessage = (reply: FromWorker) => {
              cleanup();
              if (reply.kind === "failed") reject(Object.assign(new Error(reply.message), { stack: reply.stack }));
              else if (reply.kind === "cancelled") reject(new RunCancelledError());
              else resolve(reply);
            };
            const onError = (error: Error) => {
              cleanup();
              reject(error);
            };
            worker.on("message", onMessage);
            worker.on("error", onError);
            worker.postMessage(message(w, count));
          }),
      ),
    );
  }

  stop(): void {
    for (const worker of this.workers) void worker.terminate();
  }
}

/**
 * The worker script beside this file: compiled JavaScript in dist. Under the test runner
 * (TypeScript sources) a small ES-module bootstrap registers tsx in the worker, then loads
 * the .ts worker (Node 20 does not apply --import loaders given in a worker's execArgv).
 */
function workerEntry(): { url: URL } {
  if (!import.meta.url.endsWith(".ts")) return { url: new URL("./ensemble-worker.js", import.meta.url) };
  const worker = new URL("./ensemble-worker.ts", import.meta.url).href;
  const tsx = import.meta.resolve("tsx/esm/api");
  const bootstrap = `import { register } from ${JSON.stringify(tsx)}; register(); await import(${JSON.stringify(worker)});`;
  return { url: new URL(`data:text/javascript,${encodeURIComponent(bootstrap)}`) };
}

export type { PipelineControl };
