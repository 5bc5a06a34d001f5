/**
 * Kish effective sample size of importance weights: (Σw)² / Σw².
 *
 * Equal weights give n, a single non-zero weight gives 1. The weights are scaled by their
 * maximum first so the squares cannot overflow or underflow. Weights must be finite and
 * ≥ 0 with a positive sum. Cost O(n).
 * Reference: L. Kish (1965), Survey Sampling, Wiley.
 *
 * Example: `kishEffectiveSize([1, 2, 3, 4])` → 3.3333333333333335 (= 100/30).
 */
export function kishEffectiveSize(weights: ArrayLike<number>): number {
  const n = weights.length;
  if (n === 0) throw new RangeError("weights must not be empty");
  let largest = 0;
  for (let i = 0; i < n; i++) {
    const w = weights[i]!;
    if (!(w >= 0) || w === Infinity) throw new RangeError(`weights[${i}] must be a finite number ≥ 0`);
    if (w > largest) largest = w;
  }
  if (largest === 0) throw new RangeError("weights must have a positive sum");
  let sum = 0;
  let sumSquares = 0;
  for (let i = 0; i < n; i++) {
    const scaled = weights[i]! / largest;
    sum += scaled;
    sumSquares += scaled * scaled;
  }
  return (sum * sum) / sumSquares;
}
