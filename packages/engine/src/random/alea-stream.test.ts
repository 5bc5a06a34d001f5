import seedrandom from "seedrandom";
import { describe, expect, it } from "vitest";
import { createKernelMemory } from "../kernels/kernel-memory.js";
import { AleaStream, type AleaState } from "./alea-stream.js";
import { createRandom } from "./create-random.js";

// The reference is seedrandom 3.0.5 itself: `alea(seed).double()`, skipping exact zeros as
// createRandom's open-interval contract asks (a zero has probability 2^-53 per draw).
function seedrandomDraws(seed: string | AleaState, count: number): Float64Array {
  const generator = typeof seed === "string" ? seedrandom.alea(seed) : seedrandom.alea("", { state: { ...seed } });
  const out = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    let u = generator.double();
    while (u <= 0) u = generator.double();
    out[i] = u;
  }
  return out;
}

/** Index of the first double whose bits differ, or -1. */
function firstDifference(a: Float64Array, b: Float64Array): number {
  if (a.length !== b.length) return Math.min(a.length, b.length);
  const x = new Uint32Array(a.buffer, a.byteOffset, 2 * a.length);
  const y = new Uint32Array(b.buffer, b.byteOffset, 2 * b.length);
  for (let i = 0; i < x.length; i++) if (x[i] !== y[i]) return i >> 1;
  return -1;
}

describe("AleaStream", () => {
  it("gives seedrandom's Alea double() stream bit for bit, draw by draw and by column", () => {
    for (const seed of ["w1/input/ecs", "plumeline", "", "hash-check/input/aerosol-cloud"]) {
      const expected = seedrandomDraws(seed, 300_000);
      const byDraw = new AleaStream(seed);
      const drawn = Float64Array.from({ length: 1000 }, () => byDraw.next());
      expect(drawn).toEqual(expected.subarray(0, 1000));
      const byColumn = new AleaStream(seed);
      const column = new Float64Array(300_000);
      byColumn.fill(column);
      // Bitwise: the doubles' bits, so even -0 or NaN would not slip through; a plain loop
      // (a deep equality over 600,000 words takes minutes) that reports the first difference.
      expect(firstDifference(column, expected)).toBe(-1);
    }
  });

  it("continues one stream across next() and fill() calls in any mix", () => {
    const expected = seedrandomDraws("mixed", 5000);
    const stream = new AleaStream("mixed");
    const out = new Float64Array(5000);
    out[0] = stream.next();
    stream.fill(out, 1, 2500);
    out[2500] = stream.next();
    out[2501] = stream.next();
    stream.fill(out, 2502, 5000);
    expect(out).toEqual(expected);
  });

  it("fills two columns at once with each stream's own draws", () => {
    const a = new AleaStream("w1/input/ecs");
    const b = new AleaStream("w1/input/f2x");
    const outA = new Float64Array(100_001);
    const outB = new Float64Array(100_001);
    AleaStream.fillTwo(a, outA, b, outB);
    expect(firstDifference(outA, seedrandomDraws("w1/input/ecs", 100_001))).toBe(-1);
    expect(firstDifference(outB, seedrandomDraws("w1/input/f2x", 100_001))).toBe(-1);
    // Both streams carry on where they stopped.
    const after = seedrandomDraws("w1/input/ecs", 100_003);
    expect([a.next(), a.next()]).toEqual([after[100_001], after[100_002]]);
    expect(() => AleaStream.fillTwo(a, outA, b, new Float64Array(3))).toThrow(/outB must be as long as outA/);
  });

  it("redraws an exact zero in every way of drawing, as seedrandom read through createRandom's contract does", () => {
    // From this state the first double is exactly 0 (both steps give 0: t = 2091639·0 + 0·2^-32);
    // the stream must skip it and give the next one. Reference: seedrandom resumed from the same state.
    const zeroFirst: AleaState = { c: 0, s0: 0, s1: 0, s2: 0.5 };
    const plain = seedrandom.alea("", { state: { ...zeroFirst } });
    expect(plain.double()).toBe(0);
    const expected = seedrandomDraws(zeroFirst, 4);
    expect(expected[0]).toBeGreaterThan(0);
    expect(
      [0, 1, 2, 3].map(
        (
          (s) => () =>
            s.next()
        )(new AleaStream(zeroFirst)),
      ),
    ).toEqual([...expected]);
    const filled = new Float64Array(4);
    new AleaStream(zeroFirst).fill(filled);
    expect(filled).toEqual(expected);
    const first = new Float64Array(4);
    const second = new Float64Array(4);
    AleaStream.fillTwo(new AleaStream(zeroFirst), first, new AleaStream("other"), second);
    expect(first).toEqual(expected);
    expect(second).toEqual(seedrandomDraws("other", 4));
    AleaStream.fillTwo(new AleaStream("other"), second, new AleaStream(zeroFirst), first);
    expect(first).toEqual(expected);
  });

  it("draws the same numbers into a kernel memory by the random kernels (WebAssembly), zeros redrawn too", () => {
    const memory = createKernelMemory();
    const [outA, outB, single] = [memory.float64(100_001), memory.float64(100_001), memory.float64(50_000)];
    const a = new AleaStream("w1/input/ecs");
    const b = new AleaStream("w1/input/f2x");
    AleaStream.fillTwoInMemory(a, outA, b, outB, memory.memory);
    expect(firstDifference(outA, seedrandomDraws("w1/input/ecs", 100_001))).toBe(-1);
    expect(firstDifference(outB, seedrandomDraws("w1/input/f2x", 100_001))).toBe(-1);
    // The states come back: both streams, in JavaScript and in memory, carry on where they stopped.
    const afterA = seedrandomDraws("w1/input/ecs", 150_003);
    expect(a.next()).toBe(afterA[100_001]);
    a.fillInMemory(single, memory.memory);
    expect(firstDifference(single, afterA.subarray(100_002, 150_002))).toBe(-1);
    expect(a.next()).toBe(afterA[150_002]);
    expect(b.next()).toBe(seedrandomDraws("w1/input/f2x", 100_002)[100_001]);
    // A first draw of exactly 0 is skipped (see the test above), in either stream of a pair.
    const zeroFirst: AleaState = { c: 0, s0: 0, s1: 0, s2: 0.5 };
    const expected = seedrandomDraws(zeroFirst, 4);
    const [first, second] = [memory.float64(4), memory.float64(4)];
    AleaStream.fillTwoInMemory(new AleaStream("other"), second, new AleaStream(zeroFirst), first, memory.memory);
    expect(first).toEqual(expected);
    expect(second).toEqual(seedrandomDraws("other", 4));
    new AleaStream(zeroFirst).fillInMemory(first, memory.memory);
    expect(first).toEqual(expected);
    expect(() => AleaStream.fillTwoInMemory(a, outA, b, single, memory.memory)).toThrow(/outB must be as long as outA/);
  });

  it("backs createRandom: calls and fill give the same draws as seedrandom", () => {
    const expected = seedrandomDraws("run-7/input/f2x", 2000);
    const random = createRandom("run-7/input/f2x");
    const first = Float64Array.from({ length: 1000 }, () => random());
    const rest = new Float64Array(1000);
    random.fill(rest);
    expect(first).toEqual(expected.subarray(0, 1000));
    expect(rest).toEqual(expected.subarray(1000));
  });
});
