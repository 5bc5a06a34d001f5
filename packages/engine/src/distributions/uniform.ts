import { requireFinite } from "./checks.js";
import type { UniformDistribution } from "./types.js";

/**
 * Checks finite min < max. Example: `validateUniform({ type: "uniform", min: 4, max: 2 }, "c")`
 * throws RangeError("c.max must be > c.min").
 */
export function validateUniform(d: UniformDistribution, name: string): void {
  requireFinite(d.min, `${name}.min`);
  requireFinite(d.max, `${name}.max`);
  if (!(d.max > d.min)) throw new RangeError(`${name}.max must be > ${name}.min`);
}

/**
 * Uniform quantile min + p·(max − min). Cost O(1). Reference: standard.
 * Example: `quantileUniform({ type: "uniform", min: 2, max: 4 }, 0.25)` → 2.5.
 */
export function quantileUniform(d: UniformDistribution, p: number): number {
  return d.min + p * (d.max - d.min);
}

/**
 * Uniform CDF (x − min)/(max − min), clipped to [0, 1]. Cost O(1).
 * Example: `cdfUniform({ type: "uniform", min: 2, max: 4 }, 3.5)` → 0.75.
 */
export function cdfUniform(d: UniformDistribution, x: number): number {
  if (x <= d.min) return 0;
  if (x >= d.max) return 1;
  return (x - d.min) / (d.max - d.min);
}

/**
 * Uniform density 1/(max − min) on [min, max], 0 outside. Cost O(1).
 * Example: `densityUniform({ type: "uniform", min: 2, max: 4 }, 3)` → 0.5.
 */
export function densityUniform(d: UniformDistribution, x: number): number {
  return x >= d.min && x <= d.max ? 1 / (d.max - d.min) : 0;
}
