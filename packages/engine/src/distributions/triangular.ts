import { requireFinite } from "./checks.js";
import type { TriangularDistribution } from "./types.js";

/**
 * Checks finite min < max and min ≤ mode ≤ max. Example:
 * `validateTriangular({ type: "triangular", min: 1, mode: 5, max: 4 }, "c")` throws
 * RangeError("c.mode must lie between c.min and c.max").
 */
export function validateTriangular(d: TriangularDistribution, name: string): void {
  requireFinite(d.min, `${name}.min`);
  requireFinite(d.mode, `${name}.mode`);
  requireFinite(d.max, `${name}.max`);
  if (!(d.max > d.min)) throw new RangeError(`${name}.max must be > ${name}.min`);
  if (d.mode < d.min || d.mode > d.max) throw new RangeError(`${name}.mode must lie between ${name}.min and ${name}.max`);
}

/**
 * Triangular quantile (peak at mode) by inverting the piecewise-quadratic CDF: with
 * Fc = (mode − min)/(max − min), p < Fc → min + √(p·(max − min)·(mode − min)),
 * else max − √((1 − p)·(max − min)·(max − mode)). Cost O(1).
 * Reference: standard (e.g. Evans, Hastings & Peacock, Statistical Distributions, "Triangular").
 *
 * Example: `quantileTriangular({ type: "triangular", min: 0, mode: 1, max: 2 }, 0.125)` → 0.5.
 */
export function quantileTriangular(d: TriangularDistribution, p: number): number {
  const width = d.max - d.min;
  const lowerShare = (d.mode - d.min) / width;
  if (p < lowerShare) return d.min + Math.sqrt(p * width * (d.mode - d.min));
  return d.max - Math.sqrt((1 - p) * width * (d.max - d.mode));
}

/**
 * Triangular CDF: (x − min)²/((max − min)(mode − min)) up to the mode,
 * 1 − (max − x)²/((max − min)(max − mode)) after it. Cost O(1).
 * Example: `cdfTriangular({ type: "triangular", min: 0, mode: 1, max: 2 }, 1.5)` → 0.875.
 */
export function cdfTriangular(d: TriangularDistribution, x: number): number {
  if (x <= d.min) return 0;
  if (x >= d.max) return 1;
  const width = d.max - d.min;
  if (x <= d.mode) return ((x - d.min) * (x - d.min)) / (width * (d.mode - d.min));
  return 1 - ((d.max - x) * (d.max - x)) / (width * (d.max - d.mode));
}

/**
 * Triangular density, rising linearly to 2/(max − min) at the mode and falling to 0 at max.
 * Cost O(1). Example: `densityTriangular({ type: "triangular", min: 0, mode: 1, max: 2 }, 1)` → 1.
 */
export function densityTriangular(d: TriangularDistribution, x: number): number {
  if (x < d.min || x > d.max) return 0;
  const width = d.max - d.min;
  // At x = mode both branches give the peak 2/width; test the side that has width.
  if (x < d.mode || (x === d.mode && d.mode > d.min)) return (2 * (x - d.min)) / (width * (d.mode - d.min));
  return (2 * (d.max - x)) / (width * (d.max - d.mode));
}
