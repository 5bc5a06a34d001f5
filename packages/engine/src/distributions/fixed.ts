import { requireFinite } from "./checks.js";
import type { FixedDistribution } from "./types.js";

/**
 * Checks a fixed value is finite. Example: `validateFixed({ type: "fixed", value: NaN }, "f2x")`
 * throws RangeError("f2x.value must be a finite number").
 */
export function validateFixed(d: FixedDistribution, name: string): void {
  requireFinite(d.value, `${name}.value`);
}

/**
 * Quantile of a fixed value: the value itself for every p. Cost O(1).
 * Example: `quantileFixed({ type: "fixed", value: 3.93 }, 0.2)` → 3.93.
 */
export function quantileFixed(d: FixedDistribution, _p: number): number {
  return d.value;
}

/**
 * CDF of a point mass, right-continuous: 0 below the value, 1 at and above it. Cost O(1).
 * Example: `cdfFixed({ type: "fixed", value: 2 }, 2)` → 1.
 */
export function cdfFixed(d: FixedDistribution, x: number): number {
  return x < d.value ? 0 : 1;
}

/**
 * A point mass has no density: 0 everywhere (a NaN-free convention), and previews draw a
 * spike at the value instead of a curve. Cost O(1).
 * Example: `densityFixed({ type: "fixed", value: 2 }, 2)` → 0.
 */
export function densityFixed(_d: FixedDistribution, _x: number): number {
  return 0;
}
