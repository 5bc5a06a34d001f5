import { keepKernelMemory } from "../kernels/kernel-memory.js";
import { RunCancelledError } from "../spec/spec-error.js";
import type { RunResult, RunSpec, RunSpecInput } from "../spec/types.js";
import { advanceReportedYears } from "./advance-year.js";
import { firstPassYears, horizonsByYear, resetForReporting, runBaselinePass } from "./pathway-passes.js";
import type { SummaryChoice } from "./ensemble-plan.js";
import { runPipeline, type PathwayMembers } from "./run-pipeline.js";

export type { PathwayMembers };
import { preparePlan } from "./prepare-plan.js";
import { setupProgress, simulationProgress } from "./progress-share.js";
import { YearSummariser } from "./summarise-year.js";

export interface RunOptions {
  /** Called with the finished fraction (0..1), about every 1 % of the work. */
  onProgress?(fraction: number): void;
  /** Polled about every 1 % of the work; answering true stops the run with RunCancelledError. */
  shouldCancel?(): boolean;
  /** If given, filled with the seconds spent in each stage (for the benchmark). */
  stageTimes?: StageTimes;
  /**
   * Per-year series to summarise besides temperature and exceedance (default: all). A series
   * switched off is returned empty ({}); the benchmark uses this to time W1's own workload.
   */
  summaries?: Partial<SummaryChoice>;
  /**
   * Called once per pathway, after its summaries, with its members' horizon warming and
   * constraint weights (views into the run's arrays, valid only during the call) and the
   * sampled inputs: what memberTable (member-table.ts) lists.
   */
  onPathwayMembers?: (members: PathwayMembers) => void;
}

/** Wall-clock seconds per stage; parallel stages count thread-seconds divided by threads. */
export interface StageTimes {
  sample: number;
  simulate: number;
  summarise: number;
  finish: number;
}

/**
 * Runs an ensemble: samples the inputs, advances every member through each pathway year by
 * year with the two-layer model, and summarises each year as it is produced (memory
 * O(members), never members × years). Pure and synchronous: same spec, same result and
 * resultHash. Throws SpecError for a spec it cannot run (message names the field).
 * Cost O(members × years × (agents + log of bucket size)).
 */
export function runEnsemble(input: RunSpecInput | RunSpec, options: RunOptions = {}): RunResult {
  const times = options.stageTimes;
  let clock = performance.now();
  const lap = (stage: keyof StageTimes) => {
    const now = performance.now();
    if (times) times[stage] += (now - clock) / 1000;
    clock = now;
  };
  const report = options.onProgress && ((fraction: number) => options.onProgress?.(fraction));
  const { spec, plan, setup } = preparePlan(input, options.summaries, report && ((f) => report(setupProgress(f))));
  lap("sample");
  const n = plan.members;
  const totalYears = plan.pathways.reduce((s, p, i) => s + p.years + firstPassYears(plan, i), 0);
  const every = Math.max(1, Math.floor(totalYears / 100));
  let done = 0;
  const tick = () => {
    done++;
    if (done % every !== 0) return;
    if (options.shouldCancel?.()) throw new RunCancelledError();
    report?.(simulationProgress(done / totalYears));
  };
  const summariser = new YearSummariser(plan);
  const slots = plan.state.slots;
  const span = plan.spanYears;
  const pipeline = runPipeline(spec, plan, options.onPathwayMembers);
  for (let step = pipeline.next(); ; ) {
    if (step.done) {
      // The result holds copies only: the next run on this thread may reuse the arrays' memory.
      keepKernelMemory(plan.kernels.memory);
      lap("finish");
      options.onProgress?.(1);
      return step.value;
    }
    const request = step.value;
    const p = request.pathway;
    if (request.kind === "climate") {
      setup.buildAllClimate(request.variant);
      lap("sample");
      step = pipeline.next();
      continue;
    }
    if (request.kind === "baseline") {
      runBaselinePass(plan, p, 0, n, tick);
      lap("simulate");
      step = pipeline.next();
      continue;
    }
    const pathway = plan.pathways[p]!;
    const { weights, totalWeight } = request.weighting;
    resetForReporting(plan, 0, n);
    const byYear = horizonsByYear(plan, p);
    for (let t0 = 0; t0 < pathway.years; t0 += span) {
      const t1 = Math.min(pathway.years, t0 + span);
      advanceReportedYears(plan, p, t0, t1, 0, n);
      if (times) lap("simulate");
      for (let t = t0; t < t1; t++) {
        summariser.summarise(p, t, pathway.years, slots[t % slots.length]!, weights, totalWeight, byYear[t]!);
        tick();
      }
      if (times) lap("summarise");
    }
    step = pipeline.next();
    if (!step.done) lap("finish");
  }
}
