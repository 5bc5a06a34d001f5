import { requireOpenProbability } from "./checks.js";
import { cdfFixed, densityFixed, quantileFixed } from "./fixed.js";
import { cdfLognormal, densityLognormal, quantileLognormal } from "./lognormal.js";
import { cdfNormal, densityNormal, quantileNormal } from "./normal.js";
import { cdfRange, densityRange, fitRange, quantileOfFit, quantileRange } from "./range.js";
import { cdfTriangular, densityTriangular, quantileTriangular } from "./triangular.js";
import { cdfTruncatedNormal, densityTruncatedNormal, quantileTruncatedNormal } from "./truncated-normal.js";
import type { Distribution } from "./types.js";
import { cdfUniform, densityUniform, quantileUniform } from "./uniform.js";
import type { RandomSource } from "../random/create-random.js";
import { validateDistribution } from "./validate-distribution.js";

/**
 * Inverse CDF of any distribution at p in (0, 1); a fixed distribution returns its value.
 *
 * Method: dispatch to the law's own quantile (see its file). Expects a distribution that
 * passed validateDistribution (checked once per input, not per draw). Cost O(1).
 *
 * Example: `quantileOf({ type: "uniform", min: 2, max: 4 }, 0.25)` → 2.5.
 */
export function quantileOf(d: Distribution, p: number): number {
  requireOpenProbability(p);
  switch (d.type) {
    case "fixed":
      return quantileFixed(d, p);
    case "normal":
      return quantileNormal(d, p);
    case "lognormal":
      return quantileLognormal(d, p);
    case "uniform":
      return quantileUniform(d, p);
    case "triangular":
      return quantileTriangular(d, p);
    case "truncated-normal":
      return quantileTruncatedNormal(d, p);
    case "range":
      return quantileRange(d, p);
  }
}

/**
 * Inverse CDF applied to a whole column of probabilities (e.g. one Latin-hypercube column),
 * validating the distribution once and fitting a range once. Writes into `out` when given.
 * Cost O(n), no per-element allocation.
 *
 * Example: `quantilesOf({ type: "uniform", min: 0, max: 10 }, [0.1, 0.5], "x")` → Float64Array [1, 5].
 */
export function quantilesOf(
  d: Distribution,
  probabilities: ArrayLike<number>,
  name: string,
  out: Float64Array = new Float64Array(probabilities.length),
): Float64Array {
  validateDistribution(d, name);
  if (out.length !== probabilities.length) throw new RangeError("out must have as many entries as probabilities");
  const fit = d.type === "range" ? fitRange(d) : null;
  for (let i = 0; i < probabilities.length; i++) {
    const p = probabilities[i]!;
    if (!(p > 0 && p < 1)) throw new RangeError(`probabilities[${i}] must be in (0, 1)`);
    out[i] = fit === null ? quantileOf(d, p) : quantileOfFit(fit, p);
  }
  return out;
}

/**
 * CDF of any distribution at x (a fixed value steps from 0 to 1 at the value). Cost O(1).
 *
 * Example: `cdfOf({ type: "normal", mean: 3, sd: 0.5 }, 3)` → 0.5.
 */
export function cdfOf(d: Distribution, x: number): number {
  if (typeof x !== "number" || Number.isNaN(x)) throw new RangeError("x must be a number");
  switch (d.type) {
    case "fixed":
      return cdfFixed(d, x);
    case "normal":
      return cdfNormal(d, x);
    case "lognormal":
      return cdfLognormal(d, x);
    case "uniform":
      return cdfUniform(d, x);
    case "triangular":
      return cdfTriangular(d, x);
    case "truncated-normal":
      return cdfTruncatedNormal(d, x);
    case "range":
      return cdfRange(d, x);
  }
}

/**
 * Density of any distribution at x. A fixed value has no density: 0 is returned everywhere
 * and previews draw a spike at the value instead. Cost O(1).
 *
 * Example: `densityOf({ type: "uniform", min: 2, max: 4 }, 3)` → 0.5.
 */
export function densityOf(d: Distribution, x: number): number {
  if (typeof x !== "number" || Number.isNaN(x)) throw new RangeError("x must be a number");
  switch (d.type) {
    case "fixed":
      return densityFixed(d, x);
    case "normal":
      return densityNormal(d, x);
    case "lognormal":
      return densityLognormal(d, x);
    case "uniform":
      return densityUniform(d, x);
    case "triangular":
      return densityTriangular(d, x);
    case "truncated-normal":
      return densityTruncatedNormal(d, x);
    case "range":
      return densityRange(d, x);
  }
}

/**
 * One draw by inverse-CDF sampling: quantileOf(d, random()). Cost: one uniform draw plus
 * one quantile. Reference: standard inverse transform method.
 *
 * Example: `sampleOf({ type: "fixed", value: 3.93 }, createRandom("s"))` → 3.93.
 */
export function sampleOf(d: Distribution, random: RandomSource): number {
  return quantileOf(d, random());
}
