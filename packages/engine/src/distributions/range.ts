import { requireFinite } from "./checks.js";
import { standardNormalCdf, standardNormalDensity, standardNormalQuantile } from "./normal.js";
import type { RangeDistribution } from "./types.js";

/**
 * A published range fitted as a two-piece law. Each half carries probability 1/2 and has its
 * own spread, so the median and both published ends are reproduced exactly:
 * * "lognormal" is a TWO-PIECE (split) LOGNORMAL, not a lognormal: ln X − mu is
 *   N(0, sigmaLow²) below the median and N(0, sigmaHigh²) above (one lognormal cannot match a
 *   median and two ends that are not log-symmetric);
 * * "split-normal" is a two-piece (split) normal: X − mode is N(0, sdLow²) below and
 *   N(0, sdHigh²) above.
 * Note: this median-preserving two-piece form has mode = median = p50 and a density that
 * jumps at the median when the range is asymmetric. It is not John's (1982) continuous
 * split normal, whose median differs from its mode and would miss the published p50.
 */
export type RangeFit =
  | { kind: "lognormal"; mu: number; sigmaLow: number; sigmaHigh: number }
  | { kind: "split-normal"; mode: number; sdLow: number; sdHigh: number };

/** Φ⁻¹(0.95) and Φ⁻¹(0.83): half-widths of the 5–95 % and 17–83 % ranges in sd units. */
const Z_COVERAGE_90 = standardNormalQuantile(0.95);
const Z_COVERAGE_66 = standardNormalQuantile(0.83);

/**
 * Checks a range: finite p50, low, high with low < p50 < high, coverage 90 or 66, a known
 * shape, and low > 0 for the lognormal shape. Throws RangeError naming the field.
 *
 * Example: `validateRange({ type: "range", p50: 3, low: 3.5, high: 5, coverage: 90, shape: "lognormal" }, "ecs")`
 * throws "ecs.low must be < ecs.p50".
 */
export function validateRange(d: RangeDistribution, name: string): void {
  requireFinite(d.p50, `${name}.p50`);
  requireFinite(d.low, `${name}.low`);
  requireFinite(d.high, `${name}.high`);
  if (!(d.low < d.p50)) throw new RangeError(`${name}.low must be < ${name}.p50`);
  if (!(d.high > d.p50)) throw new RangeError(`${name}.high must be > ${name}.p50`);
  if (d.coverage !== 90 && d.coverage !== 66) throw new RangeError(`${name}.coverage must be 90 or 66`);
  if (d.shape !== "lognormal" && d.shape !== "split-normal")
    throw new RangeError(`${name}.shape must be "lognormal" or "split-normal"`);
  if (d.shape === "lognormal" && !(d.low > 0)) throw new RangeError(`${name}.low must be > 0 for a lognormal shape`);
}

/**
 * Fits a published range (median p50 with a 5–95 % or 17–83 % range) as a two-piece law: a
 * two-piece (split) lognormal for shape "lognormal", a two-piece (split) normal for "split-normal".
 *
 * Method: z = Φ⁻¹(0.95) for coverage 90, Φ⁻¹(0.83) for coverage 66. Lognormal:
 * mu = ln p50, sigmaLow = ln(p50/low)/z, sigmaHigh = ln(high/p50)/z (the standard
 * one-sided σs of a lognormal fitted to a median and one end; taking both keeps both ends). Split-normal: mode = p50,
 * sdLow = (p50 − low)/z, sdHigh = (high − p50)/z. Cost O(1).
 * Reference: standard lognormal quantiles q_p = exp(μ + σ·z_p); two-piece construction as above.
 *
 * Example: `fitRange({ type: "range", p50: 3, low: 2, high: 5, coverage: 90, shape: "lognormal" })`
 * → { kind: "lognormal", mu: 1.0986…, sigmaLow: 0.24651…, sigmaHigh: 0.31056… }.
 */
export function fitRange(d: RangeDistribution): RangeFit {
  validateRange(d, "range");
  const z = d.coverage === 90 ? Z_COVERAGE_90 : Z_COVERAGE_66;
  if (d.shape === "lognormal") {
    return { kind: "lognormal", mu: Math.log(d.p50), sigmaLow: Math.log(d.p50 / d.low) / z, sigmaHigh: Math.log(d.high / d.p50) / z };
  }
  return { kind: "split-normal", mode: d.p50, sdLow: (d.p50 - d.low) / z, sdHigh: (d.high - d.p50) / z };
}

/**
 * Quantile of a fitted range: with z = Φ⁻¹(p) and the spread of the half z falls in,
 * exp(mu + σ·z) (lognormal) or mode + sd·z (split-normal). Exact at 5/50/95 % (or 17/50/83 %).
 * Cost O(1).
 *
 * Example: p50 3, low 2, high 5, coverage 90, lognormal: `quantileRange(d, 0.95)` → 5 (to 1e-15).
 */
export function quantileRange(d: RangeDistribution, p: number): number {
  return quantileOfFit(fitRange(d), p);
}

/**
 * Quantile of an already fitted range (fitRange once, then many draws). Cost O(1).
 * Example: `quantileOfFit({ kind: "split-normal", mode: 3, sdLow: 0.5, sdHigh: 1 }, 0.5)` → 3.
 */
export function quantileOfFit(fit: RangeFit, p: number): number {
  const z = standardNormalQuantile(p);
  if (fit.kind === "lognormal") return Math.exp(fit.mu + (z < 0 ? fit.sigmaLow : fit.sigmaHigh) * z);
  return fit.mode + (z < 0 ? fit.sdLow : fit.sdHigh) * z;
}

/** CDF of a fitted range: Φ of the standardised distance from the median on its own side. */
export function cdfRange(d: RangeDistribution, x: number): number {
  const fit = fitRange(d);
  if (fit.kind === "lognormal") {
    if (x <= 0) return 0;
    const t = Math.log(x) - fit.mu;
    return standardNormalCdf(t / (t < 0 ? fit.sigmaLow : fit.sigmaHigh));
  }
  const t = x - fit.mode;
  return standardNormalCdf(t / (t < 0 ? fit.sdLow : fit.sdHigh));
}

/**
 * Density of a fitted range; at the median itself the upper half's value is returned (the
 * two halves meet there with different heights when the range is asymmetric).
 */
export function densityRange(d: RangeDistribution, x: number): number {
  const fit = fitRange(d);
  if (fit.kind === "lognormal") {
    if (x <= 0) return 0;
    const t = Math.log(x) - fit.mu;
    const sigma = t < 0 ? fit.sigmaLow : fit.sigmaHigh;
    return standardNormalDensity(t / sigma) / (sigma * x);
  }
  const t = x - fit.mode;
  const sd = t < 0 ? fit.sdLow : fit.sdHigh;
  return standardNormalDensity(t / sd) / sd;
}
