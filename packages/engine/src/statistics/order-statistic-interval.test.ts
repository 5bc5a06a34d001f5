import { describe, expect, it } from "vitest";
import { binomialWindow, lowerTailAt, upperTailAt } from "./binomial-window.js";
import { orderStatisticInterval } from "./order-statistic-interval.js";

const SCIPY_CDF_9800 = 0.02221251036473548;
const SCIPY_SF_10200 = 0.022208913236922253;

describe("orderStatisticInterval", () => {
  // Formula: Conover, Practical Nonparametric Statistics; David & Nagaraja, Order Statistics
  // (citation details from memory); numbers computed with the binomial CDF: near-symmetric
  // rank pairs and their coverage B(s−1; n, p) − B(r−1; n, p).
  const table: Array<[number, number, number, number, number]> = [
    [100, 0.5, 40, 61, 0.9648],
    [1000, 0.5, 469, 532, 0.9537],
    [1000, 0.05, 37, 65, 0.9581],
    [1000, 0.95, 936, 964, 0.9581],
    [10000, 0.05, 458, 544, 0.9515],
  ];
  it.each(table)("n = %i, p = %f → ranks (%i, %i), coverage %f (binomial CDF, computed)", (n, p, lower, upper, coverage) => {
    const interval = orderStatisticInterval(n, p, 0.95);
    expect(interval).not.toBeNull();
    expect(interval!.lower).toBe(lower);
    expect(interval!.upper).toBe(upper);
    expect(interval!.coverage).toBeCloseTo(coverage, 4);
  });

  it("computes the exact binomial coverage (SciPy binom.cdf differences, 12 digits)", () => {
    // Reference: scipy.stats.binom.cdf(s−1, n, p) − binom.cdf(r−1, n, p) [computed, SciPy 1.17].
    expect(orderStatisticInterval(100, 0.5)!.coverage).toBeCloseTo(0.9647997997822952, 12);
    expect(orderStatisticInterval(10, 0.5)!.coverage).toBeCloseTo(0.978515625, 12);
    const large = orderStatisticInterval(2_000_000, 0.05)!;
    // SciPy: binom.ppf(0.025) = 99396, binom.ppf(0.975) + 1 = 100606, coverage 0.9503399143947852.
    expect([large.lower, large.upper]).toEqual([99396, 100606]);
    expect(large.coverage).toBeCloseTo(0.9503399143947852, 10);
  });

  it("pins an end at the extreme rank when the equal-tailed rank falls off the sample", () => {
    // n = 60, p = 0.05: B(0) = 0.95^60 = 0.046 > 0.025, so r is pinned to 1 and s widened:
    // B(8) − B(0) = 0.95108 ≥ 0.95 but B(7) − B(0) = 0.94414 [computed, SciPy].
    expect(orderStatisticInterval(60, 0.05)).toEqual({ lower: 1, upper: 9, coverage: expect.closeTo(0.9510815952108822, 12) });
    expect(orderStatisticInterval(60, 0.95)).toEqual({ lower: 52, upper: 60, coverage: expect.closeTo(0.9510815952108822, 12) });
  });

  it("returns null when n is too small for the coverage", () => {
    // n = 5, p = 0.5: the widest interval (1, 5) covers 1 − 2/32 = 0.9375 < 0.95.
    expect(orderStatisticInterval(5, 0.5)).toBeNull();
    expect(orderStatisticInterval(1, 0.5)).toBeNull();
    expect(orderStatisticInterval(20, 0.05)).toBeNull();
    expect(orderStatisticInterval(5, 0.5, 0.9)).not.toBeNull();
  });

  it("rejects bad arguments", () => {
    expect(() => orderStatisticInterval(0, 0.5)).toThrow("n must be an integer ≥ 1");
    expect(() => orderStatisticInterval(10.5, 0.5)).toThrow("n must be an integer ≥ 1");
    expect(() => orderStatisticInterval(100, 1)).toThrow("p must be in (0, 1)");
    expect(() => orderStatisticInterval(100, 0.5, 1)).toThrow("coverage must be in (0, 1)");
  });
});

describe("binomialWindow", () => {
  it("holds the exact Binomial(4, 1/2) CDF and tails (C(4, k)/16)", () => {
    const window = binomialWindow(4, 0.5);
    expect(window.first).toBe(0);
    expect(Array.from(window.lowerTail)).toEqual([1 / 16, 5 / 16, 11 / 16, 15 / 16, 1]);
    expect(Array.from(window.upperTail)).toEqual([15 / 16, 11 / 16, 5 / 16, 1 / 16, 0]);
  });

  it("matches SciPy binom.cdf in the tails for n = 10^6, p = 0.01 (12 digits)", () => {
    // Reference: scipy.stats.binom.cdf(9800, 1e6, 0.01) and binom.sf(10200, 1e6, 0.01), computed with SciPy.
    const window = binomialWindow(1_000_000, 0.01);
    expect(lowerTailAt(window, 9800)).toBeCloseTo(SCIPY_CDF_9800, 12);
    expect(upperTailAt(window, 10200)).toBeCloseTo(SCIPY_SF_10200, 12);
  });
});
