import { ranks } from "../statistics/index.js";

/**
 * Ranks of a column (ties share their average rank), as Spearman's coefficient needs them.
 * Computed once per column and reused for every horizon, so the sensitivity budget costs
 * one sort per input and per horizon rather than one per pair.
 */
export function rankColumn(values: Float64Array): Float64Array {
  return Float64Array.from(ranks(values));
}

/**
 * Spearman's rank correlation from precomputed ranks: Pearson's correlation of the ranks
 * (Spearman 1904). Returns 0 when either column is constant (no association can be measured),
 * so the budget never holds NaN. Cost O(n).
 */
export function correlationOfRanks(x: Float64Array, y: Float64Array): number {
  const n = x.length;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += x[i]!;
    my += y[i]!;
  }
  mx /= n;
  my /= n;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = x[i]! - mx;
    const dy = y[i]! - my;
    sxy += dx * dy;
    sxx += dx * dx;
    syy += dy * dy;
  }
  if (!(sxx > 0) || !(syy > 0)) return 0;
  return Math.max(-1, Math.min(1, sxy / Math.sqrt(sxx * syy)));
}
