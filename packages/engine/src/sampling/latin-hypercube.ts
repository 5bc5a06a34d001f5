import type { RandomSource } from "../random/create-random.js";
import { requireCount } from "./checks.js";
import { shuffleInPlace } from "./shuffle.js";

/**
 * Latin hypercube uniforms: `dimensions` columns of `members` values on (0, 1) such that each
 * column has exactly one value in every stratum [k/n, (k+1)/n).
 *
 * Method (McKay, Beckman & Conover 1979): column j holds (π_j(i) + U_ij)/n, with π_j an
 * independent Fisher–Yates permutation of 0 … n−1 per column and U_ij uniform on (0, 1);
 * per column the n − 1 permutation draws come first, then the n jitters. A jitter so close to
 * 1 that rounding would push the value into the next stratum (or onto 1) is redrawn.
 * Cost O(members·dimensions) time, one Float64Array per column.
 * Reference: M. D. McKay, R. J. Beckman, W. J. Conover (1979), Technometrics 21(2), 239–245;
 * SciPy scipy.stats.qmc.LatinHypercube docs.
 *
 * Example: `latinHypercube(4, 1, createRandom("s"))[0]` holds one value in each of
 * [0, .25), [.25, .5), [.5, .75), [.75, 1), in random order.
 */
export function latinHypercube(members: number, dimensions: number, random: RandomSource): Float64Array[] {
  requireCount(members, "members", 1);
  requireCount(dimensions, "dimensions", 0);
  const columns: Float64Array[] = [];
  for (let j = 0; j < dimensions; j++) {
    columns.push(latinHypercubeColumnInto(new Float64Array(members), random));
  }
  return columns;
}

/** One column of latinHypercube written into `column` (its length is the member count): no allocation. */
export function latinHypercubeColumnInto(column: Float64Array, random: RandomSource): Float64Array {
  const members = column.length;
  for (let i = 0; i < members; i++) column[i] = i;
  shuffleInPlace(column, random);
  for (let i = 0; i < members; i++) column[i] = jitterInStratum(column[i]!, members, random);
  return column;
}

/** (stratum + U)/n, kept strictly inside its stratum and inside (0, 1). */
function jitterInStratum(stratum: number, members: number, random: RandomSource): number {
  for (let attempt = 0; attempt < 8; attempt++) {
    const value = (stratum + random()) / members;
    if (value > 0 && value < 1 && Math.floor(value * members) === stratum) return value;
  }
  // Unreachable for any sane source; the stratum centre always satisfies the contract.
  return (stratum + 0.5) / members;
}
