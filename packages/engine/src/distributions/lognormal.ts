import { requirePositive } from "./checks.js";
import { standardNormalCdf, standardNormalDensity, standardNormalQuantile } from "./normal.js";
import type { LognormalDistribution } from "./types.js";

/*
 * Lognormal law given by its median and the sd of ln X (logSd): ln X ~ N(ln median, logSd²).
 * Reference: standard (e.g. Johnson, Kotz & Balakrishnan, Continuous Univariate Distributions,
 * vol. 1, 2nd ed., ch. 14).
 */

/**
 * Checks median > 0 and logSd > 0. Example: `validateLognormal({ type: "lognormal", median: 3, logSd: 0 }, "ecs")`
 * throws RangeError("ecs.logSd must be > 0").
 */
export function validateLognormal(d: LognormalDistribution, name: string): void {
  requirePositive(d.median, `${name}.median`);
  requirePositive(d.logSd, `${name}.logSd`);
}

/**
 * Lognormal quantile median·exp(logSd·Φ⁻¹(p)) (AS241 for Φ⁻¹). Cost O(1).
 * Example: `quantileLognormal({ type: "lognormal", median: 3, logSd: 0.27853 }, 0.95)` → 4.7434
 * (4 d.p.; 3·exp(0.27853·1.6448536), computed).
 */
export function quantileLognormal(d: LognormalDistribution, p: number): number {
  return d.median * Math.exp(d.logSd * standardNormalQuantile(p));
}

/**
 * Lognormal CDF Φ(ln(x/median)/logSd), 0 for x ≤ 0. Cost O(1).
 * Example: `cdfLognormal({ type: "lognormal", median: 3, logSd: 0.3 }, 3)` → 0.5.
 */
export function cdfLognormal(d: LognormalDistribution, x: number): number {
  if (x <= 0) return 0;
  return standardNormalCdf(Math.log(x / d.median) / d.logSd);
}

/**
 * Lognormal density φ(z)/(logSd·x) with z = ln(x/median)/logSd, 0 for x ≤ 0. Cost O(1).
 * Example: `densityLognormal({ type: "lognormal", median: 1, logSd: 1 }, 1)` → 0.3989422804014327.
 */
export function densityLognormal(d: LognormalDistribution, x: number): number {
  if (x <= 0) return 0;
  return standardNormalDensity(Math.log(x / d.median) / d.logSd) / (d.logSd * x);
}
