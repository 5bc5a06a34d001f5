import { describe, expect, it } from "vitest";
import { percentileValues } from "./preview-percentiles";

describe("percentileValues", () => {
  it("gives the 5/17/50/83/95 values of a normal input", () => {
    // SciPy: scipy.stats.norm.ppf([0.05, 0.17, 0.5, 0.83, 0.95], 3, 0.5)
    const expected = [2.177573186524264, 2.522917373426903, 3, 3.477082626573097, 3.822426813475736];
    const values = percentileValues({ type: "normal", mean: 3, sd: 0.5 });
    expect(values.map((v) => v.p)).toEqual([5, 17, 50, 83, 95]);
    values.forEach((v, i) => expect(v.value).toBeCloseTo(expected[i]!, 12));
  });

  it("reproduces a published range's ends and median", () => {
    const values = percentileValues({ type: "range", p50: 3, low: 2, high: 5, coverage: 90, shape: "lognormal" });
    expect(values[0]!.value).toBeCloseTo(2, 12);
    expect(values[2]!.value).toBeCloseTo(3, 12);
    expect(values[4]!.value).toBeCloseTo(5, 12);
  });
});
