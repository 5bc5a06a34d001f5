import { advanceBaselineYears } from "./advance-year.js";
import type { EnsemblePlan } from "./ensemble-plan.js";
import { BASELINE_SPAN_YEARS } from "./year-spans.js";

/**
 * The two passes over one pathway, for members [lo, hi). Anomalies are against each
 * member's own baseline-period mean, which is only known once the baseline period has been
 * simulated, so a first pass runs up to the later of the baseline end and the constraint
 * window end (the same two-pass scheme as bench-reference/w1-reference.c) and the reporting pass restarts
 * from the pathway's first year. Members are independent, so any split gives the same numbers.
 */
export function firstPassYears(plan: EnsemblePlan, pathwayIndex: number): number {
  const pathway = plan.pathways[pathwayIndex]!;
  const lastYear = Math.max(plan.baseline[1], plan.constraint ? plan.constraint.to : -Infinity);
  return lastYear - pathway.startYear + 1;
}

/**
 * Runs the first pass for members [lo, hi), leaving baseline and window mean anomalies.
 * onYear is called once per first-pass year, after each span of years (progress, cancel).
 */
export function runBaselinePass(
  plan: EnsemblePlan,
  pathwayIndex: number,
  lo: number,
  hi: number,
  onYear?: () => void,
): void {
  const pathway = plan.pathways[pathwayIndex]!;
  const { upper, deep, baselineMean, windowMean } = plan.state;
  upper.fill(0, lo, hi);
  deep.fill(0, lo, hi);
  baselineMean.fill(0, lo, hi);
  windowMean.fill(0, lo, hi);
  const [b0, b1] = plan.baseline;
  const c = plan.constraint;
  const years = firstPassYears(plan, pathwayIndex);
  const start = pathway.startYear;
  // Spans of years over all members, so progress (and cancellation) is seen every span.
  for (let t0 = 0; t0 < years; t0 += BASELINE_SPAN_YEARS) {
    const t1 = Math.min(years, t0 + BASELINE_SPAN_YEARS);
    advanceBaselineYears(
      plan,
      pathwayIndex,
      t0,
      t1,
      lo,
      hi,
      (t) => start + t >= b0 && start + t <= b1,
      (t) => c !== null && start + t >= c.from && start + t <= c.to,
    );
    if (onYear) for (let t = t0; t < t1; t++) onYear();
  }
  const baselineYears = b1 - b0 + 1;
  const windowYears = c ? c.to - c.from + 1 : 1;
  for (let m = lo; m < hi; m++) {
    const baseline = baselineMean[m]! / baselineYears;
    baselineMean[m] = baseline;
    windowMean[m] = c ? windowMean[m]! / windowYears - baseline : 0;
  }
}

/** Clears the state of members [lo, hi) for the reporting pass. */
export function resetForReporting(plan: EnsemblePlan, lo: number, hi: number): void {
  const { upper, deep, nextThreshold, crossing } = plan.state;
  upper.fill(0, lo, hi);
  deep.fill(0, lo, hi);
  nextThreshold.fill(plan.thresholdsAscending[0] ?? Infinity, lo, hi);
  for (const years of crossing) years.fill(-1, lo, hi);
}

/** Horizon indexes falling in each year of a pathway. */
export function horizonsByYear(plan: EnsemblePlan, pathwayIndex: number): number[][] {
  const pathway = plan.pathways[pathwayIndex]!;
  const byYear = Array.from({ length: pathway.years }, () => [] as number[]);
  plan.horizons.forEach((h, i) => byYear[h - pathway.startYear]?.push(i));
  return byYear;
}
