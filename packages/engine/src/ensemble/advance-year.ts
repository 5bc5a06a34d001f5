import { memberKernels } from "../kernels/member-kernels.js";
import type { EnsemblePlan } from "./ensemble-plan.js";

/**
 * Members advanced together through a span of years (time blocking). A block's per-member
 * inputs stay in the core's cache while it runs through several years, instead of streaming
 * every array from memory once per year. Members are independent, so the block size
 * changes no number.
 */
export const MEMBER_BLOCK = 2048;

/*
 * Per block and year: the forcing kernel, then the step kernel (kernels/member-kernels.wat),
 * which also counts members above the lowest threshold and lists first crossings.
 */

/**
 * First pass, years [t0, t1), members [lo, hi): advance the state with forcing held constant
 * over each year (exact propagator) and add the year's MEAN upper-layer temperature to the
 * member's baseline sum and constraint-window sum in the years that fall in those periods.
 * Only the states are needed; the forcing goes to the block's scratch (state.blockForcing).
 */
export function advanceBaselineYears(
  plan: EnsemblePlan,
  pathwayIndex: number,
  t0: number,
  t1: number,
  lo: number,
  hi: number,
  inBaseline: (t: number) => boolean,
  inWindow: (t: number) => boolean,
): void {
  const kernels = memberKernels(plan.kernels.memory);
  const pathway = plan.pathways[pathwayIndex]!;
  const columns = plan.kernels.forcingColumns[pathwayIndex]!.byteOffset;
  const coefficients = plan.kernels.forcingCoefficients[pathwayIndex]!.byteOffset;
  const frame = plan.kernels.frame.byteOffset;
  const scratch = plan.state.blockForcing.byteOffset;
  for (let b = lo; b < hi; b += MEMBER_BLOCK) {
    const n = Math.min(hi, b + MEMBER_BLOCK) - b;
    for (let t = t0; t < t1; t++) {
      kernels.forcing(scratch, b, n, pathway.fixedTotal[t]!, columns, coefficients + 8 * t, 8 * pathway.years, pathway.scaleWidth, 0);
      kernels.baselineStep(frame, b, n, scratch, inBaseline(t) ? 1 : 0, inWindow(t) ? 1 : 0);
    }
  }
}

/**
 * Reporting pass, years [t0, t1), members [lo, hi) with lo on a block boundary: block by
 * block, year t into slot t mod (number of slots).
 */
export function advanceReportedYears(plan: EnsemblePlan, pathwayIndex: number, t0: number, t1: number, lo: number, hi: number): void {
  for (let b = lo; b < hi; b += MEMBER_BLOCK) advanceReportedBlock(plan, pathwayIndex, t0, t1, b / MEMBER_BLOCK);
}

/**
 * Member block `block` (members block·MEMBER_BLOCK … at most MEMBER_BLOCK further) through
 * years [t0, t1). Each block writes its own tallies in each slot (extremes of forcing,
 * anomaly and imbalance; counts above each threshold), so whichever thread runs a block,
 * the summaries merge the same numbers: min, max and whole counts do not depend on order.
 * Without an imbalance summary (plan.summaries) the imbalance is neither written nor
 * tallied; without a forcing summary the forcing is kept in the year's slot only in horizon
 * years (committed warming needs it) and otherwise goes to the block's scratch.
 */
export function advanceReportedBlock(plan: EnsemblePlan, pathwayIndex: number, t0: number, t1: number, block: number): void {
  advanceReportedMembers(plan, pathwayIndex, t0, t1, block * MEMBER_BLOCK, Math.min(plan.members, (block + 1) * MEMBER_BLOCK), block);
}

/**
 * Members [lo, hi) of member block `block` through years [t0, t1), writing the block's
 * tallies (advanceReportedBlock); the warm-up (warm-kernels.ts) runs part of a block.
 */
export function advanceReportedMembers(plan: EnsemblePlan, pathwayIndex: number, t0: number, t1: number, lo: number, hi: number, block: number): void {
  const slots = plan.state.slots;
  const ring = slots.length;
  const n = hi - lo;
  const at = 6 * block;
  const thresholds = plan.thresholdsAscending;
  const countsAt = thresholds.length * block;
  const lowest = thresholds[0] ?? Infinity;
  const withImbalance = plan.summaries.imbalance;
  const kernels = memberKernels(plan.kernels.memory);
  const pathway = plan.pathways[pathwayIndex]!;
  const columns = plan.kernels.forcingColumns[pathwayIndex]!.byteOffset;
  const coefficients = plan.kernels.forcingCoefficients[pathwayIndex]!.byteOffset;
  const frame = plan.kernels.frame.byteOffset;
  const crossed = plan.state.crossedMembers;
  for (let t = t0; t < t1; t++) {
    const slot = slots[t % ring]!;
    const extremes = slot.extremes;
    for (let k = 0; k < 6; k += 2) {
      extremes[at + k] = Infinity;
      extremes[at + k + 1] = -Infinity;
    }
    const tallies = extremes.byteOffset + 8 * at;
    // Forcing extremes only feed the forcing summary.
    const summarised = plan.summaries.forcing;
    const forcing = summarised || plan.horizons.includes(pathway.startYear + t) ? slot.forcing : plan.state.blockForcing;
    kernels.forcing(forcing.byteOffset, lo, n, pathway.fixedTotal[t]!, columns, coefficients + 8 * t, 8 * pathway.years, pathway.scaleWidth, summarised ? tallies : 0);
    const crossings = kernels.reportedStep(
      frame,
      lo,
      n,
      forcing.byteOffset,
      slot.anomaly.byteOffset,
      withImbalance ? slot.imbalance.byteOffset : 0,
      tallies,
      lowest,
      thresholds.length > 0 ? slot.aboveCounts.byteOffset + 8 * countsAt : 0,
    );
    for (let i = 0; i < crossings; i++) {
      const m = crossed[lo + i]!;
      crossThresholds(plan, m, t, slot.anomaly[m]!);
    }
    countAboveOthers(plan, lo, hi, slot.anomaly, slot.aboveCounts, countsAt);
  }
}

/**
 * Counts of members above each ascending threshold but the lowest (the step kernel counted
 * that one), over the block's anomalies, still in cache.
 */
function countAboveOthers(plan: EnsemblePlan, lo: number, hi: number, anomaly: Float64Array, aboveCounts: Float64Array, countsAt: number): void {
  const thresholds = plan.thresholdsAscending;
  for (let i = 1; i < thresholds.length; i++) aboveCounts[countsAt + i] = countAbove(anomaly, lo, hi, thresholds[i]!);
}

export function countAbove(values: Float64Array, lo: number, hi: number, threshold: number): number {
  let count = 0;
  for (let m = lo; m < hi; m++) count += values[m]! > threshold ? 1 : 0;
  return count;
}

/**
 * Member m's anomaly a in year t exceeds its next threshold: records every threshold it now
 * exceeds (a member crosses a threshold in the first year whose anomaly exceeds it, strictly).
 */
function crossThresholds(plan: EnsemblePlan, m: number, t: number, a: number): void {
  const thresholds = plan.thresholdsAscending;
  const { crossing, nextThreshold } = plan.state;
  let c = 0;
  while (thresholds[c]! < nextThreshold[m]!) c++;
  do crossing[c++]![m] = t;
  while (c < thresholds.length && a > thresholds[c]!);
  nextThreshold[m] = c < thresholds.length ? thresholds[c]! : Infinity;
}
