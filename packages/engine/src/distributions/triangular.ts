import { requireFinite } from "./checks.js";
import type { TriangularDistribution } from "./types.js";

/**
 * Triangular law on [min, max] with peak at mode.
 *
 * Quantile by inverting the piecewise-quadratic CDF: with Fc = (mode − min)/(max − min),
 * p < Fc → min + √(p·(max − min)·(mode − min)), else max − √((1 − p)·(max − min)·(max − mode)).
 * Cost O(1). Reference: standard (e.g. Evans, Hastings & Peacock, Statistical
 * Distributions, ch. "Triangular").
 *
 * Example: `quantileTriangular({ type: "triangular", min: 0, mode: 1, max: 2 }, 0.125)` → 0.5.
 */
export function validateTriangular(d: TriangularDistribution, name: string): void {
  requireFinite(d.min, `${name}.min`);
  requireFinite(d.mode, `${name}.mode`);
  requireFinite(d.max, `${name}.max`);
  if (!(d.max > d.min)) throw new RangeError(`${name}.max must be > ${name}.min`);
  if (d.mode < d.min || d.mode > d.max) throw new RangeError(`${name}.mode must lie between ${name}.min and ${name}.max`);
}

export function quantileTriangular(d: TriangularDistribution, p: number): number {
  const width = d.max - d.min;
  const lowerShare = (d.mode - d.min) / width;
  if (p < lowerShare) return d.min + Math.sqrt(p * width * (d.mode - d.min));
  return d.max - Math.sqrt((1 - p) * width * (d.max - d.mode));
}

export function cdfTriangular(d: TriangularDistribution, x: number): number {
  if (x <= d.min) return 0;
  if (x >= d.max) return 1;
  const width = d.max - d.min;
  if (x <= d.mode) return ((x - d.min) * (x - d.min)) / (width * (d.mode - d.min));
  return 1 - ((d.max - x) * (d.max - x)) / (width * (d.max - d.mode));
}

export function densityTriangular(d: TriangularDistribution, x: number): number {
  if (x < d.min || x > d.max) return 0;
  const width = d.max - d.min;
  // At x = mode both branches give the peak 2/width; test the side that has width.
  if (x < d.mode || (x === d.mode && d.mode > d.min)) return (2 * (x - d.min)) / (width * (d.mode - d.min));
  return (2 * (d.max - x)) / (width * (d.max - d.mode));
}
