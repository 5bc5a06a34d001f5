import { SpecError } from "../spec/spec-error.js";
import type { RunSpec } from "../spec/types.js";
import { doublingSourceOf, expressionDoublingForcing, fillDoublingForcing, type DoublingSource } from "./doubling-forcing.js";
import { impliedTcrInto } from "./implied-tcr.js";
import {
  fillMemberClimate,
  refuseMemberClimate,
  type ClimateColumns,
  type ClimateInputColumn,
  type MemberClimate,
} from "./member-climate.js";
import { correlateColumns, correlatedInputs, runSamplingJob, samplingJobs } from "./sample-inputs.js";
import type { ModelInput } from "./uncertain-inputs.js";

/** Members per climate piece: big enough that claiming one costs nothing, small enough to share out. */
export const SETUP_PIECE_MEMBERS = 8192;

/** What set-up fills: the plan's input columns and its member climate (arrays allocated, not yet filled). */
export interface SetupArrays {
  inputs: ModelInput[];
  columns: Float64Array[];
  /**
   * The member climate's arrays: one set, holding the climate of one source of F2x at a time
   * (doubling-forcing.ts; set-up builds the first pathway's, buildClimate rebuilds it in place
   * for a pathway that feels another).
   */
  climate: MemberClimate;
  /** Each member's implied TCR in the first member climate (implied-tcr.ts). */
  tcr: Float64Array;
  /** The kernel memory every array above lives in. */
  memory: WebAssembly.Memory;
}

/**
 * A run's set-up as pieces of work any thread can take, in any order, giving the same
 * numbers: (1) sampling jobs (sample-inputs.ts: one or two input columns each); (2) the
 * correlation step, on one thread once every sampling job is done; (3) climate pieces:
 * SETUP_PIECE_MEMBERS members' forcing at doubled CO2, one-year propagators and implied TCR
 * (the member climate of the first pathway; buildClimate rebuilds it for later pathways
 * that feel another source of F2x). `refusals()` then throws the spec's first problem, in the order a
 * one-thread set-up always gave it. The one-thread runner does every piece in turn
 * (prepare-plan.ts); the parallel runner hands them out to its threads, each holding its
 * own PlanSetup over the same shared arrays. `clean` (one flag per climate piece and member
 * climate, 1 once filled without a problem) is what the threads share besides the arrays.
 */
export class PlanSetup {
  readonly jobs: number[][];
  readonly pieces: number;
  private readonly correlated: number[];
  private readonly climateColumns: ClimateColumns;
  private readonly climateInputs: ClimateInputColumn[];
  /** Per source of F2x the pathways use, in order of first use: how its members' forcing at doubled CO2 is worked out. */
  private readonly doubling: { source: DoublingSource; expressionF2x: number }[];
  private readonly f2x: Float64Array;
  private readonly co2Scale: Float64Array | null;

  constructor(
    private readonly spec: RunSpec,
    private readonly arrays: SetupArrays,
    readonly clean: Int32Array,
  ) {
    const { inputs, columns } = arrays;
    this.jobs = samplingJobs(spec, inputs);
    this.correlated = correlatedInputs(spec, inputs);
    this.pieces = PlanSetup.piecesOf(spec);
    if (clean.length < this.pieces) throw new RangeError(`set-up needs ${this.pieces} clean flags, got ${clean.length}`);
    const names = inputs.map((x) => x.name);
    const column = (name: string) => columns[names.indexOf(name)]!;
    const co2Index = names.indexOf("co2");
    this.f2x = column("f2x");
    this.co2Scale = co2Index >= 0 ? columns[co2Index]! : null;
    this.doubling = [...new Set(spec.pathways.map(doublingSourceOf))].map((source) => ({
      source,
      expressionF2x: source === "concentration" ? expressionDoublingForcing(spec.model.forcingExpression) : NaN,
    }));
    this.climateInputs = [
      { field: "model.climate.ecs", values: column("ecs") },
      { field: "model.climate.f2x", values: column("f2x") },
      ...(co2Index >= 0 ? [{ field: "model.agents.co2.scale", values: columns[co2Index]! }] : []),
      ...(["upperHeatCapacity", "deepHeatCapacity", "heatExchange", "deepEfficacy"] as const).map((name) => ({
        field: `model.climate.${name}`,
        values: column(name),
      })),
    ];
    this.climateColumns = {
      ecs: column("ecs"),
      doublingForcing: arrays.climate.doublingForcing,
      upperHeatCapacity: column("upperHeatCapacity"),
      deepHeatCapacity: column("deepHeatCapacity"),
      heatExchange: column("heatExchange"),
      deepEfficacy: column("deepEfficacy"),
    };
  }

