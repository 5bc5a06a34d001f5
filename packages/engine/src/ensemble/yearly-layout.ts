/**
 * Where each per-year summary sits in the flat `yearly` array of a pathway, so threads can
 * write summaries of different years into one shared block. Quantities: 0 temperature
 * anomaly, 1 total forcing, 2 imbalance; per quantity one row per percentile then the mean;
 * then one row per threshold for the exceedance probability.
 */
export const QUANTITIES = ["temperature", "forcing", "imbalance"] as const;

export function yearlyLength(percentiles: number, thresholds: number, years: number): number {
  return (QUANTITIES.length * (percentiles + 1) + thresholds) * years;
}

export function summaryRow(quantity: number, statistic: number, percentiles: number): number {
  return quantity * (percentiles + 1) + statistic;
}

export function exceedanceRow(threshold: number, percentiles: number): number {
  return QUANTITIES.length * (percentiles + 1) + threshold;
}
