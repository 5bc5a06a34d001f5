import type { Distribution } from "@plumeline/contracts";
import { standardNormalCdf, standardNormalDensity, standardNormalQuantile } from "./standard-normal";

/**
 * Quantiles and densities of every input distribution, for the editor's live preview. The
 * methods are the engine's: closed-form inverse CDFs; truncated normal by
 * inverting Φ between the truncation points; "range" as the median-preserving two-piece
 * fit (each half carries probability 1/2 and reproduces the published end on its side:
 * lognormal in ln x, or split-normal), with z = Φ⁻¹(0.95) for a 90 % range and Φ⁻¹(0.83) for 66 %.
 */

const zOfCoverage = (coverage: 90 | 66) => standardNormalQuantile(coverage === 90 ? 0.95 : 0.83);

export function quantileOf(d: Distribution, p: number): number {
  switch (d.type) {
    case "fixed":
      return d.value;
    case "normal":
      return d.mean + d.sd * standardNormalQuantile(p);
    case "lognormal":
      return d.median * Math.exp(d.logSd * standardNormalQuantile(p));
    case "uniform":
      return d.min + p * (d.max - d.min);
    case "triangular": {
      // Inverse of the piecewise-quadratic CDF (closed form).
      const { min: a, mode: c, max: b } = d;
      const fc = (c - a) / (b - a);
      return p < fc ? a + Math.sqrt(p * (b - a) * (c - a)) : b - Math.sqrt((1 - p) * (b - a) * (b - c));
    }
    case "truncated-normal": {
      const lo = standardNormalCdf((d.min - d.mean) / d.sd);
      const hi = standardNormalCdf((d.max - d.mean) / d.sd);
      const v = d.mean + d.sd * standardNormalQuantile(Math.min(1 - 1e-15, Math.max(1e-15, lo + p * (hi - lo))));
      return Math.min(d.max, Math.max(d.min, v));
    }
    case "range": {
      const z = standardNormalQuantile(p);
      const k = zOfCoverage(d.coverage);
      if (d.shape === "lognormal") {
        const sigma = z < 0 ? Math.log(d.p50 / d.low) / k : Math.log(d.high / d.p50) / k;
        return d.p50 * Math.exp(sigma * z);
      }
      const sd = z < 0 ? (d.p50 - d.low) / k : (d.high - d.p50) / k;
      return d.p50 + sd * z;
    }
  }
}

export function densityOf(d: Distribution, x: number): number {
  switch (d.type) {
    case "fixed":
      return x === d.value ? Infinity : 0;
    case "normal":
      return standardNormalDensity((x - d.mean) / d.sd) / d.sd;
    case "lognormal":
      return x <= 0 ? 0 : standardNormalDensity(Math.log(x / d.median) / d.logSd) / (d.logSd * x);
    case "uniform":
      return x >= d.min && x <= d.max ? 1 / (d.max - d.min) : 0;
    case "triangular": {
      const { min: a, mode: c, max: b } = d;
      if (x < a || x > b) return 0;
      return x < c ? (2 * (x - a)) / ((b - a) * (c - a)) : x === c ? 2 / (b - a) : (2 * (b - x)) / ((b - a) * (b - c));
    }
    case "truncated-normal": {
      if (x < d.min || x > d.max) return 0;
      const mass = standardNormalCdf((d.max - d.mean) / d.sd) - standardNormalCdf((d.min - d.mean) / d.sd);
      return standardNormalDensity((x - d.mean) / d.sd) / (d.sd * mass);
    }
    case "range": {
      const k = zOfCoverage(d.coverage);
      if (d.shape === "lognormal") {
        if (x <= 0) return 0;
        const t = Math.log(x / d.p50);
        const sigma = t < 0 ? Math.log(d.p50 / d.low) / k : Math.log(d.high / d.p50) / k;
        return standardNormalDensity(t / sigma) / (sigma * x);
      }
      const t = x - d.p50;
      const sd = t < 0 ? (d.p50 - d.low) / k : (d.high - d.p50) / k;
      return standardNormalDensity(t / sd) / sd;
    }
  }
}

export const PREVIEW_PERCENTILES = [5, 17, 50, 83, 95] as const;

/** The 5/17/50/83/95 values of a distribution. */
export function percentileValues(d: Distribution): Array<{ p: number; value: number }> {
  return PREVIEW_PERCENTILES.map((p) => ({ p, value: quantileOf(d, p / 100) }));
}

/** A density curve over the central 99.5 % of the distribution, `n` points. */
export function densityCurve(d: Distribution, n = 120): { xs: number[]; density: number[] } {
  if (d.type === "fixed") return { xs: [d.value, d.value], density: [0, 1] };
  const lo = quantileOf(d, 0.0025);
  const hi = quantileOf(d, 0.9975);
  const xs = Array.from({ length: n }, (_, i) => lo + ((hi - lo) * i) / (n - 1));
  return { xs, density: xs.map((x) => densityOf(d, x)) };
}
