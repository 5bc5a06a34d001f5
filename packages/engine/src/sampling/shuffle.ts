import type { RandomSource } from "../random/create-random.js";

/**
 * Shuffles `values` in place into a uniformly random order.
 *
 * Method: Fisher–Yates (Durstenfeld's in-place form): for i = n−1 … 1 swap element i with a
 * uniformly chosen j in 0 … i. Uses n − 1 draws. Cost O(n), no allocation.
 * Reference: R. Durstenfeld (1964), "Algorithm 235: Random permutation", CACM 7(7), 420;
 * Knuth, TAOCP vol. 2, Algorithm 3.4.2P.
 *
 * Example: shuffling Float64Array [0, 1, 2, 3] gives some order of 0, 1, 2, 3, the same one
 * for the same seed.
 */
export function shuffleInPlace(values: Float64Array, random: RandomSource): Float64Array {
  for (let i = values.length - 1; i > 0; i--) {
    // min() guards a custom source that returns values a hair below 1 rounding up to i + 1.
    const j = Math.min(i, Math.floor(random() * (i + 1)));
    const held = values[i]!;
    values[i] = values[j]!;
    values[j] = held;
  }
  return values;
}
