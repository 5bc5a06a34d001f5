import { binomialWindow, lowerTailAt, upperTailAt } from "./binomial-window.js";

/**
 * Distribution-free confidence interval for the p-quantile of a sample of n members, as
 * 1-based ranks of the sorted sample: the true quantile ξ_p lies in [X(lower), X(upper))
 * with probability `coverage` (≥ the requested coverage).
 *
 * Method: P(X(r) ≤ ξ_p < X(s)) = B(s−1; n, p) − B(r−1; n, p) with B the binomial CDF.
 * Ranks are equal-tailed: r is the smallest k with B(k) ≥ α/2 and s − 1 the smallest k
 * with B(k) ≥ 1 − α/2 (α = 1 − coverage), so each excluded tail holds at most α/2 and the
 * interval sits nearly symmetric around n·p. If an equal-tailed rank falls off the sample
 * (r < 1 or s > n, small n or extreme p), that end is pinned to the extreme rank and the
 * other end widened until the coverage is reached; null when even that fails (n too small).
 * The binomial CDF is exact (recurrence over the mass window, see binomial-window.ts), not a
 * normal approximation, and cheap up to n = 2e6.
 * Cost O(√(n·p·(1−p)) + 1).
 * Reference: Conover, Practical Nonparametric Statistics (3rd ed.), Section 3.2; David & Nagaraja,
 * Order Statistics (3rd ed.), Section 7.1.
 *
 * Example: `orderStatisticInterval(100, 0.5)` → { lower: 40, upper: 61, coverage: 0.9648 (4 d.p.) }.
 */
export function orderStatisticInterval(
  n: number,
  p: number,
  coverage = 0.95,
): { lower: number; upper: number; coverage: number } | null {
  if (!Number.isInteger(n) || n < 1) throw new RangeError("n must be an integer ≥ 1");
  if (typeof p !== "number" || !(p > 0 && p < 1)) throw new RangeError("p must be in (0, 1)");
  if (typeof coverage !== "number" || !(coverage > 0 && coverage < 1)) throw new RangeError("coverage must be in (0, 1)");

  const window = binomialWindow(n, p);
  const halfAlpha = (1 - coverage) / 2;
  // Smallest k with B(k) ≥ α/2, and smallest k with P(X > k) ≤ α/2.
  let r = window.first;
  while (lowerTailAt(window, r) < halfAlpha) r++;
  let sMinusOne = window.first;
  while (upperTailAt(window, sMinusOne) > halfAlpha) sMinusOne++;
  let lower = r;
  let upper = sMinusOne + 1;

  const covered = (rank: number, rankAbove: number) => 1 - lowerTailAt(window, rank - 1) - upperTailAt(window, rankAbove - 1);
  if (lower < 1) {
    lower = 1;
    while (upper < n && covered(lower, upper) < coverage) upper++;
  }
  if (upper > n) {
    upper = n;
    while (lower > 1 && covered(lower, upper) < coverage) lower--;
  }
  if (lower >= upper) return null;
  const achieved = covered(lower, upper);
  if (achieved < coverage) return null;
  return { lower, upper, coverage: achieved };
}
