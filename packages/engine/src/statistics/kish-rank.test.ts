import { sampleRankCorrelation } from "simple-statistics";
import { describe, expect, it } from "vitest";
import { createRandom } from "../random/create-random.js";
import { kishEffectiveSize } from "./kish.js";
import { ranks, spearman } from "./rank.js";

describe("kishEffectiveSize", () => {
  it("meets the closed-form checks of Kish (1965)", () => {
    // (Σw)²/Σw², computed by hand: equal weights → n; one non-zero weight → 1; (1,2,3,4) → 100/30.
    expect(kishEffectiveSize(new Float64Array(250).fill(0.37))).toBeCloseTo(250, 10);
    expect(kishEffectiveSize([0, 0, 4.2, 0])).toBe(1);
    expect(kishEffectiveSize([1, 2, 3, 4])).toBeCloseTo(100 / 30, 14);
  });

  it("survives weights that would overflow or underflow when squared", () => {
    expect(kishEffectiveSize([1e300, 1e300])).toBeCloseTo(2, 12);
    expect(kishEffectiveSize([1e-300, 2e-300, 3e-300, 4e-300])).toBeCloseTo(100 / 30, 12);
  });

  it("rejects empty, negative, NaN and all-zero weights", () => {
    expect(() => kishEffectiveSize([])).toThrow("weights must not be empty");
    expect(() => kishEffectiveSize([1, -1])).toThrow("weights[1] must be a finite number ≥ 0");
    expect(() => kishEffectiveSize([Number.NaN])).toThrow("weights[0] must be a finite number ≥ 0");
    expect(() => kishEffectiveSize([0, 0])).toThrow("weights must have a positive sum");
  });
});

describe("ranks and spearman", () => {
  it("gives mid-ranks to ties", () => {
    // Mid-rank convention (Kendall & Gibbons): 20, 20 share ranks 2 and 3 → 2.5.
    expect(Array.from(ranks([10, 30, 20, 20]))).toEqual([1, 4, 2.5, 2.5]);
    expect(Array.from(ranks([5, 5, 5]))).toEqual([2, 2, 2]);
    expect(Array.from(ranks([]))).toEqual([]);
  });

  it("equals simple-statistics sampleRankCorrelation on random data with and without ties", () => {
    // Reference: simple-statistics 7.12 sampleRankCorrelation (mid-ranks, Pearson on ranks).
    const random = createRandom("spearman");
    for (const n of [2, 5, 40, 3000]) {
      const x = Array.from({ length: n }, () => random());
      const y = x.map((v) => v * v + 0.3 * random());
      expect(spearman(x, y)).toBeCloseTo(sampleRankCorrelation(x, y), 12);
      const tiedX = x.map((v) => Math.round(v * 4));
      const tiedY = y.map((v) => Math.round(v * 3));
      if (new Set(tiedX).size > 1 && new Set(tiedY).size > 1)
        expect(spearman(tiedX, tiedY)).toBeCloseTo(sampleRankCorrelation(tiedX, tiedY), 12);
    }
    expect(spearman([1, 2, 3, 4, 5], [1, 4, 9, 16, 25])).toBe(1);
    expect(spearman([1, 2, 3, 4, 5], [5, 4, 3, 2, 1])).toBe(-1);
  });

  it("returns 0 for a constant series (documented convention; simple-statistics gives NaN)", () => {
    expect(spearman([3, 3, 3], [1, 2, 3])).toBe(0);
  });

  it("rejects NaN, unequal lengths and fewer than two values", () => {
    expect(() => ranks([1, Number.NaN])).toThrow("values[1] must be a number");
    expect(() => spearman([1, 2], [1])).toThrow("x and y must have the same length");
    expect(() => spearman([1], [1])).toThrow("x must have at least 2 values");
  });
});
