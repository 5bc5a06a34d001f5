import { availableParallelism } from "node:os";
import type { EnsemblePlan } from "../ensemble/ensemble-plan.js";
import { firstPassYears, horizonsByYear } from "../ensemble/pathway-passes.js";
import type { PlanSetup } from "../ensemble/plan-setup.js";
import { allocatePlan, preparePlan } from "../ensemble/prepare-plan.js";
import { setupProgress, simulationProgress } from "../ensemble/progress-share.js";
import { runPipeline } from "../ensemble/run-pipeline.js";
import { runEnsemble, type RunOptions, type StageTimes } from "../ensemble/run-ensemble.js";
import { keepKernelMemory } from "../kernels/kernel-memory.js";
import { RunCancelledError } from "../spec/spec-error.js";
import type { RunResult, RunSpec, RunSpecInput } from "../spec/types.js";
import { EngineThread, idleEngineThreads, returnEngineThreads, takeEngineThreads } from "./engine-thread-pool.js";
import { PassParticipant, type PassPause } from "./pass-participant.js";
import { CANCEL_FLAG, createPipelineControl, resetPipelineControl, type PipelineControl } from "./pipeline-control.js";
import type { FromWorker, ToWorker } from "./worker-messages.js";

/** Below this many members one thread is faster than starting workers. */
export const PARALLEL_MIN_MEMBERS = 20_000;

export interface ParallelRunOptions {
  /**
   * Computing threads: helper threads that take the work while this thread coordinates
   * (engine-thread-pool.ts keeps them between runs); default: the machine's available cores
   * when members ≥ 20,000, else 1 (then this thread computes, as runEnsemble).
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
 * runEnsemble spread over helper threads: set-up comes as sampling jobs and climate pieces
 * (plan-setup.ts), the passes as member blocks and then years to summarise, all claimed by
 * the helpers from shared counters (pass-participant.ts), so a thread the machine slows
 * down takes less of the work. Results are bit-identical to runEnsemble for any thread
 * count. Rejects with SpecError for a bad spec and with RunCancelledError when the signal
 * aborts.
 *
 * This thread coordinates: it allocates the plan, does the serial steps between passes
 * (correlation, the spec's refusals, constraint weights, each pathway's result) and keeps
 * its event loop free for progress, abort and a server's other work. Why the helpers take
 * all the computing (measured, W1 at 100,000 members on 2 cores): they are kept between
 * runs with their code already optimised by V8, while this thread's code runs cold in a
 * fresh process; with this thread taking a share, two threads did barely better than one.
 * In a process's first large run (fewer helpers kept than `threads`) this thread computes
 * too, in slices that leave its event loop turning: it does the set-up while threads − 1
 * new helpers start and warm up, then takes its share of each pass beside them (measured,
 * W1 at 100,000 members: 0.82–0.86 s with this thread only coordinating two new helpers,
 * against ~0.66 s this way, the design of earlier rounds).
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
  // Warm: enough helpers kept from earlier runs, and this thread coordinates. Cold (a
  // process's first large run): this thread is one of the computing threads, beside
  // threads − 1 new helpers, which start (and warm up) while it does the set-up.
  const warm = idleEngineThreads() >= threads;
  const pool = new WorkerPool(warm ? threads : threads - 1);
  let finished: WebAssembly.Memory | null = null;
  try {
    const start = performance.now();
    const allocated = allocatePlan(input, options.summaries ?? {});
    if (allocated.plan === null) {
      // A pathway's forcing cannot be built: set up on this thread, which throws the spec's
      // refusals in their usual order (the samples' own first, then the pathway's).
      preparePlan(input, options.summaries);
      throw allocated.pathwayError!;
    }
    const result = await runWithPool(allocated.spec, allocated.plan, allocated.setup, pool, options, start, !warm);
    finished = allocated.plan.kernels.memory;
    return result;
  } finally {
    pool.finish();
    // Only after a run every helper has answered to the end: a failed run's helper may still write.
    if (finished) keepKernelMemory(finished);
  }
}

async function runWithPool(
  spec: RunSpec,
  plan: EnsemblePlan,
  setup: PlanSetup,
  pool: WorkerPool,
  options: ParallelRunOptions,
  start: number,
  computeHere: boolean,
): Promise<RunResult> {
  const control = createPipelineControl(Math.max(...plan.pathways.map((p) => p.years)));
  const onAbort = () => Atomics.store(control.flags, CANCEL_FLAG, 1);
  options.signal?.addEventListener("abort", onAbort);
  const progress = options.onProgress ? new ParallelProgress(plan, setup, control, options.onProgress) : null;
  try {
    const times = options.stageTimes;
    const here = new PassParticipant(plan, control);
    // Every helper's reply to one order, and this thread's share of the pass if it computes
    // (in slices, runCooperatively); a failure stops the others at their next claim.
    const everyThread = async (only: number[], order: (worker: number) => ToWorker, pass?: Generator<PassPause, boolean>) => {
      const replies = pool.some(only, order).catch((error: unknown) => {
        Atomics.store(control.flags, CANCEL_FLAG, 1);
        throw error;
      });
      const [answers] = await Promise.all([replies, pass ? runHere(control, pass) : null]);
      const done = answers.flatMap((r) => (r.kind === "done" ? [r] : []));
      return pass ? [...done, here.takeTimes()] : done;
    };
    const setupOrder =
      (sample: boolean) =>
      (worker: number): ToWorker => ({ kind: "setup", plan, control, spec, clean: setup.clean, worker, sample });
    // Set-up: the helpers that are up share it, with this thread when it computes (or when
    // none is up yet); a helper still starting gets the plan afterwards and joins at the first
    // pass. Stage time "sample" is wall-clock.
    const up = pool.booted();
    const setUpHere = computeHere || up.length === 0;
    const shareOut = (order: (worker: number) => ToWorker, pass: () => Generator<PassPause, boolean>) =>
      everyThread(up, order, setUpHere ? pass() : undefined);
    await shareOut(setupOrder(true), () => here.sample(setup));
    progress?.setupStep(setup.jobs.length);
    setup.correlate();
    progress?.setupStep(1);
    resetPipelineControl(control);
    await shareOut(
      () => ({ kind: "climate", variant: 0 }),
      () => here.buildClimates(setup, 0),
    );
    progress?.setupStep(setup.pieces);
    setup.refusals();
    // Their answer comes before their answer to the first pass, which is awaited.
    pool.some(pool.notIn(up), setupOrder(false)).catch(() => {});
    if (times) times.sample += (performance.now() - start) / 1000;
    const all = pool.all();
    // The pipeline both runners share (ensemble/run-pipeline.ts); here the helpers (and, cold,
    // this thread) run its passes.
    const pipeline = runPipeline(spec, plan, options.onPathwayMembers);
    let step = pipeline.next();
    while (!step.done) {
      const request = step.value;
      const p = request.pathway;
      resetPipelineControl(control);
      if (options.signal?.aborted) throw new RunCancelledError();
      if (request.kind === "climate") {
        // The member climate rebuilt in place by the helpers, then refused here if it must be.
        const climateStart = performance.now();
        await everyThread(
          all,
          () => ({ kind: "climate", variant: request.variant }),
          computeHere ? here.buildClimates(setup, request.variant) : undefined,
        );
        setup.refuseClimate();
        if (times) times.sample += (performance.now() - climateStart) / 1000;
        step = pipeline.next();
        continue;
      }
      const order: ToWorker =
        request.kind === "baseline"
          ? { kind: "baseline", pathway: p }
          : {
              kind: "report",
              pathway: p,
              weighted: request.weighting.weights !== null,
              totalWeight: request.weighting.totalWeight,
              horizonsByYear: horizonsByYear(plan, p),
            };
      const pass = !computeHere
        ? undefined
        : order.kind === "baseline"
          ? here.baseline(p)
          : order.kind === "report"
            ? here.report(order)
            : undefined;
      const replies = await everyThread(all, () => order, pass);
      if (times)
        for (const reply of replies) {
          times.simulate += reply.simulateSeconds / replies.length;
          times.summarise += reply.summariseSeconds / replies.length;
        }
      progress?.passDone(request.kind === "baseline" ? firstPassYears(plan, p) : plan.pathways[p]!.years);
      const finishStart = performance.now();
      step = pipeline.next();
      if (times && request.kind === "report") times.finish += (performance.now() - finishStart) / 1000;
    }
    options.onProgress?.(1);
    return step.value;
  } finally {
    progress?.stop();
    options.signal?.removeEventListener("abort", onAbort);
  }
}

/**
 * The run's progress, reported every 100 ms from the shared counters: set-up's share while
 * sampling jobs and climate pieces are claimed, then the years simulated and summarised.
 */
class ParallelProgress {
  private readonly timer: ReturnType<typeof setInterval>;
  private readonly setupSteps: number;
  private setupDone = 0;
  private finishedYears = 0;
  private readonly totalYears: number;

