import type { EnsemblePlan, YearSlot } from "./ensemble-plan.js";
import { memberForcing } from "./member-forcing.js";
import type { PathwayForcing } from "./pathway-forcing.js";

/**
 * Members advanced together through a span of years (time blocking). A block's per-member
 * inputs (propagator, scales, state: about 20 arrays × 2,048 × 8 B ≈ 330 kB) stay in the
 * core's cache while it runs through several years, instead of streaming every array from
 * memory once per year. Members are independent, so the block size changes no number.
 */
export const MEMBER_BLOCK = 2048;

/*
 * The step loops below index the member records (member-records.ts) with literal offsets,
 * named in comments: constants imported from another module are reloaded and checked on
 * every access in V8's optimised loops, which measured about 25 % slower here.
 */

/**
 * First pass, years [t0, t1), members [lo, hi): advance the state with forcing held constant
 * over each year (exact propagator) and add the end-of-year upper-layer temperature to the
 * member's baseline sum and constraint-window sum in the years that fall in those periods.
 * Only the states are needed, so forcing goes to a block-sized scratch array.
 */
export function advanceBaselineYears(
  plan: EnsemblePlan,
  pathway: PathwayForcing,
  t0: number,
  t1: number,
  lo: number,
  hi: number,
  inBaseline: (t: number) => boolean,
  inWindow: (t: number) => boolean,
): void {
  const scratch = new Float64Array(MEMBER_BLOCK);
  const extremes = new Float64Array(2);
  for (let b = lo; b < hi; b += MEMBER_BLOCK) {
    const bh = Math.min(hi, b + MEMBER_BLOCK);
    for (let t = t0; t < t1; t++) {
      memberForcing(plan, pathway, t, b, bh, scratch, extremes, 0, b);
      stepBaselineBlock(plan, b, bh, scratch, inBaseline(t), inWindow(t));
    }
  }
}

function stepBaselineBlock(plan: EnsemblePlan, lo: number, hi: number, forcing: Float64Array, inBaseline: boolean, inWindow: boolean): void {
  const records = plan.state.records;
  const windowMean = plan.state.windowMean;
  for (let m = lo; m < hi; m++) {
    const o = m * 12 /* RECORD */;
    const x = records[o + 9 /* UPPER */]!;
    const y = records[o + 10 /* DEEP */]!;
    const f = forcing[m - lo]!;
    const next = records[o + 0 /* A11 */]! * x + records[o + 1 /* A12 */]! * y + records[o + 4 /* B1 */]! * f;
    records[o + 9 /* UPPER */] = next;
    records[o + 10 /* DEEP */] = records[o + 2 /* A21 */]! * x + records[o + 3 /* A22 */]! * y + records[o + 5 /* B2 */]! * f;
    if (inBaseline) records[o + 8 /* BASELINE */]! += next;
    if (inWindow) windowMean[m]! += next;
  }
}

/**
 * Reporting pass, years [t0, t1), members [lo, hi) with lo on a block boundary: block by
 * block, year t into slot t mod (number of slots).
 */
export function advanceReportedYears(plan: EnsemblePlan, pathway: PathwayForcing, t0: number, t1: number, lo: number, hi: number): void {
  for (let b = lo; b < hi; b += MEMBER_BLOCK) advanceReportedBlock(plan, pathway, t0, t1, b / MEMBER_BLOCK);
}

/**
 * Member block `block` (members block·MEMBER_BLOCK … at most MEMBER_BLOCK further) through
 * years [t0, t1). Each block writes its own tallies in each slot (extremes of forcing,
 * anomaly and imbalance; counts by thresholds passed), so whichever thread runs a block,
 * the summaries merge the same numbers: min, max and whole counts do not depend on order.
 */
