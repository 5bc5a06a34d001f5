import { quantileSorted as d3QuantileSorted } from "d3-array";
import { describe, expect, it } from "vitest";
import { standardNormalQuantile } from "../distributions/normal.js";
import { createRandom } from "../random/create-random.js";
import { kishEffectiveSize } from "./kish.js";
import { weightedQuantileSorted, weightedQuantilesSorted } from "./weighted-quantile.js";

const PS = [0, 0.001, 0.05, 0.17, 0.3333, 0.5, 0.83, 0.95, 0.999, 1];

function randomSorted(n: number, seed: string): Float64Array {
  const random = createRandom(seed);
  return Float64Array.from({ length: n }, () => standardNormalQuantile(random()) * 2 + 1).sort();
}

describe("weightedQuantileSorted", () => {
  it("reduces to R type 7 (d3-array quantileSorted) with equal weights on unequal data", () => {
    // Reference: d3-array quantileSorted is R-7 (Hyndman & Fan 1996, definition 7).
    for (const n of [2, 3, 17, 1000]) {
      const values = randomSorted(n, `wq-${n}`);
      for (const w of [1, 0.3, 1e-6, 7e5]) {
        const weights = new Float64Array(n).fill(w);
        for (const p of PS) {
          const expected = d3QuantileSorted(Array.from(values), p)!;
          expect(Math.abs(weightedQuantileSorted(values, weights, p) - expected)).toBeLessThan(1e-12 * (1 + Math.abs(expected)));
        }
      }
    }
  });

  it("is not shifted by zero-weight members wherever they sit", () => {
    const values = [0.2, 0.5, 0.9, 1.4, 2.0, 3.1];
    const weights = [0.5, 2, 1, 0.25, 3, 1];
    const withZeros = [-5, 0.2, 0.5, 0.7, 0.9, 1.4, 2.0, 3.1, 9];
    const zeroWeights = [0, 0.5, 2, 0, 1, 0.25, 3, 1, 0];
    for (const p of PS) expect(weightedQuantileSorted(withZeros, zeroWeights, p)).toBe(weightedQuantileSorted(values, weights, p));
  });

  it("follows the documented positions on a hand example", () => {
    // weights [1, 2, 1]: W = 4, w̄ = 4/3, positions S = (C − (w + w̄)/2)/(W − w̄)
    // = (1 − 7/6)/(8/3), (3 − 5/3)/(8/3), (4 − 7/6)/(8/3) = −1/16, 1/2, 17/16.
    const values = [1, 2, 3];
    const weights = [1, 2, 1];
    expect(weightedQuantileSorted(values, weights, 0)).toBeCloseTo(1 + (1 / 16 / (9 / 16)) * 1, 14);
    expect(weightedQuantileSorted(values, weights, 0.25)).toBeCloseTo(1 + (5 / 16 / (9 / 16)) * 1, 14);
    expect(weightedQuantileSorted(values, weights, 0.5)).toBeCloseTo(2, 14);
    expect(weightedQuantileSorted(values, weights, 1)).toBeCloseTo(2 + (8 / 16 / (9 / 16)) * 1, 14);
  });

  it("is symmetric under reversal and unchanged by scaling the weights", () => {
    const values = randomSorted(50, "wq-sym");
    const random = createRandom("wq-sym-w");
    const weights = Float64Array.from({ length: 50 }, () => random() ** 3);
    const reversedValues = Float64Array.from(values, (v) => -v).reverse();
    const reversedWeights = weights.slice().reverse();
    const scaled = weights.map((w) => w * 1e8);
    for (const p of PS) {
      const q = weightedQuantileSorted(values, weights, p);
      expect(-weightedQuantileSorted(reversedValues, reversedWeights, 1 - p)).toBeCloseTo(q, 12);
      expect(weightedQuantileSorted(values, scaled, p)).toBeCloseTo(q, 12);
    }
  });

  it("recovers the quantiles of a tilted normal from importance weights (sampling check)", () => {
    // X ~ N(0, 1) with weights exp(θx − θ²/2) is an importance sample of N(θ, 1) [standard
    // likelihood ratio]. Quantiles of N(0.5, 1): 0.5 + z_p with z_p = scipy.stats.norm.ppf(p) (SciPy 1.17).
    const n = 40_000;
    const values = Float64Array.from({ length: n }, (_, i) => standardNormalQuantile((i + 0.5) / n));
    const weights = values.map((x) => Math.exp(0.5 * x - 0.125));
    const effective = kishEffectiveSize(weights);
    const [p5, p50, p95] = weightedQuantilesSorted(values, weights, [0.05, 0.5, 0.95]) as unknown as [number, number, number];
    // Standard error of a quantile ≈ √(p(1−p)/n_eff)/φ(z_p); 0.05 bound is > 5 of them here.
    expect(effective).toBeGreaterThan(30_000);
    expect(p50).toBeCloseTo(0.5, 2);
    expect(Math.abs(p5 - (0.5 - 1.644853627))).toBeLessThan(0.05);
    expect(Math.abs(p95 - (0.5 + 1.644853627))).toBeLessThan(0.05);
  });

  it("gives the one positive-weight value for every p", () => {
    expect(weightedQuantileSorted([1, 2, 3], [0, 5, 0], 0.9)).toBe(2);
  });

  it("answers several probabilities in their own order in one pass", () => {
    const values = randomSorted(100, "wq-multi");
    const weights = Float64Array.from({ length: 100 }, (_, i) => 1 + (i % 7));
    const ps = [0.95, 0.05, 0.5, 1, 0];
    const many = weightedQuantilesSorted(values, weights, ps);
    ps.forEach((p, i) => expect(many[i]).toBe(weightedQuantileSorted(values, weights, p)));
  });

  it("rejects bad input naming it", () => {
    expect(() => weightedQuantileSorted([], [], 0.5)).toThrow("sortedValues must not be empty");
    expect(() => weightedQuantileSorted([1, 2], [1], 0.5)).toThrow("weightsInSameOrder must have as many entries as sortedValues");
    expect(() => weightedQuantileSorted([1, 2], [1, -1], 0.5)).toThrow("weightsInSameOrder[1] must be a finite number ≥ 0");
    expect(() => weightedQuantileSorted([1, 2], [1, Number.NaN], 0.5)).toThrow("weightsInSameOrder[1] must be a finite number ≥ 0");
    expect(() => weightedQuantileSorted([1, 2], [0, 0], 0.5)).toThrow("weightsInSameOrder must have a positive sum");
    expect(() => weightedQuantileSorted([1, 2], [1, 1], Number.NaN)).toThrow("p must be in [0, 1]");
    expect(() => weightedQuantilesSorted([1, 2], [1, 1], [0.5, 2])).toThrow("ps[1] must be in [0, 1]");
  });
});
