/** Baseline return periods the lens reports (years): the pricing and solvency tail points. */
export const BASELINE_RETURN_PERIODS = [100, 200] as const;

/**
 * Return period of an event after its frequency is multiplied by `multiplier`: T / m.
 * An event r times as likely has r times the annual frequency, so a 1-in-T event becomes
 * 1-in-(T/r) (a 1-in-100 event becomes about 1-in-(100/r)). Return periods here
 * are reciprocal annual exceedance frequencies; for T ≥ 100 years they equal reciprocal
 * annual probabilities to within 0.5 %. Cost O(1).
 *
 * Example: shiftedReturnPeriod(100, 2) → 50.
 */
export function shiftedReturnPeriod(returnPeriod: number, multiplier: number): number {
  if (!(Number.isFinite(returnPeriod) && returnPeriod > 0)) throw new RangeError("returnPeriod must be a finite number > 0");
  if (!(Number.isFinite(multiplier) && multiplier > 0)) throw new RangeError("multiplier must be a finite number > 0");
  return returnPeriod / multiplier;
}
