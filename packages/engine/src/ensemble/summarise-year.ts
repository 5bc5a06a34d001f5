import { PercentileSelector } from "../summary/percentile-selector.js";
import type { EnsemblePlan, YearSlot } from "./ensemble-plan.js";
import { exceedanceRow, summaryRow } from "./yearly-layout.js";

interface PercentileTrack {
  year: number;
  values: Float64Array;
  earlierYear: number;
  earlier: Float64Array;
}

/**
 * Summarises one reported year from its slot: percentiles and mean of the anomaly, total
 * forcing and imbalance, and the probability of exceeding each threshold (weighted when a
 * constraint applies). Members are always visited in member order, so the numbers do not
 * depend on which thread summarises or how members were split for simulation. At horizon
 * years it also keeps each member's anomaly, forcing and committed warming.
 */
export class YearSummariser {
  private readonly selector = new PercentileSelector();
  private readonly out: Float64Array;
  /** Per quantity, the percentiles of the last two years this summariser did (guesses for the next). */
  private readonly recent: PercentileTrack[];
  private readonly guess: Float64Array;
  private readonly spread: Float64Array;

  constructor(private readonly plan: EnsemblePlan) {
    const p = plan.probs.length;
    this.out = new Float64Array(p);
    this.guess = new Float64Array(p);
    this.spread = new Float64Array(p);
    this.recent = Array.from({ length: 3 }, () => ({ year: -1, values: new Float64Array(p), earlierYear: -1, earlier: new Float64Array(p) }));
  }

  /**
   * weights: null when the ensemble is unweighted; totalWeight their sum in member order.
   * horizonIndexes: the horizons (indexes into plan.horizons) that fall in this year.
   */
  summarise(
    pathwayIndex: number,
    t: number,
    years: number,
    slot: YearSlot,
    weights: Float64Array | null,
    totalWeight: number,
    horizonIndexes: number[],
  ): void {
    const plan = this.plan;
    const percentiles = plan.probs.length;
    const yearly = plan.state.yearly;
    const n = plan.members;
    const exceed = weights ? this.temperatureSums(slot.anomaly, weights) : this.countsAbove(slot.aboveCounts);
    this.describe(0, t, years, slot.anomaly, slot.extremes, 2, weights, totalWeight);
    for (let i = 0; i < plan.thresholds.length; i++)
      yearly[exceedanceRow(i, percentiles) * years + t] = weights ? exceed[i]! / totalWeight : exceed[i]! / n;
    if (plan.summaries.forcing) this.describe(1, t, years, slot.forcing, slot.extremes, 0, weights, totalWeight);
    if (plan.summaries.imbalance) this.describe(2, t, years, slot.imbalance, slot.extremes, 4, weights, totalWeight);
    for (const h of horizonIndexes) this.keepHorizon(pathwayIndex, h, slot);
  }

  /** Members above each threshold (in spec order) from the step's per-block counts (ascending order). */
  private countsAbove(aboveCounts: Float64Array): number[] {
    const ascending = this.plan.thresholdsAscending;
    const count = ascending.length;
    const above = new Array<number>(count).fill(0);
    for (let block = 0; block < this.plan.blocks; block++) for (let i = 0; i < count; i++) above[i]! += aboveCounts[block * count + i]!;
    return this.plan.thresholds.map((th) => above[ascending.indexOf(th)]!);
  }

  /** Weighted (or plain) count of members above each threshold. */
  private temperatureSums(values: Float64Array, weights: Float64Array | null): number[] {
    const thresholds = this.plan.thresholds;
    const sums = new Array<number>(thresholds.length).fill(0);
    const n = this.plan.members;
    for (let i = 0; i < thresholds.length; i++) {
      const threshold = thresholds[i]!;
      let s = 0;
      if (weights) {
        // w·1 or w·0 added, not a branch: the same sum bit for bit (weights are finite and
        // non-negative, largest 1), ~40 % faster where members straddle the threshold.
        for (let m = 0; m < n; m++) s += weights[m]! * +(values[m]! > threshold);
      } else {
        for (let m = 0; m < n; m++) if (values[m]! > threshold) s++;
      }
      sums[i] = s;
    }
    return sums;
  }

  private describe(
    quantity: number,
    t: number,
    years: number,
    values: Float64Array,
    extremes: Float64Array,
    at: number,
    weights: Float64Array | null,
    totalWeight: number,
  ): void {
    const n = this.plan.members;
    let min = Infinity;
    let max = -Infinity;
    for (let block = 0; block < this.plan.blocks; block++) {
      min = Math.min(min, extremes[6 * block + at]!);
      max = Math.max(max, extremes[6 * block + at + 1]!);
    }
    const percentiles = this.plan.probs.length;
    const track = this.recent[quantity]!;
    if (track.year >= t) track.year = track.earlierYear = -1; // a new pathway: no guesses yet
    const sum =
      weights || track.year < 0
        ? this.selector.select(values, n, this.plan.probs, this.out, min, max, weights, totalWeight)
        : this.selectNearRecent(track, t, values, min, max);
    track.earlierYear = track.year;
    track.earlier.set(track.values);
    track.year = t;
    track.values.set(this.out);
    const yearly = this.plan.state.yearly;
    for (let j = 0; j < percentiles; j++) yearly[summaryRow(quantity, j, percentiles) * years + t] = this.out[j]!;
    // Mean in member order (the selector sums during its counting pass); a constant is its own mean.
    const mean = min === max ? min : weights ? sum / totalWeight : sum / n;
    yearly[summaryRow(quantity, percentiles, percentiles) * years + t] = mean;
  }

  /**
   * Unweighted percentiles with guesses: each percentile's path extrapolated linearly from
   * the last two years done, ± a quarter of the extrapolated step (plus the selector's own
   * margin of two buckets).
   * Exact whatever the guesses (PercentileSelector.selectNear); they only save a pass.
   */
  private selectNearRecent(track: PercentileTrack, t: number, values: Float64Array, min: number, max: number): number {
    const gap = t - track.year;
    for (let j = 0; j < this.guess.length; j++) {
      const last = track.values[j]!;
      const slope = track.earlierYear >= 0 ? (last - track.earlier[j]!) / (track.year - track.earlierYear) : 0;
      this.guess[j] = last + slope * gap;
      // A quarter of the extrapolated step: measured on W1, about 1 % of selections then
      // need the second pass while few members are copied.
      this.spread[j] = 0.25 * Math.abs(slope * gap);
    }
    return this.selector.selectNear(values, this.plan.members, this.plan.probs, this.out, min, max, this.guess, this.spread);
  }

  /** Committed warming: equilibrium F/λ minus the current warming, both from the pathway start. */
  private keepHorizon(pathwayIndex: number, h: number, slot: YearSlot): void {
    const { horizonTemperature, horizonForcing, horizonCommitted, baselineMean } = this.plan.state;
    const lambda = this.plan.climate.lambda; // the climate of the pathway being run
    const temperature = horizonTemperature[h]!;
    const forcing = horizonForcing[h]!;
    const committed = horizonCommitted[h]!;
    temperature.set(slot.anomaly);
    forcing.set(slot.forcing);
    for (let m = 0; m < this.plan.members; m++)
      committed[m] = slot.forcing[m]! / lambda[m]! - (slot.anomaly[m]! + baselineMean[m]!);
  }
}
