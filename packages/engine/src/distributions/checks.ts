/*
 * Shared argument checks for the distribution files: each throws a RangeError whose message
 * names the offending parameter (the engine's one error policy).
 */

/** Finite number, else RangeError("<name> must be a finite number"). */
export function requireFinite(value: number, name: string): void {
  if (typeof value !== "number" || !Number.isFinite(value)) throw new RangeError(`${name} must be a finite number`);
}

/** Finite and > 0, else RangeError("<name> must be > 0"). */
export function requirePositive(value: number, name: string): void {
  requireFinite(value, name);
  if (!(value > 0)) throw new RangeError(`${name} must be > 0`);
}

/** p must lie strictly inside (0, 1): the quantile of 0 or 1 is ±Infinity for unbounded laws. */
export function requireOpenProbability(p: number, name = "p"): void {
  if (typeof p !== "number" || !(p > 0 && p < 1)) throw new RangeError(`${name} must be in (0, 1)`);
}
