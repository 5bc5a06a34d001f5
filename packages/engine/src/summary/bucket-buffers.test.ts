import seedrandom from "seedrandom";
import { describe, expect, it } from "vitest";
import { sortIndicesByValue } from "./bucket-buffers.js";

/** The order weighted summaries pair weights by: value ascending, ties by member index. */
function referenceOrder(idx: number[], values: Float64Array): number[] {
  return [...idx].sort((a, b) => values[a]! - values[b]! || a - b);
}

describe("sortIndicesByValue", () => {
  it.each([1, 2, 31, 64, 65, 500, 1_000])("orders %i members by value, ties by index, as a comparator sort does", (count) => {
    const random = seedrandom(`sort-${count}`);
    const values = new Float64Array(2_000);
    // Values from a small set, so ties are common; some negative, some zero.
    for (let m = 0; m < values.length; m++) values[m] = Math.floor(random() * 20) / 4 - 2;
    const picked = Array.from({ length: values.length }, (_, m) => m)
      .filter(() => random() < 0.5)
      .slice(0, count);
    const idx = Uint32Array.from(picked);
    sortIndicesByValue(idx, values);
    expect(Array.from(idx)).toEqual(referenceOrder(picked, values));
  });
});

describe("sortIndicesByValue with many ties", () => {
  it("orders 20,000 members of three values by value, ties by index (the bunched early years of a run)", () => {
    const values = new Float64Array(40_000);
    for (let m = 0; m < values.length; m++) values[m] = [0, -1e-3, 2e-3][m % 3]!;
    const picked = Array.from({ length: 20_000 }, (_, k) => 2 * k);
    const idx = Uint32Array.from(picked);
    sortIndicesByValue(idx, values);
    expect(Array.from(idx)).toEqual(referenceOrder(picked, values));
  });
});