export function advanceReportedBlock(plan: EnsemblePlan, pathway: PathwayForcing, t0: number, t1: number, block: number): void {
  const slots = plan.state.slots;
  const ring = slots.length;
  const lo = block * MEMBER_BLOCK;
  const hi = Math.min(plan.members, lo + MEMBER_BLOCK);
  const at = 6 * block;
  const levels = plan.thresholdsAscending.length + 1;
  const countsAt = levels * block;
  for (let t = t0; t < t1; t++) {
    const slot = slots[t % ring]!;
    const { extremes, aboveCounts } = slot;
    for (let k = 0; k < 6; k += 2) {
      extremes[at + k] = Infinity;
      extremes[at + k + 1] = -Infinity;
    }
    aboveCounts.fill(0, countsAt, countsAt + levels);
    memberForcing(plan, pathway, t, lo, hi, slot.forcing, extremes, at);
    stepReportedBlock(plan, t, lo, hi, at, countsAt, slot);
  }
}

/**
 * Reporting pass, year t, members [lo, hi): advance, then write each member's anomaly
 * (against its own baseline mean), total forcing and top-of-atmosphere imbalance
 * N = F − λT − (ε − 1)γ(T − T0) (Geoffroy et al. 2013b) into the year's slot, and record
 * first crossings: a member crosses a threshold in the first year whose anomaly exceeds it
 * (strictly). The record keeps the next threshold to cross, so one comparison per
 * member-year suffices. Also counts members by how many thresholds they are above.
 */
function stepReportedBlock(plan: EnsemblePlan, t: number, lo: number, hi: number, at: number, countsAt: number, slot: YearSlot): void {
  const records = plan.state.records;
  const crossing = plan.state.crossing;
  const thresholds = plan.thresholdsAscending;
  const thresholdCount = thresholds.length;
  const { anomaly, forcing, imbalance, extremes, aboveCounts } = slot;
  let minAnomaly = extremes[at + 2]!;
  let maxAnomaly = extremes[at + 3]!;
  let minImbalance = extremes[at + 4]!;
  let maxImbalance = extremes[at + 5]!;
  for (let m = lo; m < hi; m++) {
    const o = m * 12 /* RECORD */;
    const x = records[o + 9 /* UPPER */]!;
    const y = records[o + 10 /* DEEP */]!;
    const f = forcing[m]!;
    const next = records[o + 0 /* A11 */]! * x + records[o + 1 /* A12 */]! * y + records[o + 4 /* B1 */]! * f;
    const nextDeep = records[o + 2 /* A21 */]! * x + records[o + 3 /* A22 */]! * y + records[o + 5 /* B2 */]! * f;
    records[o + 9 /* UPPER */] = next;
    records[o + 10 /* DEEP */] = nextDeep;
    const a = next - records[o + 8 /* BASELINE */]!;
    anomaly[m] = a;
    const n = f - records[o + 6 /* LAMBDA */]! * next - records[o + 7 /* EXTRA_UPTAKE */]! * (next - nextDeep);
    imbalance[m] = n;
    if (a < minAnomaly) minAnomaly = a;
    if (a > maxAnomaly) maxAnomaly = a;
    if (n < minImbalance) minImbalance = n;
    if (n > maxImbalance) maxImbalance = n;
    if (a > records[o + 11 /* NEXT_THRESHOLD */]!) {
      let c = 0;
      while (thresholds[c]! < records[o + 11 /* NEXT_THRESHOLD */]!) c++;
      do crossing[c++]![m] = t;
      while (c < thresholdCount && a > thresholds[c]!);
      records[o + 11 /* NEXT_THRESHOLD */] = c < thresholdCount ? thresholds[c]! : Infinity;
    }
    let above = 0;
    while (above < thresholdCount && a > thresholds[above]!) above++;
    aboveCounts[countsAt + above]!++;
  }
  extremes[at + 2] = minAnomaly;
  extremes[at + 3] = maxAnomaly;
  extremes[at + 4] = minImbalance;
  extremes[at + 5] = maxImbalance;
}
