import { quantileSorted as d3QuantileSorted } from "d3-array";
import { describe, expect, it } from "vitest";
import { createRandom } from "../random/create-random.js";
import { quantileSorted } from "./quantile-sorted.js";

describe("quantileSorted (R type 7)", () => {
  it("equals d3-array quantileSorted (R-7) on random data for many p", () => {
    // Reference: d3-array quantileSorted, documented as R-7 / Excel PERCENTILE.INC.
    const random = createRandom("quantile-sorted");
    for (const n of [2, 3, 10, 101, 1000]) {
      const sorted = Float64Array.from({ length: n }, () => random() * 10 - 3).sort();
      for (const p of [0.001, 0.05, 0.17, 0.25, 0.5, 0.83, 0.95, 0.999, random()]) {
        expect(quantileSorted(sorted, p)).toBe(d3QuantileSorted(Array.from(sorted), p));
      }
    }
  });

  it("matches R's quantile(c(1, 2, 3, 4), 0.5, type = 7) = 2.5 and the NumPy docs example", () => {
    expect(quantileSorted([1, 2, 3, 4], 0.5)).toBe(2.5);
    // NumPy percentile docs: a = [[10, 7, 4], [3, 2, 1]] → np.percentile(a, 50) = 3.5.
    expect(quantileSorted([1, 2, 3, 4, 7, 10], 0.5)).toBe(3.5);
  });

  it("handles the edges: one member, p = 0 and p = 1", () => {
    expect(quantileSorted([4.2], 0.3)).toBe(4.2);
    expect(quantileSorted([1, 5, 9], 0)).toBe(1);
    expect(quantileSorted([1, 5, 9], 1)).toBe(9);
  });

  it("rejects empty input, NaN p and p outside [0, 1]", () => {
    expect(() => quantileSorted([], 0.5)).toThrow(new RangeError("sorted must not be empty"));
    expect(() => quantileSorted([1, 2], Number.NaN)).toThrow(new RangeError("p must be in [0, 1]"));
    expect(() => quantileSorted([1, 2], 1.01)).toThrow(RangeError);
    expect(() => quantileSorted([1, 2], -0.01)).toThrow(RangeError);
  });
});
