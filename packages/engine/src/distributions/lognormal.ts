import { requirePositive } from "./checks.js";
import { standardNormalCdf, standardNormalDensity, standardNormalQuantile } from "./normal.js";
import type { LognormalDistribution } from "./types.js";

/**
 * Lognormal law given by its median and the sd of ln X (logSd): ln X ~ N(ln median, logSd²).
 *
 * Quantile: median·exp(logSd·Φ⁻¹(p)); CDF: Φ(ln(x/median)/logSd); density φ(z)/(logSd·x).
 * Cost O(1) each. Reference: standard (CHECKS.md §7.2).
 *
 * Example: `quantileLognormal({ type: "lognormal", median: 3, logSd: 0.27853 }, 0.95)` → 4.7434 (4 d.p.).
 */
export function validateLognormal(d: LognormalDistribution, name: string): void {
  requirePositive(d.median, `${name}.median`);
  requirePositive(d.logSd, `${name}.logSd`);
}

export function quantileLognormal(d: LognormalDistribution, p: number): number {
  return d.median * Math.exp(d.logSd * standardNormalQuantile(p));
}

export function cdfLognormal(d: LognormalDistribution, x: number): number {
  if (x <= 0) return 0;
  return standardNormalCdf(Math.log(x / d.median) / d.logSd);
}

export function densityLognormal(d: LognormalDistribution, x: number): number {
  if (x <= 0) return 0;
  return standardNormalDensity(Math.log(x / d.median) / d.logSd) / (d.logSd * x);
}
