import { describe, expect, it } from "vitest";
import { medianChange } from "./median-change";

// Closed form: change = median / today − 1, rounded to a whole percent.
describe("medianChange", () => {
  it("writes the signed whole percentage of the median against today", () => {
    expect(medianChange(1150, 1000)).toBe("+15 %");
    expect(medianChange(950, 1000)).toBe("\u22125 %");
    expect(medianChange(20.4e6, 17.5e6)).toBe("+17 %"); // 1.1657… − 1
    expect(medianChange(1002, 1000)).toBe("±0 %");
  });

  it("gives no change without a positive figure for today", () => {
    expect(medianChange(1150, null)).toBeNull();
    expect(medianChange(1150, undefined)).toBeNull();
    expect(medianChange(1150, 0)).toBeNull();
    expect(medianChange(undefined, 1000)).toBeNull();
  });
});
