import { availableParallelism } from "node:os";
import type { EnsemblePlan } from "../ensemble/ensemble-plan.js";
import { impliedTcr } from "../ensemble/implied-tcr.js";
import { firstPassYears, horizonsByYear } from "../ensemble/pathway-passes.js";
import type { PlanSetup } from "../ensemble/plan-setup.js";
import { allocatePlan, preparePlan } from "../ensemble/prepare-plan.js";
import { setupProgress, simulationProgress } from "../ensemble/progress-share.js";
import { runPipeline } from "../ensemble/run-pipeline.js";
import { runEnsemble, type RunOptions, type StageTimes } from "../ensemble/run-ensemble.js";
import { RunCancelledError } from "../spec/spec-error.js";
import type { RunResult, RunSpec, RunSpecInput } from "../spec/types.js";
import { EngineThread, returnEngineThreads, takeEngineThreads } from "./engine-thread-pool.js";
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
  const threads = Math.max(1, Math.floor(options.threads ?? (input.members >= PARALLEL_MIN_MEMBERS ? availableParallelism() : 1)));
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
  // Threads kept from earlier runs are ready at once; new ones start while this thread
  // allocates and begins sampling, and join in when they are up.
  const pool = new WorkerPool(threads - 1);
  try {
    const start = performance.now();
    const allocated = allocatePlan(input, 2, options.summaries ?? {});
    if (allocated.plan === null) {
      // A pathway's forcing cannot be built: set up on this thread, which throws the spec's
      // refusals in their usual order (the samples' own first, then the pathway's).
      preparePlan(input, 2, options.summaries);
      throw allocated.pathwayError!;
    }
    return await runWithPool(allocated.spec, allocated.plan, allocated.setup, pool, options, start);
  } finally {
    pool.finish();
  }
}

async function runWithPool(
  spec: RunSpec,
  plan: EnsemblePlan,
  setup: PlanSetup,
  pool: WorkerPool,
  options: ParallelRunOptions,
  start: number,
): Promise<RunResult> {
  const control = createPipelineControl(Math.max(...plan.pathways.map((p) => p.years)));
  const onAbort = () => Atomics.store(control.flags, CANCEL_FLAG, 1);
  options.signal?.addEventListener("abort", onAbort);
  const totalYears = plan.pathways.reduce((s, p, i) => s + p.years + firstPassYears(plan, i), 0);
  const setupSteps = setup.jobs.length + 1 + setup.pieces;
  let setupDone = 0;
  let finishedYears = 0;
  let simulating = false;
  const claimed = (total: number) => Math.min(total, control.blockClaims[control.blockClaims.length - 1]!);
  const progress = options.onProgress
    ? setInterval(() => {
        if (!simulating) {
          const inPhase = setupDone === 0 ? claimed(setup.jobs.length) : setupDone === setup.jobs.length + 1 ? claimed(setup.pieces) : 0;
          options.onProgress!(setupProgress((setupDone + inPhase) / setupSteps));
          return;
        }
        const reported = control.summarised.reduce((s, v) => s + v, 0);
        options.onProgress!(simulationProgress((finishedYears + reported) / totalYears));
      }, 100)
    : null;
  try {
    const participant = new PassParticipant(plan, control);
    const times = options.stageTimes;
    const setupOrder =
      (sample: boolean) =>
      (worker: number): ToWorker => ({ kind: "setup", plan, control, spec, clean: setup.clean, worker, sample });
    // Runs one pass on every thread; stage times are thread-seconds over threads.
    const everyThread = async (order: ToWorker, pass: Generator<PassPause, boolean>, meanwhile?: () => void) => {
      const replies = pool
        .all(() => order)
        .catch((error: unknown) => {
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
    // Set-up (plan-setup.ts): sampling jobs on every thread that is up, correlation here,
    // climate pieces on the same threads, then the spec's refusals here. A thread still
    // starting (a process's first run) gets the plan only and joins at the first pass.
    // Stage time "sample" is wall-clock.
    const up = pool.booted();
    await runSetupPass(pool.some(up, setupOrder(true)), participant.sample(setup), control);
    setupDone = setup.jobs.length;
    setup.correlate();
    setupDone++;
    resetPipelineControl(control);
    await runSetupPass(
      pool.some(up, () => ({ kind: "climate" })),
      participant.buildClimates(setup),
      control,
    );
    setupDone += setup.pieces;
    setup.refusals();
    // Its answer comes before its answer to the first pass, which is awaited.
    pool.some(pool.notIn(up), setupOrder(false)).catch(() => {});
    options.onProgress?.(setupProgress(1));
    if (times) times.sample += (performance.now() - start) / 1000;
    simulating = true;
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

/** One set-up pass on every thread: the workers' replies and this thread's share. */
async function runSetupPass(replies: Promise<FromWorker[]>, pass: Generator<PassPause, boolean>, control: PipelineControl): Promise<void> {
  const failed = replies.catch((error: unknown) => {
    Atomics.store(control.flags, CANCEL_FLAG, 1); // a worker failed: this thread stops its share
    throw error;
  });
  const [, finished] = await Promise.all([failed, runCooperatively(control, pass)]);
  if (!finished) throw new RunCancelledError();
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

/** The run's helper threads, driven in lock-step: each call sends one order to all and awaits all replies. */
class WorkerPool {
  private readonly threads: EngineThread[];

  constructor(count: number) {
    this.threads = takeEngineThreads(count);
  }

  all(message: (worker: number, count: number) => ToWorker): Promise<FromWorker[]> {
    return Promise.all(this.threads.map((thread, w) => thread.request(message(w, this.threads.length))));
  }

  /** As all(), to the threads `only` picks (by index). */
  some(only: number[], message: (worker: number) => ToWorker): Promise<FromWorker[]> {
    return Promise.all(only.map((w) => this.threads[w]!.request(message(w))));
  }

  /** Indexes of the threads that are up now; set-up is shared with these only. */
  booted(): number[] {
    return this.threads.flatMap((thread, w) => (thread.isBooted ? [w] : []));
  }

  /** Indexes of the other threads. */
  notIn(picked: number[]): number[] {
    return this.threads.flatMap((_, w) => (picked.includes(w) ? [] : [w]));
  }

  /**
   * Hands the threads back for the next run, each told to let go of this run's plan; a
   * thread still busy (a run that failed or was cancelled before it answered) is stopped.
   */
  finish(): void {
    for (const thread of this.threads) if (thread.reusable) thread.release();
    returnEngineThreads(this.threads);
  }
}

export type { PipelineControl };