  constructor(
    plan: EnsemblePlan,
    private readonly setup: PlanSetup,
    private readonly control: PipelineControl,
    private readonly report: (fraction: number) => void,
  ) {
    this.setupSteps = setup.jobs.length + 1 + setup.pieces;
    this.totalYears = plan.pathways.reduce((s, p, i) => s + p.years + firstPassYears(plan, i), 0);
    this.timer = setInterval(() => this.tick(), 100);
  }

  setupStep(steps: number): void {
    this.setupDone += steps;
    if (this.setupDone === this.setupSteps) this.report(setupProgress(1));
  }

  passDone(years: number): void {
    this.finishedYears += years;
    this.control.summarised.fill(0);
  }

  stop(): void {
    clearInterval(this.timer);
  }

  private tick(): void {
    const { setup, control } = this;
    if (this.setupDone < this.setupSteps) {
      // The set-up counter claims jobs, then (after the correlation step) climate pieces.
      const phase = this.setupDone === 0 ? setup.jobs.length : setup.pieces;
      const claimed = Math.min(phase, control.blockClaims[control.blockClaims.length - 1]!);
      this.report(setupProgress((this.setupDone + claimed) / this.setupSteps));
      return;
    }
    const reported = control.summarised.reduce((s, v) => s + v, 0);
    this.report(simulationProgress((this.finishedYears + reported) / this.totalYears));
  }
}

/** Runs a pass on this thread in slices (runCooperatively); rejects with RunCancelledError if cancelled. */
async function runHere(control: PipelineControl, pass: Generator<PassPause, boolean>): Promise<void> {
  if (!(await runCooperatively(control, pass))) throw new RunCancelledError();
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

/** The run's helper threads, driven in lock-step: each call sends one order to each and awaits every reply. */
class WorkerPool {
  private readonly threads: EngineThread[];

  constructor(count: number) {
    this.threads = takeEngineThreads(count);
  }

  /** Indexes of every thread. */
  all(): number[] {
    return this.threads.map((_, w) => w);
  }

  /** Sends one order to each thread `only` picks (by index) and awaits every reply. */
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
