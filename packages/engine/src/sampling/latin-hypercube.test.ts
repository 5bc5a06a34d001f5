import { describe, expect, it } from "vitest";
import { createRandom } from "../random/create-random.js";
import { latinHypercube, latinHypercubeColumnInto } from "./latin-hypercube.js";
import { monteCarloColumnInto, monteCarloUniforms } from "./monte-carlo.js";

function isPermutationOfStrata(column: Float64Array): boolean {
  const n = column.length;
  const seen = new Uint8Array(n);
  for (const u of column) {
    const stratum = Math.floor(n * u);
    if (stratum < 0 || stratum >= n || seen[stratum] === 1) return false;
    seen[stratum] = 1;
  }
  return true;
}

describe("latinHypercube", () => {
  it.each([1, 2, 7, 1000, 100_000])("puts exactly one value in each stratum per column, n = %i (McKay et al. 1979)", (n) => {
    // McKay, Beckman & Conover 1979; SciPy scipy.stats.qmc.LatinHypercube docs: floor(n·u) of every column is a
    // permutation of 0 … n−1.
    const columns = latinHypercube(n, 3, createRandom(`lhs-${n}`));
    expect(columns).toHaveLength(3);
    for (const column of columns) {
      expect(column).toHaveLength(n);
      expect(isPermutationOfStrata(column)).toBe(true);
      let min = 1;
      let max = 0;
      for (const u of column) {
        min = Math.min(min, u);
        max = Math.max(max, u);
      }
      expect(min).toBeGreaterThan(0);
      expect(max).toBeLessThan(1);
    }
  });

  it("keeps each column mean within 1/(2n) of 1/2 (stratification), unlike plain Monte Carlo's 1/√(12n)", () => {
    // Mean of (π(i) + U_i)/n is (n − 1)/(2n) + mean(U)/n, so |mean − 1/2| < 1/(2n) always.
    const n = 500;
    for (const column of latinHypercube(n, 4, createRandom("lhs-mean"))) {
      const mean = column.reduce((s, u) => s + u, 0) / n;
      expect(Math.abs(mean - 0.5)).toBeLessThan(1 / (2 * n));
    }
  });

  it("pairs the columns independently (different permutations, near-zero correlation)", () => {
    const [a, b] = latinHypercube(10_000, 2, createRandom("lhs-pairing")) as [Float64Array, Float64Array];
    let cross = 0;
    for (let i = 0; i < a.length; i++) cross += (a[i]! - 0.5) * (b[i]! - 0.5);
    const correlation = cross / a.length / (1 / 12);
    // Independent columns: correlation has sd 1/√n = 0.01; allow 4 sd.
    expect(Math.abs(correlation)).toBeLessThan(0.04);
  });

  it("repeats for the same seed and rejects bad sizes", () => {
    expect(latinHypercube(50, 2, createRandom("x"))).toEqual(latinHypercube(50, 2, createRandom("x")));
    expect(latinHypercube(5, 0, createRandom("x"))).toEqual([]);
    expect(() => latinHypercube(0, 2, createRandom("x"))).toThrow("members must be an integer ≥ 1");
    expect(() => latinHypercube(2.5, 2, createRandom("x"))).toThrow("members must be an integer ≥ 1");
    expect(() => latinHypercube(5, -1, createRandom("x"))).toThrow("dimensions must be an integer ≥ 0");
  });

  it("stays in its stratum even with a source that returns values just below 1", () => {
    // A worst-case source: 1 − 2^-53 rounds (k + U)/n up to (k + 1)/n for large k.
    const nearOne = () => 1 - 2 ** -53;
    expect(isPermutationOfStrata(latinHypercube(100_000, 1, nearOne)[0]!)).toBe(true);
  });
});

describe("monteCarloUniforms", () => {
  it("fills columns one after another from the stream", () => {
    const columns = monteCarloUniforms(3, 2, createRandom("mc"));
    const stream = createRandom("mc");
    const expected = Array.from({ length: 6 }, stream);
    expect(Array.from(columns[0]!)).toEqual(expected.slice(0, 3));
    expect(Array.from(columns[1]!)).toEqual(expected.slice(3, 6));
  });

  it("has uniform moments: mean 1/2 and variance 1/12 within sampling error", () => {
    const n = 100_000;
    const [column] = monteCarloUniforms(n, 1, createRandom("mc-moments")) as [Float64Array];
    const mean = column.reduce((s, u) => s + u, 0) / n;
    const variance = column.reduce((s, u) => s + (u - mean) ** 2, 0) / n;
    // Standard errors: √(1/12/n) = 9.1e-4 for the mean; √(1/180/n) = 2.4e-4 for the variance
    // (Var (U − ½)² = 1/80 − 1/144 = 1/180). Bounds of 5 standard errors: a false alarm has
    // probability below 1e-6, and this seed's variance happens to sit 4.1 standard errors out.
    expect(Math.abs(mean - 0.5)).toBeLessThan(5 * Math.sqrt(1 / 12 / n));
    expect(Math.abs(variance - 1 / 12)).toBeLessThan(5 * Math.sqrt(1 / 180 / n));
  });

  it("draws a column into a given array with the same stream use as the allocating forms", () => {
    // The engine samples each input straight into its (shared) column; the draws must be
    // those of latinHypercube / monteCarloUniforms with one dimension, value for value.
    const n = 1_001;
    const lhs = latinHypercubeColumnInto(new Float64Array(n), createRandom("into"));
    expect(Array.from(lhs)).toEqual(Array.from(latinHypercube(n, 1, createRandom("into"))[0]!));
    expect(isPermutationOfStrata(lhs)).toBe(true);
    const mc = monteCarloColumnInto(new Float64Array(n), createRandom("into"));
    expect(Array.from(mc)).toEqual(Array.from(monteCarloUniforms(n, 1, createRandom("into"))[0]!));
    expect(mc).not.toEqual(lhs);
  });
});
