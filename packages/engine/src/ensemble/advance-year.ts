import type { EnsemblePlan, YearSlot } from "./ensemble-plan.js";
import { memberForcing } from "./member-forcing.js";
import type { PathwayForcing } from "./pathway-forcing.js";

/**
 * First pass, year t, members [lo, hi): advance the state with forcing held constant over
 * the year (exact propagator) and add the end-of-year upper-layer temperature to the
 * member's baseline sum and constraint-window sum when t falls in those periods.
 */
export function advanceBaselineYear(
  plan: EnsemblePlan,
  pathway: PathwayForcing,
  t: number,
  lo: number,
  hi: number,
  chunk: number,
  inBaseline: boolean,
  inWindow: boolean,
): void {
  const { a11, a12, a21, a22, b1, b2 } = plan.climate;
  const { upper, deep, baselineMean, windowMean } = plan.state;
  const slot = plan.state.slots[0]!;
  const forcing = slot.forcing;
  memberForcing(plan, pathway, t, lo, hi, forcing, slot.extremes, 6 * chunk);
  for (let m = lo; m < hi; m++) {
    const x = upper[m]!;
    const y = deep[m]!;
    const f = forcing[m]!;
    const next = a11[m]! * x + a12[m]! * y + b1[m]! * f;
    upper[m] = next;
    deep[m] = a21[m]! * x + a22[m]! * y + b2[m]! * f;
    if (inBaseline) baselineMean[m]! += next;
    if (inWindow) windowMean[m]! += next;
  }
}

/**
 * Reporting pass, year t, members [lo, hi): advance, then write each member's anomaly
 * (against its own baseline mean), total forcing and top-of-atmosphere imbalance
 * N = F − λT − (ε − 1)γ(T − T0) (Geoffroy et al. 2013b) into the year's slot, and record
 * first crossings: a member crosses a threshold in the first year whose anomaly exceeds it
 * (strictly). Thresholds are ascending, so one comparison per member-year suffices.
 */
export function advanceReportedYear(
  plan: EnsemblePlan,
  pathway: PathwayForcing,
  t: number,
  lo: number,
  hi: number,
  chunk: number,
  slot: YearSlot,
): void {
  const { a11, a12, a21, a22, b1, b2, lambda, extraUptake } = plan.climate;
  const { upper, deep, baselineMean, crossing, crossedCount } = plan.state;
  const thresholds = plan.thresholdsAscending;
  const thresholdCount = thresholds.length;
  const { anomaly, forcing, imbalance, extremes } = slot;
  const at = 6 * chunk;
  memberForcing(plan, pathway, t, lo, hi, forcing, extremes, at);
  let minAnomaly = Infinity;
  let maxAnomaly = -Infinity;
  let minImbalance = Infinity;
  let maxImbalance = -Infinity;
  for (let m = lo; m < hi; m++) {
    const x = upper[m]!;
    const y = deep[m]!;
    const f = forcing[m]!;
    const next = a11[m]! * x + a12[m]! * y + b1[m]! * f;
    const nextDeep = a21[m]! * x + a22[m]! * y + b2[m]! * f;
    upper[m] = next;
    deep[m] = nextDeep;
    const a = next - baselineMean[m]!;
    anomaly[m] = a;
    const n = f - lambda[m]! * next - extraUptake[m]! * (next - nextDeep);
    imbalance[m] = n;
    if (a < minAnomaly) minAnomaly = a;
    if (a > maxAnomaly) maxAnomaly = a;
    if (n < minImbalance) minImbalance = n;
    if (n > maxImbalance) maxImbalance = n;
    let c = crossedCount[m]!;
    if (c < thresholdCount && a > thresholds[c]!) {
      do crossing[c++]![m] = t;
      while (c < thresholdCount && a > thresholds[c]!);
      crossedCount[m] = c;
    }
  }
  extremes[at + 2] = minAnomaly;
  extremes[at + 3] = maxAnomaly;
  extremes[at + 4] = minImbalance;
  extremes[at + 5] = maxImbalance;
}
