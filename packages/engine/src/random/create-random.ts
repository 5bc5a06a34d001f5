import { AleaStream } from "./alea-stream.js";

/**
 * A source of uniform random numbers on the open interval (0, 1): never exactly 0 or 1,
 * so it can be fed straight into an inverse CDF without producing ±Infinity.
 */
export type RandomSource = () => number;

/** A seeded RandomSource that can also fill a whole column with its next draws (same numbers as calling it that many times). */
export interface SeededRandom extends RandomSource {
  fill(out: Float64Array, from?: number, to?: number): void;
}

/**
 * Seeded random stream.
 *
 * Method: Baagøe's Alea generator as shipped in seedrandom 3 (`seedrandom.alea`), read
 * through its 53-bit `double()` output (two 32-bit draws), so tail quantiles are resolved
 * below 1e-15. A draw of exactly 0 is rejected and redrawn; `double()` never returns 1.
 * Cost: O(1) per draw, no allocation. Same seed gives the same stream on every platform.
 * The generator is stepped by AleaStream (alea-stream.ts: seedrandom's seeding, its
 * recurrence in a tight loop, the same draws bit for bit); `fill` draws a whole column.
 * Reference: J. Baagøe (2010), "Better random numbers for JavaScript"; seedrandom 3.0.5.
 *
 * Example: `const random = createRandom("plumeline"); random()` gives a number in (0, 1),
 * the same one on every run with that seed.
 */
export function createRandom(seed: string): SeededRandom {
  if (typeof seed !== "string") throw new RangeError("seed must be a string");
  // Alea can return 0 (probability 2^-53 per draw); the stream redraws it, for the open interval.
  const stream = new AleaStream(seed);
  const random = (() => stream.next()) as SeededRandom;
  random.fill = (out, from, to) => {
    stream.fill(out, from, to);
  };
  return random;
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
