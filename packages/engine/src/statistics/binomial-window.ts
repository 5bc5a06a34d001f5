/**
 * Binomial(n, p) probabilities over the window of counts that holds all but a negligible
 * part (< 1e-16) of the mass, with lower and upper tail sums.
 *
 * Method: start at the mode ⌊(n+1)p⌋ with weight 1 and walk down and up with the ratio
 * P(k−1)/P(k) = k(1−p)/((n−k+1)p) until a weight falls below 1e-18 of the mode's; then
 * normalise by the window's total. No gamma functions are needed, so there is no
 * cancellation for large n; rounding grows with the window only (≈ 1e-13 relative at
 * n = 2e6). Tail sums are accumulated from the small end for accuracy.
 * Cost O(√(n·p·(1−p)) + 1) time and memory (≈ 13,000 counts at n = 2e6, p = 0.5).
 * Reference: standard recurrence of binomial probabilities (e.g. Johnson, Kemp & Kotz,
 * Univariate Discrete Distributions, 3rd ed., Section 3.2).
 */
export interface BinomialWindow {
  /** Smallest count held in the window. */
  first: number;
  /** P(X ≤ first + i) for i = 0 … length − 1. */
  lowerTail: Float64Array;
  /** P(X > first + i) for i = 0 … length − 1. */
  upperTail: Float64Array;
}

const NEGLIGIBLE = 1e-18;

/**
 * Builds the window described above. Example: `binomialWindow(4, 0.5)` has first 0 and
 * lowerTail [1/16, 5/16, 11/16, 15/16, 1].
 */
export function binomialWindow(n: number, p: number): BinomialWindow {
  const mode = Math.min(n, Math.floor((n + 1) * p));
  const below: number[] = [];
  let weight = 1;
  for (let k = mode; k > 0; k--) {
    weight *= (k * (1 - p)) / ((n - k + 1) * p);
    if (weight < NEGLIGIBLE) break;
    below.push(weight);
  }
  const above: number[] = [];
  weight = 1;
  for (let k = mode; k < n; k++) {
    weight *= ((n - k) * p) / ((k + 1) * (1 - p));
    if (weight < NEGLIGIBLE) break;
    above.push(weight);
  }
  const length = below.length + 1 + above.length;
  const probabilities = new Float64Array(length);
  for (let i = 0; i < below.length; i++) probabilities[below.length - 1 - i] = below[i]!;
  probabilities[below.length] = 1;
  for (let i = 0; i < above.length; i++) probabilities[below.length + 1 + i] = above[i]!;

  const lowerTail = new Float64Array(length);
  let running = 0;
  for (let i = 0; i < length; i++) lowerTail[i] = running += probabilities[i]!;
  const total = running;
  const upperTail = new Float64Array(length);
  running = 0;
  for (let i = length - 1; i >= 0; i--) {
    upperTail[i] = running / total;
    running += probabilities[i]!;
  }
  for (let i = 0; i < length; i++) lowerTail[i]! /= total;
  return { first: mode - below.length, lowerTail, upperTail };
}

/** P(X ≤ k) from a window (0 below it, 1 above it). */
export function lowerTailAt(window: BinomialWindow, k: number): number {
  const i = k - window.first;
  if (i < 0) return 0;
  if (i >= window.lowerTail.length) return 1;
  return window.lowerTail[i]!;
}

/** P(X > k) from a window (1 below it, 0 above it). */
export function upperTailAt(window: BinomialWindow, k: number): number {
  const i = k - window.first;
  if (i < 0) return 1;
  if (i >= window.upperTail.length) return 0;
  return window.upperTail[i]!;
}
