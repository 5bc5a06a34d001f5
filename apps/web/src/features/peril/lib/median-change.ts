/**
 * How far a projected median sits from today's figure, as the signed whole percentage an
 * actuary would quote: medianChange(1150, 1000) -> "+15 %", medianChange(950, 1000) -> "−5 %".
 * `null` when today's figure is missing or not positive (no meaningful ratio).
 */
export function medianChange(median: number | undefined, today: number | null | undefined): string | null {
  if (median === undefined || today === null || today === undefined || !(today > 0) || !Number.isFinite(median)) return null;
  const pct = Math.round((median / today - 1) * 100);
  if (pct === 0) return "±0 %";
  // A true minus sign (U+2212): a hyphen beside a percentage reads as a dash.
  return `${pct > 0 ? "+" : "\u2212"}${Math.abs(pct)} %`;
}
