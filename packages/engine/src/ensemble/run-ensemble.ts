import { RunCancelledError } from "../spec/spec-error.js";
import type { PathwayPerilResult } from "../peril/types.js";
import type { PathwayResult, PercentileSet, RunResult, RunSpec, RunSpecInput } from "../spec/types.js";
import { advanceReportedYears } from "./advance-year.js";
import { assembleResult } from "./assemble-result.js";
import { finishPathway } from "./finish-pathway.js";
import { impliedSensitivities } from "./implied-sensitivity.js";
import { firstPassYears, horizonsByYear, resetForReporting, runBaselinePass } from "./pathway-passes.js";
import { pathwayPerils, runPerils } from "./pathway-perils.js";
import { weighPathway } from "./pathway-weights.js";
import type { SummaryChoice } from "./ensemble-plan.js";
import { preparePlan } from "./prepare-plan.js";
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
  onPathwayMembers?(members: PathwayMembers): void;
}

/** One pathway's per-member values, as onPathwayMembers hands them out. */
export interface PathwayMembers {
  pathwayIndex: number;
  /** Per horizon (spec order), each member's warming (annual-mean anomaly, K). */
  horizonWarming: Float64Array[];
  /** Constraint weights (largest 1), or null when the run has no constraint. */
  weights: Float64Array | null;
  /** Every model input with its sampled column, in the sampler's order. */
  inputs: { name: string; kind: "climate" | "agent"; fixed: boolean; values: Float64Array }[];
  /** Agents this pathway carries. */
  agents: string[];
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
  const { spec, plan } = preparePlan(input, 1, options.summaries);
  lap("sample");
  const n = plan.members;
  const totalYears = plan.pathways.reduce((s, p, i) => s + p.years + firstPassYears(plan, i), 0);
  const every = Math.max(1, Math.floor(totalYears / 100));
  let done = 0;
  const tick = () => {
    done++;
    if (done % every !== 0) return;
    if (options.shouldCancel?.()) throw new RunCancelledError();
    options.onProgress?.(done / totalYears);
  };
  const pathways: PathwayResult[] = [];
  const perils: (PathwayPerilResult | null)[] = [];
  let implied: { ecs: PercentileSet; tcr: PercentileSet } | null = null;
  const inputOrders = new Map<number, Uint32Array>();
  const summariser = new YearSummariser(plan);
  const slots = plan.state.slots;
  const span = plan.spanYears;
  plan.pathways.forEach((pathway, p) => {
    runBaselinePass(plan, p, 0, n, tick);
    const weighting = weighPathway(plan);
    resetForReporting(plan, 0, n);
    const byYear = horizonsByYear(plan, p);
    lap("simulate");
    for (let t0 = 0; t0 < pathway.years; t0 += span) {
      const t1 = Math.min(pathway.years, t0 + span);
      advanceReportedYears(plan, p, t0, t1, 0, n);
      if (times) lap("simulate");
      for (let t = t0; t < t1; t++) {
        summariser.summarise(p, t, pathway.years, slots[t % slots.length]!, weighting.weights, weighting.totalWeight, byYear[t]!);
        tick();
      }
      if (times) lap("summarise");
    }
    pathways.push(finishPathway(spec, plan, p, weighting, inputOrders));
    options.onPathwayMembers?.({
      pathwayIndex: p,
      horizonWarming: plan.state.horizonTemperature,
      weights: weighting.weights,
      inputs: plan.inputs.map((x, i) => ({ name: x.name, kind: x.kind, fixed: x.distribution.type === "fixed", values: plan.columns[i]! })),
      agents: pathway.agents,
    });
    perils.push(pathwayPerils(spec, plan, p, weighting));
    if (p === 0) implied = impliedSensitivities(plan, spec.percentiles, weighting);
    lap("finish");
  });
  options.onProgress?.(1);
  const result = assembleResult(spec, pathways, implied!, runPerils(spec, perils));
  lap("finish");
  return result;
}
