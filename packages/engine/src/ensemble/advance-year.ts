import { blockSteppers } from "./block-steppers.js";
import type { EnsemblePlan } from "./ensemble-plan.js";
import { forcingKernel } from "./member-forcing.js";

/**
 * Members advanced together through a span of years (time blocking). A block's per-member
 * inputs stay in the core's cache while it runs through several years, instead of streaming
 * every array from memory once per year. Members are independent, so the block size
 * changes no number.
 */
export const MEMBER_BLOCK = 2048;

/*
 * Per block and year: the forcing (member-forcing.ts), then the step (block-steppers.ts),
 * which also counts members above the lowest threshold and spots first crossings.
 */

/**
 * First pass, years [t0, t1), members [lo, hi): advance the state with forcing held constant
 * over each year (exact propagator) and add the end-of-year upper-layer temperature to the
 * member's baseline sum and constraint-window sum in the years that fall in those periods.
 * Only the states are needed, so forcing goes to a block-sized scratch array.
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
  const steppers = blockSteppers(plan);
  const forcing = forcingKernel(plan, pathwayIndex);
  const scratch = new Float64Array(MEMBER_BLOCK);
  const extremes = new Float64Array(2);
  for (let b = lo; b < hi; b += MEMBER_BLOCK) {
    const bh = Math.min(hi, b + MEMBER_BLOCK);
    for (let t = t0; t < t1; t++) {
      forcing(t, b, bh, scratch, b, extremes, 0);
      steppers.baseline(b, bh, scratch, inBaseline(t), inWindow(t));
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
 * Without an imbalance summary (plan.summaries) the imbalance is neither written nor tallied.
 */
export function advanceReportedBlock(plan: EnsemblePlan, pathwayIndex: number, t0: number, t1: number, block: number): void {
  const slots = plan.state.slots;
  const ring = slots.length;
  const lo = block * MEMBER_BLOCK;
  const hi = Math.min(plan.members, lo + MEMBER_BLOCK);
  const at = 6 * block;
  const countsAt = plan.thresholdsAscending.length * block;
  const withImbalance = plan.summaries.imbalance;
  const steppers = blockSteppers(plan);
  const forcing = forcingKernel(plan, pathwayIndex);
  for (let t = t0; t < t1; t++) {
    const slot = slots[t % ring]!;
    const extremes = slot.extremes;
    for (let k = 0; k < 6; k += 2) {
      extremes[at + k] = Infinity;
      extremes[at + k + 1] = -Infinity;
    }
    forcing(t, lo, hi, slot.forcing, 0, extremes, at);
    const cross = (m: number, a: number) => crossThresholds(plan, m, t, a);
    const above = steppers.reported(lo, hi, slot.forcing, slot.anomaly, withImbalance ? slot.imbalance : null, extremes, at, cross);
    countAboveOthers(plan, lo, hi, slot.anomaly, slot.aboveCounts, countsAt, above);
  }
}

/**
 * Counts of members above each ascending threshold: the step counted the lowest, the others
 * are counted over the block's anomalies, still in cache.
 */
function countAboveOthers(plan: EnsemblePlan, lo: number, hi: number, anomaly: Float64Array, aboveCounts: Float64Array, countsAt: number, lowest: number): void {
  const thresholds = plan.thresholdsAscending;
  if (thresholds.length === 0) return;
  aboveCounts[countsAt] = lowest;
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
