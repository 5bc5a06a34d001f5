import type { RandomSource, SeededRandom } from "../random/create-random.js";
import { requireCount } from "./checks.js";

/**
 * Plain Monte Carlo uniforms: `dimensions` columns of `members` independent draws on (0, 1).
 *
 * Method: column by column (all members of dimension 0, then dimension 1, …), so adding a
 * dimension at the end never changes the earlier columns. Cost O(members·dimensions) draws,
 * one Float64Array per column. Map to an input's law with its inverse CDF.
 * Reference: standard simple random sampling.
 *
 * Example: `monteCarloUniforms(3, 2, createRandom("s"))` → two Float64Array(3) of values in (0, 1).
 */
export function monteCarloUniforms(members: number, dimensions: number, random: RandomSource): Float64Array[] {
  requireCount(members, "members", 1);
  requireCount(dimensions, "dimensions", 0);
  const columns: Float64Array[] = [];
  for (let j = 0; j < dimensions; j++) {
    columns.push(monteCarloColumnInto(new Float64Array(members), random));
  }
  return columns;
}

/**
 * One column of monteCarloUniforms written into `column` (its length is the member count): no
 * allocation. A seeded stream (createRandom) fills it in one call, with the same draws.
 */
export function monteCarloColumnInto(column: Float64Array, random: RandomSource | SeededRandom): Float64Array {
  if ("fill" in random) {
    random.fill(column);
    return column;
  }
  for (let i = 0; i < column.length; i++) column[i] = random();
  return column;
}
