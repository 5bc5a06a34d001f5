import { describe, expect, it } from "vitest";
import { createRandom } from "../random/create-random.js";
import { cdfLognormal, densityLognormal, quantileLognormal } from "./lognormal.js";
import { cdfRange, densityRange, fitRange, quantileRange } from "./range.js";
import type { RangeDistribution } from "./types.js";

// Lognormal from a median and a 5–95 % range (standard; values computed from the closed form
// q_p = exp(μ + σ·z_p), mean exp(μ + σ²/2)): LN(ln 3, 0.27853) has 5/17/50/83/95 % =
// 1.8974 / 2.2999 / 3.0000 / 3.9133 / 4.7434 and mean 3.1187; σ_upper 0.31056, σ_lower 0.24651
// for median 3 with [2, 5].
const CHECK_PERCENTILES: Array<[number, number]> = [
  [0.05, 1.8974],
  [0.17, 2.2999],
  [0.5, 3],
  [0.83, 3.9133],
  [0.95, 4.7434],
];

describe("lognormal from median and logSd", () => {
  const d = { type: "lognormal", median: 3, logSd: 0.27853 } as const;

  it.each(CHECK_PERCENTILES)("q(%f) matches the closed form to 4 decimals", (p, expected) => {
    expect(Math.abs(quantileLognormal(d, p) - expected)).toBeLessThan(5e-5);
  });

  it("has the mean exp(μ + σ²/2) = 3.1187 within sampling error", () => {
    const random = createRandom("lognormal-mean");
    const n = 100_000;
    let sum = 0;
    let sumSquares = 0;
    for (let i = 0; i < n; i++) {
      const x = quantileLognormal(d, random());
      sum += x;
      sumSquares += x * x;
    }
    const mean = sum / n;
    const sd = Math.sqrt(sumSquares / n - mean * mean);
    // Closed-form mean exp(ln 3 + 0.27853²/2) = 3.1187; allow 4 standard errors.
    expect(Math.abs(mean - 3.1187)).toBeLessThan((4 * sd) / Math.sqrt(n));
  });

  it("has CDF and density consistent with the quantile", () => {
    expect(cdfLognormal(d, quantileLognormal(d, 0.83))).toBeCloseTo(0.83, 14);
    expect(cdfLognormal(d, 0)).toBe(0);
    expect(densityLognormal(d, -1)).toBe(0);
    // Central difference of the CDF equals the density.
    const h = 1e-5;
    expect((cdfLognormal(d, 2.5 + h) - cdfLognormal(d, 2.5 - h)) / (2 * h)).toBeCloseTo(densityLognormal(d, 2.5), 8);
  });
});

describe("fitRange", () => {
  it("fits the one-sided log σs ln(5/3)/1.6449 and ln(3/2)/1.6449 for median 3 with a 5–95 % range [2, 5]", () => {
    const fit = fitRange({ type: "range", p50: 3, low: 2, high: 5, coverage: 90, shape: "lognormal" });
    if (fit.kind !== "lognormal") throw new Error("expected a lognormal fit");
    expect(fit.mu).toBeCloseTo(Math.log(3), 15);
    expect(fit.sigmaLow).toBeCloseTo(0.24651, 5);
    expect(fit.sigmaHigh).toBeCloseTo(0.31056, 5);
  });

  it("reduces to the symmetric lognormal LN(ln 3, 0.27853) when the range is log-symmetric", () => {
    // Ends of LN(ln 3, 0.27853) at 5 and 95 %: 3·exp(∓0.27853·1.6448536270) (z95 from scipy.stats.norm.ppf, SciPy 1.17).
    const z95 = 1.644853627;
    const d: RangeDistribution = {
      type: "range",
      p50: 3,
      low: 3 * Math.exp(-0.27853 * z95),
      high: 3 * Math.exp(0.27853 * z95),
      coverage: 90,
      shape: "lognormal",
    };
    for (const [p, expected] of CHECK_PERCENTILES) expect(Math.abs(quantileRange(d, p) - expected)).toBeLessThan(5e-5);
  });

  const ranges: RangeDistribution[] = [
    { type: "range", p50: 3, low: 2, high: 5, coverage: 90, shape: "lognormal" },
    { type: "range", p50: 3, low: 2.5, high: 4, coverage: 66, shape: "lognormal" },
    { type: "range", p50: -1.1, low: -1.7, high: -0.4, coverage: 90, shape: "split-normal" },
    { type: "range", p50: 3.93, low: 3.46, high: 4.4, coverage: 66, shape: "split-normal" },
  ];
  it.each(ranges)("reproduces low / p50 / high exactly: %o", (d) => {
    // The published ends are the 5/95 % (coverage 90) or 17/83 % (coverage 66) quantiles.
    const tail = d.coverage === 90 ? 0.05 : 0.17;
    expect(quantileRange(d, tail)).toBeCloseTo(d.low, 12);
    expect(quantileRange(d, 0.5)).toBeCloseTo(d.p50, 14); // exp(ln p50) may differ from p50 by 1 ulp
    expect(quantileRange(d, 1 - tail)).toBeCloseTo(d.high, 12);
    expect(cdfRange(d, d.low)).toBeCloseTo(tail, 12);
    expect(cdfRange(d, d.p50)).toBe(0.5);
    expect(cdfRange(d, d.high)).toBeCloseTo(1 - tail, 12);
  });

  it.each(ranges)("has a density that integrates to 1 and matches the CDF slope: %o", (d) => {
    const from = quantileRange(d, 1e-9);
    const to = quantileRange(d, 1 - 1e-9);
    const steps = 20_000;
    const h = (to - from) / steps;
    let integral = 0;
    for (let i = 0; i < steps; i++) integral += densityRange(d, from + (i + 0.5) * h) * h;
    // Midpoint rule on a density with a jump at the median: error O(h) at one cell.
    expect(integral).toBeCloseTo(1, 3);
    const x = d.p50 + 0.3 * (d.high - d.p50);
    const e = 1e-6;
    expect((cdfRange(d, x + e) - cdfRange(d, x - e)) / (2 * e)).toBeCloseTo(densityRange(d, x), 6);
  });

  it("names the field for a bad range", () => {
    expect(() => fitRange({ type: "range", p50: 3, low: 3.5, high: 5, coverage: 90, shape: "lognormal" })).toThrow(
      "range.low must be < range.p50",
    );
    expect(() => fitRange({ type: "range", p50: 3, low: 0, high: 5, coverage: 90, shape: "lognormal" })).toThrow(
      "range.low must be > 0 for a lognormal shape",
    );
    expect(() => fitRange({ type: "range", p50: 3, low: 2, high: 5, coverage: 50 as 90, shape: "lognormal" })).toThrow(
      "range.coverage must be 90 or 66",
    );
  });
});
