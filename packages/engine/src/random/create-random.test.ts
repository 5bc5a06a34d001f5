import seedrandom from "seedrandom";
import { describe, expect, it } from "vitest";
import { createRandom, deriveSeed } from "./create-random.js";

describe("createRandom", () => {
  it("repeats the same stream for the same seed and differs for another seed", () => {
    const a = createRandom("plumeline");
    const b = createRandom("plumeline");
    const c = createRandom("plumeline-2");
    const drawsA = Array.from({ length: 5 }, a);
    const drawsB = Array.from({ length: 5 }, b);
    const drawsC = Array.from({ length: 5 }, c);
    expect(drawsA).toEqual(drawsB);
    expect(drawsA).not.toEqual(drawsC);
  });

  it("keeps the first draws of a fixed seed (catches accidental generator changes)", () => {
    // Reference: seedrandom 3.0.5 `alea("plumeline").double()`, read directly from the library
    // and recorded here (node -e, first three draws); a change of generator or read-out fails.
    const random = createRandom("plumeline");
    const draws = [random(), random(), random()];
    expect(draws).toEqual(seedrandomAleaDoubles("plumeline", 3));
    expect(draws).toEqual([0.4040036548661512, 0.10140139092716394, 0.5278724848999602]);
  });

  it("stays on the open interval (0, 1) with a mean near 1/2 over many draws", () => {
    const random = createRandom("uniformity");
    const n = 200_000;
    let sum = 0;
    let min = 1;
    let max = 0;
    for (let i = 0; i < n; i++) {
      const u = random();
      sum += u;
      if (u < min) min = u;
      if (u > max) max = u;
    }
    expect(min).toBeGreaterThan(0);
    expect(max).toBeLessThan(1);
    // Uniform(0,1): mean 1/2, sd of the mean sqrt(1/12/n) = 6.5e-4; allow 5 sd.
    expect(Math.abs(sum / n - 0.5)).toBeLessThan(5 * Math.sqrt(1 / 12 / n));
  });

  it("rejects a non-string seed", () => {
    expect(() => createRandom(42 as unknown as string)).toThrow(/seed must be a string/);
  });
});

describe("deriveSeed", () => {
  it("builds stable, distinct sub-stream seeds", () => {
    expect(deriveSeed("run-7", "ecs")).toBe("run-7/ecs");
    const ecs = createRandom(deriveSeed("run-7", "ecs"));
    const f2x = createRandom(deriveSeed("run-7", "f2x"));
    expect(ecs()).not.toBe(f2x());
  });

  it("rejects an empty label", () => {
    expect(() => deriveSeed("run-7", "")).toThrow(/label must be a non-empty string/);
  });
});

// Independent read of seedrandom's Alea double() for the exact-draw check above.
function seedrandomAleaDoubles(seed: string, count: number): number[] {
  const generator = seedrandom.alea(seed);
  return Array.from({ length: count }, () => generator.double());
}
