import type { EnsemblePlan, YearSlot } from "./ensemble-plan.js";
import type { PathwayForcing } from "./pathway-forcing.js";

/**
 * Total forcing of members [lo, hi) in year t: Σ_k scale[m,k]·base[k,t], written to `out`.
 * Agents outer, members inner, so each pass is one multiply-add over contiguous arrays
 * (the layout of the C reference); fixed-scale agents come pre-summed in fixedTotal.
 */
export function memberForcing(plan: EnsemblePlan, pathway: PathwayForcing, t: number, lo: number, hi: number, out: Float64Array): void {
  const fixed = pathway.fixedTotal[t]!;
  for (let m = lo; m < hi; m++) out[m] = fixed;
  for (let k = 0; k < pathway.agents.length; k++) {
    const column = pathway.scaleInput[k]!;
    if (column < 0) continue;
    const b = pathway.base[k]![t]!;
    if (b === 0) continue;
    const scale = plan.columns[column]!;
    for (let m = lo; m < hi; m++) out[m] += scale[m]! * b;
  }
}

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
  inBaseline: boolean,
  inWindow: boolean,
): void {
  const { a11, a12, a21, a22, b1, b2 } = plan.climate;
  const { upper, deep, baselineMean, windowMean } = plan.state;
  const forcing = plan.state.slots[0]!.forcing;
  memberForcing(plan, pathway, t, lo, hi, forcing);
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
  slot: YearSlot,
): void {
  const { a11, a12, a21, a22, b1, b2, lambda, extraUptake } = plan.climate;
  const { upper, deep, baselineMean, crossing, crossedCount } = plan.state;
  const thresholds = plan.thresholdsAscending;
  const thresholdCount = thresholds.length;
  const { anomaly, forcing, imbalance } = slot;
  memberForcing(plan, pathway, t, lo, hi, forcing);
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
    imbalance[m] = f - lambda[m]! * next - extraUptake[m]! * (next - nextDeep);
    let c = crossedCount[m]!;
    if (c < thresholdCount && a > thresholds[c]!) {
      do crossing[c++]![m] = t;
      while (c < thresholdCount && a > thresholds[c]!);
      crossedCount[m] = c;
    }
  }
}
