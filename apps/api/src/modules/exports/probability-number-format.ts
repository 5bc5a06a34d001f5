/**
 * The Excel number format of one probability cell (0–1), so a chance reads as a percentage
 * that never rounds a possibility away and never prints in scientific notation: a weighted
 * exceedance of 5e-109 shows "< 0.1%", not "0.0%" (which says it cannot happen) nor 5E-109;
 * 0.99996 shows "> 99.9%", not "100.0%". Only an exact 0 or 1 shows 0.0% or 100.0%. The cell
 * keeps the full value; the CSV carries it in full precision too.
 */
export const PROBABILITY_FORMAT = "0.0%";

export function probabilityNumberFormat(value: number): string {
  // "0.0%" rounds below 0.05 % to 0.0 % and from 99.95 % up to 100.0 %.
  if (value > 0 && value < 0.0005) return '"< 0.1%"';
  if (value < 1 && value >= 0.9995) return '"> 99.9%"';
  return PROBABILITY_FORMAT;
}
