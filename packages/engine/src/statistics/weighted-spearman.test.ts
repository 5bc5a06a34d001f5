import { sampleRankCorrelation } from "simple-statistics";
import { describe, expect, it } from "vitest";
import { createRandom } from "../random/create-random.js";
import { sortOrder, sortScratch } from "./sort-order.js";
import { weightedCorrelation, weightedMidRanks } from "./weighted-spearman.js";

/** Columns with ties (values rounded to a grid), so the tie rules are exercised. */
function columns(n: number, count: number, seed: string): Float64Array[] {
  const random = createRandom(seed);
  return Array.from({ length: count }, () => Float64Array.from({ length: n }, () => Math.round(random() * 50) / 10));
}

/** The plain definition: member indices sorted by value, ties by index (a comparator sort). */
const indexSort = (values: Float64Array) => Array.from(values.keys()).sort((a, b) => values[a]! - values[b]! || a - b);

describe("sortOrder and weightedMidRanks with reused working arrays", () => {
  it("one scratch and one order array sort column after column into the same orders as a comparator sort", () => {
    const scratch = sortScratch(2000);
    const order = new Uint32Array(2000);
    for (const column of columns(2000, 4, "reused-scratch")) {
      expect(Array.from(sortOrder(column, scratch))).toEqual(indexSort(column));
      expect(sortOrder(column, scratch, order)).toBe(order);
      expect(Array.from(order)).toEqual(indexSort(column));
    }
  });

  it("one ranks array reused across columns gives Spearman's coefficient (simple-statistics sampleRankCorrelation)", () => {
    const [x, y, z] = columns(1500, 3, "reused-ranks") as [Float64Array, Float64Array, Float64Array];
    const fresh = (v: Float64Array) => weightedMidRanks(v, sortOrder(v), null, v.length);
    const out = new Float64Array(x.length);
    const ry = fresh(y);
    // z's ranks go into `out` first, so x's must overwrite every one of them.
    weightedMidRanks(z, sortOrder(z), null, z.length, out);
    weightedMidRanks(x, sortOrder(x), null, x.length, out);
    expect(out).toEqual(fresh(x));
    expect(weightedCorrelation(out, ry, null, x.length)).toBeCloseTo(sampleRankCorrelation(Array.from(x), Array.from(y)), 12);
  });

  it("refuses working arrays of the wrong size, naming them", () => {
    const values = new Float64Array([3, 1, 2]);
    expect(() => sortOrder(values, sortScratch(4))).toThrow(/scratch must be sized for 3 values/);
    expect(() => sortOrder(values, sortScratch(3), new Uint32Array(5))).toThrow(/order must hold 3 members/);
    expect(() => weightedMidRanks(values, sortOrder(values), null, 3, new Float64Array(2))).toThrow(/out must hold 3 ranks/);
  });
});
