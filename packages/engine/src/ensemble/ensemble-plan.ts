import type { RunSpec } from "../spec/types.js";
import type { KernelMemory } from "../kernels/kernel-memory.js";
import type { KernelLayout } from "./kernel-layout.js";
import type { MemberClimate } from "./member-climate.js";
import type { PathwayForcing } from "./pathway-forcing.js";
import type { ModelInput } from "./uncertain-inputs.js";

/** Years whose per-member values the streaming pass is allowed to hold in one slot. */
export interface YearSlot {
  anomaly: Float64Array;
  forcing: Float64Array;
  imbalance: Float64Array;
  /**
   * Per member block (advance-year.ts MEMBER_BLOCK): min and max of forcing, anomaly and
   * imbalance in the year (6 numbers per block), so summaries need no extremes pass. Min
   * and max do not depend on the order they are taken in, so no split can change them.
   */
  extremes: Float64Array;
  /**
   * Per member block, how many of its members lie above each ascending threshold
   * (thresholds counts per block): exceedance probabilities without another pass. Whole
   * numbers, so no split changes them.
   */
  aboveCounts: Float64Array;
}

/**
 * Which per-year series besides temperature and exceedance a run summarises. All on for
 * every product run; a run may switch forcing and imbalance off (runner option
 * `summaries`), and its result then carries those two series empty (`{}`).
 */
export interface SummaryChoice {
  forcing: boolean;
  imbalance: boolean;
}

export const ALL_SUMMARIES: SummaryChoice = { forcing: true, imbalance: true };

/**
 * Everything one run needs, sampled once. All per-member arrays are O(members); nothing is
 * members × years. They live in one shared WebAssembly memory (kernel-memory.ts): the
 * member kernels read and write them there, and the parallel runner hands the same plan,
 * memory included, to its worker threads.
 */
export interface EnsemblePlan {
  members: number;
  inputs: ModelInput[];
  columns: Float64Array[];
  /** Where the member kernels find the plan's arrays (kernel-layout.ts). */
  kernels: KernelLayout;
  /**
   * The members' climate (propagators, λ): one set of arrays, holding the climate of the
   * pathway being run. A concentration pathway's members feel the expression's doubled-CO2
   * forcing, an ERF pathway's the sampled f2x, so their feedbacks differ
   * (doubling-forcing.ts); set-up builds the first pathway's, and the pipeline has it rebuilt
   * in place before a pathway that feels another source (run-pipeline.ts). Why one set: a
   * second would cost 15 arrays of members (120 MB at 1,000,000 members); rebuilding costs
   * a set-up's climate pieces once per change of source.
   */
  climate: MemberClimate;
  /** Per pathway, the index of its source of F2x (in order of first use by the pathways). */
  pathwayClimate: number[];
  /** Each member's implied TCR in the first pathway's climate (implied-tcr.ts), filled by set-up. */
  tcr: Float64Array;
  pathways: PathwayForcing[];
  /** Requested percentiles as probabilities, in the order asked. */
  probs: number[];
  thresholds: number[];
  /** Thresholds ascending, for the one-comparison-per-year crossing test. */
  thresholdsAscending: number[];
  baseline: [number, number];
  constraint: RunSpec["model"]["constraint"];
  horizons: number[];
  summaries: SummaryChoice;
  /** Member blocks of MEMBER_BLOCK members (the last may be shorter). */
  blocks: number;
  /** Reported years simulated together before being summarised (year-spans.ts). */
  spanYears: number;
  state: EnsembleState;
}

export interface EnsembleState {
  /** Upper- and deep-layer temperature of each member (struct of arrays, advance-year.ts). */
  upper: Float64Array;
  deep: Float64Array;
  /** Each member's baseline-period sum during the first pass, then its mean. */
  baselineMean: Float64Array;
  /** The lowest ascending threshold each member has not crossed yet (+Infinity once all are). */
  nextThreshold: Float64Array;
  /** Pass 1 sums, turned into each member's constraint-window mean anomaly. */
  windowMean: Float64Array;
  /** Constraint weights of the current pathway (all 1 without a constraint). */
  weights: Float64Array;
  /** Per ascending threshold: each member's first year index above it, −1 while never. */
  crossing: Float64Array[];
  /** Ring of year slots: the simulation writes year t into slot t mod ring size. */
  slots: YearSlot[];
  /** All zeros: the scale column of the padding slots of a pathway's forcing (kernel-layout.ts). */
  zeros: Float64Array;
  /**
   * Scratch of the reporting step: members whose anomaly passed their next threshold in the
   * year just stepped, listed by each member block from its first member's index on.
   */
  crossedMembers: Int32Array;
  /**
   * Scratch of the step: each member block's forcing of the year being stepped when no
   * summary keeps it (one block's 16 kB stay in cache, where a year slot would not).
   */
  blockForcing: Float64Array;
  /** Per horizon: member anomaly, committed warming and total forcing in that year. */
  horizonTemperature: Float64Array[];
  horizonCommitted: Float64Array[];
  horizonForcing: Float64Array[];
  /** Per-year summaries of the current pathway (layout in yearly-layout.ts). */
  yearly: Float64Array;
}

export function allocateState(
  members: number,
  thresholds: number,
  horizons: number,
  ringSize: number,
  blocks: number,
  yearlyLength: number,
  memory: KernelMemory,
): EnsembleState {
  const allocate = memory.float64;
  const many = (count: number) => Array.from({ length: count }, () => allocate(members));
  return {
    upper: allocate(members),
    deep: allocate(members),
    baselineMean: allocate(members),
    nextThreshold: allocate(members),
    windowMean: allocate(members),
    weights: allocate(members),
    crossing: many(thresholds),
    // Each year's step writes a slot's every member before that year is summarised.
    slots: Array.from({ length: ringSize }, () => ({
      anomaly: memory.scratch64(members),
      forcing: memory.scratch64(members),
      imbalance: memory.scratch64(members),
      extremes: allocate(6 * blocks),
      aboveCounts: allocate(Math.max(1, thresholds) * blocks),
    })),
    zeros: allocate(members),
    crossedMembers: memory.int32(members),
    blockForcing: allocate(members),
    horizonTemperature: many(horizons),
    horizonCommitted: many(horizons),
    horizonForcing: many(horizons),
    yearly: allocate(yearlyLength),
  };
}
