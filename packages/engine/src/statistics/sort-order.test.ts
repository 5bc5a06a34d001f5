import { describe, expect, it } from "vitest";
import { createRandom } from "../random/create-random.js";
import { sortOrder, sortScratch } from "./sort-order.js";

/** The plain definition: member indices sorted by value, ties by index (a comparator sort on a − b, so −0 ties +0). */
const indexSort = (values: Float64Array) => Array.from(values.keys()).sort((a, b) => values[a]! - values[b]! || a - b);

describe("sortOrder", () => {
  it("orders signed values, zeros of both signs, infinities and subnormals as a comparator sort does", () => {
    const special = [0, -0, 1, -1, Infinity, -Infinity, 5e-324, -5e-324, Number.MAX_VALUE, -Number.MAX_VALUE, 1e-300, -2.5];
    const random = createRandom("sort-order-special");
    const values = Float64Array.from({ length: 3_000 }, () =>
      random() < 0.5 ? special[Math.floor(random() * special.length)]! : (random() - 0.5) * 10 ** Math.floor(random() * 12 - 6),
    );
    expect(Array.from(sortOrder(values))).toEqual(indexSort(values));
  });

  it("gives a comparator sort's order for 100,000 normal-like values, and again with the same working arrays", () => {
    const random = createRandom("sort-order-large");
    const scratch = sortScratch(100_000);
    for (let round = 0; round < 2; round++) {
      const values = Float64Array.from({ length: 100_000 }, () => random() + random() + random() - 1.5);
      expect(Array.from(sortOrder(values, scratch))).toEqual(indexSort(values));
    }
  });

  it("keeps index order when every value is the same (every radix pass skipped)", () => {
    expect(Array.from(sortOrder(new Float64Array(10).fill(2.5)))).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8, 9]);
    expect(Array.from(sortOrder(new Float64Array(0)))).toEqual([]);
  });
});
