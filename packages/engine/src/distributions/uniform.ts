import { requireFinite } from "./checks.js";
import type { UniformDistribution } from "./types.js";

/**
 * Continuous uniform law on [min, max].
 *
 * Quantile min + p·(max − min); CDF (x − min)/(max − min) clipped to [0, 1]; density
 * 1/(max − min) inside. Cost O(1).
 *
 * Example: `quantileUniform({ type: "uniform", min: 2, max: 4 }, 0.25)` → 2.5.
 */
export function validateUniform(d: UniformDistribution, name: string): void {
  requireFinite(d.min, `${name}.min`);
  requireFinite(d.max, `${name}.max`);
  if (!(d.max > d.min)) throw new RangeError(`${name}.max must be > ${name}.min`);
}

export function quantileUniform(d: UniformDistribution, p: number): number {
  return d.min + p * (d.max - d.min);
}

export function cdfUniform(d: UniformDistribution, x: number): number {
  if (x <= d.min) return 0;
  if (x >= d.max) return 1;
  return (x - d.min) / (d.max - d.min);
}

export function densityUniform(d: UniformDistribution, x: number): number {
  return x >= d.min && x <= d.max ? 1 / (d.max - d.min) : 0;
}
