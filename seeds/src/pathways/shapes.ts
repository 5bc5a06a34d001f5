/**
 * Smooth curves used to shape the invented demo pathways. All are 0 at the start and 1 at
 * the end of their span, so a series can be pinned to a published value at a given year.
 */

/** Accelerating growth (exponential with e-folding time `tau` years), 0 at `from`, 1 at `to`. */
export function acceleratingRise(year: number, from: number, to: number, tau: number): number {
  if (year <= from) return 0;
  return Math.expm1((year - from) / tau) / Math.expm1((to - from) / tau);
}

/** Logistic growth centred on `mid` with width `width`, rescaled to 0 at `from` and 1 at `to`. */
export function logisticRise(year: number, from: number, to: number, mid: number, width: number): number {
  const f = (y: number) => 1 / (1 + Math.exp(-(y - mid) / width));
  if (year <= from) return 0;
  return (f(year) - f(from)) / (f(to) - f(from));
}

/** Smoothstep 0 -> 1 between `from` and `to` (zero slope at both ends), flat outside. */
export function easeInOut(year: number, from: number, to: number): number {
  if (year <= from) return 0;
  if (year >= to) return 1;
  const x = (year - from) / (to - from);
  return x * x * (3 - 2 * x);
}

/** Whole years from `start` to `end` inclusive. */
export function yearsBetween(start: number, end: number): number[] {
  return Array.from({ length: end - start + 1 }, (_, i) => start + i);
}

/** Rounds to `digits` decimals so the stored series (and its checksum) are stable and readable. */
export function round(value: number, digits = 4): number {
  const f = 10 ** digits;
  return Math.round(value * f) / f;
}