  /** How many climate pieces (and clean flags) a spec's member climate is built in. */
  static piecesOf(spec: RunSpec): number {
    return Math.ceil(spec.members / SETUP_PIECE_MEMBERS);
  }

  sample(job: number): void {
    const { inputs, columns } = this.arrays;
    runSamplingJob(this.spec, inputs, columns, this.correlated, this.jobs[job]!, this.arrays.memory);
  }

  /** Re-pairs the correlated inputs (Iman–Conover) and maps them through their laws; after every sampling job. */
  correlate(): void {
    const { inputs, columns } = this.arrays;
    correlateColumns(this.spec, inputs, columns, this.correlated);
  }

  /**
   * Climate piece k (members [k·SETUP_PIECE_MEMBERS, …) of the member climate) for source
   * `variant` of F2x (plan.pathwayClimate), in place. The first source's build also works out
   * the members' implied TCR.
   */
  buildClimate(k: number, variant = 0): void {
    const lo = k * SETUP_PIECE_MEMBERS;
    const hi = Math.min(this.spec.members, lo + SETUP_PIECE_MEMBERS);
    const { source, expressionF2x } = this.doubling[variant]!;
    const out = this.climateColumns;
    fillDoublingForcing(source, this.f2x, expressionF2x, this.co2Scale, 1, out.doublingForcing, lo, hi);
    const climate = this.arrays.climate;
    const clean = fillMemberClimate(out, climate, lo, hi);
    this.clean[k] = clean ? 1 : 0;
    // A piece that is not clean will be refused (refuseClimate), so its TCR is never read.
    if (variant === 0 && clean) impliedTcrInto(climate, this.arrays.tcr, lo, hi);
  }

  /**
   * Once every piece of a build is done: throws if the member climate could not be built
   * (its first non-positive input, then its first non-finite propagator).
   */
  refuseClimate(): void {
    if (this.clean.subarray(0, this.pieces).every((flag) => flag === 1)) return;
    refuseMemberClimate(this.climateColumns, this.climateInputs, this.arrays.climate);
  }

  /**
   * Throws the spec's first problem once set-up's pieces are done: a member climate that
   * could not be built (refuseClimate), then an agent scale that sampled a non-finite value.
   * A pathway that feels another source of F2x is checked when its climate is built.
   */
  refusals(): void {
    this.refuseClimate();
    const { inputs, columns } = this.arrays;
    inputs.forEach((x, i) => {
      if (x.kind !== "agent") return;
      const values = columns[i]!;
      for (let m = 0; m < values.length; m++)
        if (!Number.isFinite(values[m]!)) throw new SpecError(x.field, `sampled a non-finite value at member ${m + 1}`);
    });
  }

  /** The member climate rebuilt in place for source `variant` of F2x on this thread, then refused if it must be. */
  buildAllClimate(variant: number): void {
    for (let k = 0; k < this.pieces; k++) this.buildClimate(k, variant);
    this.refuseClimate();
  }

  /** Every piece in turn on this thread, then the refusals. onStep(done, of): after each piece. */
  runAll(onStep?: (done: number, of: number) => void): void {
    const steps = this.jobs.length + 1 + this.pieces;
    let done = 0;
    const step = () => onStep?.(++done, steps);
    for (let j = 0; j < this.jobs.length; j++) {
      this.sample(j);
      step();
    }
    this.correlate();
    step();
    for (let k = 0; k < this.pieces; k++) {
      this.buildClimate(k);
      step();
    }
    this.refusals();
  }
}
