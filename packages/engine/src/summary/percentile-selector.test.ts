import { describe, expect, it } from "vitest";
import { quantileSorted } from "d3-array";
import seedrandom from "seedrandom";
import { PercentileSelector } from "./percentile-selector.js";
import { weightedQuantileSorted } from "../statistics/index.js";

const probs = [0.05, 0.17, 0.5, 0.83, 0.95];

function extremes(values: Float64Array): [number, number] {
  let min = Infinity;
  let max = -Infinity;
  for (const v of values) {
    if (v < min) min = v;
    if (v > max) max = v;
  }
  return [min, max];
}

/** The statistics module's weighted quantile on a full sort: what the selector must equal. */
function weightedBySorting(values: Float64Array, weights: Float64Array, p: number): number {
  const idx = Array.from(values.keys()).sort((a, b) => values[a]! - values[b]! || a - b);
  return weightedQuantileSorted(
    idx.map((i) => values[i]!),
    idx.map((i) => weights[i]!),
    p,
  );
}

describe("PercentileSelector (R type 7 without a full sort)", () => {
  it("equals d3-array quantileSorted (R-7) on random data of many sizes", () => {
    // Reference: d3-array quantileSorted implements R type 7 (d3-array docs).
    const random = seedrandom("selector");
    const selector = new PercentileSelector();
    for (const n of [1, 2, 3, 10, 97, 1000, 20_001]) {
      const values = Float64Array.from({ length: n }, () => (random() - 0.3) ** 3 * 10);
      const sorted = Float64Array.from(values).sort();
      const out = new Float64Array(probs.length);
      const [min, max] = extremes(values);
      selector.select(values, n, probs, out, min, max);
      probs.forEach((p, j) => expect(out[j]).toBe(quantileSorted(Array.from(sorted), p)));
    }
  });

  it("selectNear equals d3-array quantileSorted (R-7) whatever the guesses: good, far off, empty, NaN", () => {
    // Reference: d3-array quantileSorted (R type 7). Guesses only decide which buckets are
    // copied in the first pass; a miss costs a second pass, never a different answer.
    const random = seedrandom("near");
    const selector = new PercentileSelector();
    for (const n of [1, 2, 10, 1000, 20_001]) {
      const values = Float64Array.from({ length: n }, () => (random() - 0.3) ** 3 * 10);
      const sorted = Array.from(Float64Array.from(values).sort());
      const exact = probs.map((p) => quantileSorted(sorted, p)!);
      const [min, max] = extremes(values);
      const spread = probs.map(() => 1e-3);
      const guesses = [exact, exact.map((v) => v + 0.05), exact.map(() => max + 100), exact.map(() => Number.NaN), [exact[0]!, -1e9, exact[2]!, 1e9, exact[4]!]];
      for (const guess of guesses) {
        const out = new Float64Array(probs.length);
        const sum = selector.selectNear(values, n, probs, out, min, max, guess, spread);
        probs.forEach((p, j) => expect(out[j]).toBe(exact[j]));
        if (max > min) expect(sum).toBe(values.reduce((s, v) => s + v, 0));
      }
    }
  });

  it("handles ties, a constant ensemble and p at the ends", () => {
    const selector = new PercentileSelector();
    const values = Float64Array.from([2, 2, 2, 5, 5, 1, 1, 1, 1, 9]);
    const out = new Float64Array(3);
    selector.select(values, values.length, [0, 0.5, 1], out, 1, 9);
    const sorted = Float64Array.from(values).sort();
    expect(Array.from(out)).toEqual([0, 0.5, 1].map((p) => quantileSorted(Array.from(sorted), p)));
    selector.select(new Float64Array(5).fill(3), 5, [0.2, 0.9], out, 3, 3);
    expect(Array.from(out.subarray(0, 2))).toEqual([3, 3]);
  });

  it("weighted: equal weights reduce exactly to R-7 (d3-array)", () => {
    const random = seedrandom("equal-weights");
    const values = Float64Array.from({ length: 5000 }, () => random() * 4 - 1);
    const weights = new Float64Array(values.length).fill(0.25);
    const out = new Float64Array(probs.length);
    const [min, max] = extremes(values);
    new PercentileSelector().select(values, values.length, probs, out, min, max, weights, 0.25 * values.length);
    const sorted = Float64Array.from(values).sort();
    probs.forEach((p, j) => expect(out[j]).toBeCloseTo(quantileSorted(Array.from(sorted), p)!, 12));
  });

  it("weighted: equals weightedQuantileSorted on a full sort, skewed weights and zero weights", () => {
    const random = seedrandom("weighted");
    const selector = new PercentileSelector();
    for (const n of [2, 7, 300, 12_345]) {
      const values = Float64Array.from({ length: n }, () => random() * random() * 3);
      // Gaussian-likelihood-like weights, most mass on a narrow band (as a constraint gives).
      // Some weights underflow to exactly 0, which the rule drops.
      const weights = Float64Array.from(values, (v) => Math.exp(-0.5 * ((v - 0.4) / 0.02) ** 2));
      const total = weights.reduce((s, w) => s + w, 0);
      const out = new Float64Array(probs.length);
      const [min, max] = extremes(values);
      selector.select(values, n, probs, out, min, max, weights, total);
      probs.forEach((p, j) => expect(out[j]).toBeCloseTo(weightedBySorting(values, weights, p), 10));
    }
  });

  it("weighted: one selector reused across sizes (empty buckets between members) stays exact", () => {
    // Reference: statistics/weighted-quantile.ts on a full sort (equal weights: R-7, d3-array).
    const selector = new PercentileSelector();
    const big = Float64Array.from({ length: 100_000 }, (_, i) => i);
    selector.select(big, big.length, [0.5], new Float64Array(1), 0, 99_999);
    const values = Float64Array.from([1.5, 2, 2.5, 3, 3.5], (x) => 1.07 ** x);
    const weights = new Float64Array(5).fill(0.2);
    const out = new Float64Array(probs.length);
    selector.select(values, 5, probs, out, values[0]!, values[4]!, weights, 1);
    probs.forEach((p, j) => expect(out[j]).toBeCloseTo(quantileSorted(Array.from(values), p)!, 12));
    const skewed = Float64Array.from([0, 0, 1, 1, 2]);
    selector.select(values, 5, probs, out, values[0]!, values[4]!, skewed, 4);
    probs.forEach((p, j) => expect(out[j]).toBeCloseTo(weightedBySorting(values, skewed, p), 12));
  });
});
