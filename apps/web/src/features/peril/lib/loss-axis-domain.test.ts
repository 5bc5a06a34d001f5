import { describe, expect, it } from "vitest";
import { lossAxisDomain } from "./loss-axis-domain";

// Expected ranges are worked by hand from the rule in the doc comment: [min − 15 % span, max + 15 % span].
describe("lossAxisDomain", () => {
  it("spans an 18–22 m band and today's 20 m AAL with 15 % of the span either side", () => {
    const { domain, fromZero } = lossAxisDomain([18e6, 22e6, 20e6]);
    expect(fromZero).toBe(false);
    expect(domain[0]).toBeCloseTo(17.4e6, 0);
    expect(domain[1]).toBeCloseTo(22.6e6, 0);
  });

  it("reaches down to today's AAL when it lies below every projection", () => {
    const { domain } = lossAxisDomain([18e6, 22e6, 15e6]);
    expect(domain[0]).toBeCloseTo(15e6 - 0.15 * 7e6, 0);
  });

  it("keeps zero when the values come near it", () => {
    expect(lossAxisDomain([100, 2000])).toEqual({ domain: [0, 2000 + 0.15 * 1900], fromZero: true });
  });

  it("pads a single value by 5 % of it", () => {
    const { domain } = lossAxisDomain([1000, 1000]);
    expect(domain[0]).toBeCloseTo(950, 9);
    expect(domain[1]).toBeCloseTo(1050, 9);
  });

  it("ignores missing values and falls back to 0–1 with none", () => {
    expect(lossAxisDomain([Number.NaN])).toEqual({ domain: [0, 1], fromZero: true });
  });
});
