import { allEqual, lossReturnPeriodAfterScaling, multiplierAtReturnPeriod, type BeyondReturnPeriods } from "./return-period-multiplier.js";
import type { PerilMetric, PortfolioRow } from "./types.js";

/** Baseline tail points of a portfolio row: the 1-in-100 and 1-in-200 losses. */
export type TailLosses = Pick<PortfolioRow, "loss100" | "loss200">;

/**
 * Baseline loss at any return period T (years), from the two tail points a portfolio row
 * gives: a straight line through (ln 100, loss100) and (ln 200, loss200), the same slope
 * beyond them both ways, never below 0:
 *   L(T) = max(0, loss100 + (loss200 − loss100) · log2(T / 100)).
 * Log-linear in return period is the usual way to read between points of an exceedance
 * curve plotted on a log return-period axis; it is a stated assumption, not a fit.
 * Cost O(1).
 *
 * Example: lossAtReturnPeriod({ loss100: 300, loss200: 420 }, 400) → 540.
 */
export function lossAtReturnPeriod(tail: TailLosses, returnPeriod: number): number {
  if (!(Number.isFinite(returnPeriod) && returnPeriod > 0)) throw new RangeError("returnPeriod must be a finite number > 0");
  return Math.max(0, tail.loss100 + (tail.loss200 - tail.loss100) * Math.log2(returnPeriod / 100));
}

export interface ProjectedFigures {
  aal: number;
  loss100: number;
  loss200: number;
}

/**
 * A portfolio row's figures after scaling by one multiplier m.
 * * severity: every loss scales by m — AAL·m, loss100·m, loss200·m.
 * * frequency: every event is m times as frequent with the same loss, so AAL·m (exact for
 *   a Poisson event set) and each loss level's exceedance frequency is multiplied by m:
 *   the loss at return period T afterwards is the baseline loss at return period T·m
 *   (lossAtReturnPeriod). With m = 2 the new 1-in-100 loss is the old 1-in-200 loss.
 * Non-decreasing in m for both metrics. Cost O(1).
 *
 * Example: projectRow({ aal: 12, loss100: 300, loss200: 420 }, "frequency", 2) → { aal: 24, loss100: 420, loss200: 540 }.
 */
export function projectRow(
  row: Pick<PortfolioRow, "aal" | "loss100" | "loss200">,
  metric: PerilMetric,
  multiplier: number,
): ProjectedFigures {
  if (!(Number.isFinite(multiplier) && multiplier > 0)) throw new RangeError("multiplier must be a finite number > 0");
  if (metric === "severity")
    return { aal: row.aal * multiplier, loss100: row.loss100 * multiplier, loss200: row.loss200 * multiplier };
  if (metric !== "frequency") throw new RangeError('metric must be "frequency" or "severity"');
  return {
    aal: row.aal * multiplier,
    loss100: lossAtReturnPeriod(row, 100 * multiplier),
    loss200: lossAtReturnPeriod(row, 200 * multiplier),
  };
}

/** Multipliers of one member at one warming level, by event return period (tables ascending). */
export interface ReturnPeriodMultipliers {
  returnPeriods: readonly number[];
  multipliers: ArrayLike<number>;
  beyond: BeyondReturnPeriods;
}

/**
 * A portfolio row's figures when the multiplier depends on the event's return period (a table
 * profile with tables for several return periods); m(T) is read by multiplierAtReturnPeriod.
 * * AAL scales by the multiplier of the most frequent table (frequent events make most of an
 *   average annual loss), for both metrics.
 * * severity: the 1-in-100 and 1-in-200 losses scale by m(100) and m(200).
 * * frequency: the loss at return period T afterwards is the baseline loss at the return period
 *   lossReturnPeriodAfterScaling gives (the smallest t with t / m(t) ≥ T).
 * With one multiplier for every return period this is projectRow, bit for bit. Cost O(tables).
 *
 * Example: tables [10, 50] with multipliers [2, 2] → the same figures as projectRow(row, metric, 2).
 */
export function projectRowAcrossReturnPeriods(
  row: Pick<PortfolioRow, "aal" | "loss100" | "loss200">,
  metric: PerilMetric,
  curve: ReturnPeriodMultipliers,
): ProjectedFigures {
  const multipliers = curve.multipliers;
  if (multipliers.length !== curve.returnPeriods.length || multipliers.length === 0)
    throw new RangeError("multipliers must hold one value per return period");
  for (let k = 0; k < multipliers.length; k++)
    if (!(Number.isFinite(multipliers[k]) && multipliers[k]! > 0)) throw new RangeError(`multipliers[${k}] must be a finite number > 0`);
  if (allEqual(multipliers)) return projectRow(row, metric, multipliers[0]!);
  const aal = row.aal * multipliers[0]!;
  if (metric === "severity")
    return {
      aal,
      loss100: row.loss100 * multiplierAtReturnPeriod(curve.returnPeriods, multipliers, curve.beyond, 100),
      loss200: row.loss200 * multiplierAtReturnPeriod(curve.returnPeriods, multipliers, curve.beyond, 200),
    };
  if (metric !== "frequency") throw new RangeError('metric must be "frequency" or "severity"');
  return {
    aal,
    loss100: lossAtReturnPeriod(row, lossReturnPeriodAfterScaling(curve.returnPeriods, multipliers, curve.beyond, 100)),
    loss200: lossAtReturnPeriod(row, lossReturnPeriodAfterScaling(curve.returnPeriods, multipliers, curve.beyond, 200)),
  };
}
