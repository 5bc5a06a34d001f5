import { requireFinite } from "./checks.js";
import type { FixedDistribution } from "./types.js";

/**
 * A fixed value: every quantile is the value, the CDF steps from 0 to 1 at it.
 * A point mass has no density; densityFixed returns 0 everywhere so previews can draw a
 * spike at the value instead of a curve (a NaN-free convention).
 *
 * Example: `quantileFixed({ type: "fixed", value: 3.93 }, 0.2)` → 3.93.
 */
export function validateFixed(d: FixedDistribution, name: string): void {
  requireFinite(d.value, `${name}.value`);
}

export function quantileFixed(d: FixedDistribution, _p: number): number {
  return d.value;
}

/** Right-continuous step: 0 below the value, 1 at and above it. */
export function cdfFixed(d: FixedDistribution, x: number): number {
  return x < d.value ? 0 : 1;
}

export function densityFixed(_d: FixedDistribution, _x: number): number {
  return 0;
}
