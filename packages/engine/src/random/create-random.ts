import seedrandom from "seedrandom";

/**
 * A source of uniform random numbers on the open interval (0, 1): never exactly 0 or 1,
 * so it can be fed straight into an inverse CDF without producing ±Infinity.
 */
export type RandomSource = () => number;

/**
 * Seeded random stream.
 *
 * Method: Baagøe's Alea generator as shipped in seedrandom 3 (`seedrandom.alea`), read
 * through its 53-bit `double()` output (two 32-bit draws), so tail quantiles are resolved
 * below 1e-15. A draw of exactly 0 is rejected and redrawn; `double()` never returns 1.
 * Cost: O(1) per draw, no allocation. Same seed gives the same stream on every platform.
 * Reference: J. Baagøe (2010), "Better random numbers for JavaScript"; seedrandom 3.0.5.
 *
 * Example: `const random = createRandom("plumeline"); random()` gives a number in (0, 1),
 * the same one on every run with that seed.
 */
export function createRandom(seed: string): RandomSource {
  if (typeof seed !== "string") throw new RangeError("seed must be a string");
  const generator = seedrandom.alea(seed);
  return () => {
    let u = generator.double();
    // Alea can return 0 (probability 2^-53 per draw); the contract is the open interval.
    while (u <= 0) u = generator.double();
    return u;
  };
}

/**
 * Seed of a labelled sub-stream, so every input gets its own reproducible stream and adding
 * an input never shifts the draws of the others.
 *
 * Method: the label is appended to the parent seed with "/" as separator; Alea's Mash
 * seeding hashes the whole string, so neighbouring labels give unrelated streams.
 * Cost: O(length of the strings).
 *
 * Example: `deriveSeed("run-7", "ecs")` → `"run-7/ecs"`.
 */
export function deriveSeed(seed: string, label: string): string {
  if (typeof seed !== "string") throw new RangeError("seed must be a string");
  if (typeof label !== "string" || label.length === 0) throw new RangeError("label must be a non-empty string");
  return `${seed}/${label}`;
}
