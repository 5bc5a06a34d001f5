import { describe, expect, it } from "vitest";
import { firstActiveIndex, paddedDomain } from "./chart-domains";

describe("paddedDomain", () => {
  it("starts a positive warming axis at 0 and pads the top by 4 % of the span", () => {
    expect(paddedDomain(0.2, 5, { includeZero: true })).toEqual([0, 5.2]);
  });

  it("stops just under a slightly negative minimum instead of rounding out to −1", () => {
    const [lo, hi] = paddedDomain(-0.3, 4.7, { includeZero: true });
    // Span 5, margin 0.2: the axis starts at −0.5, a kelvin's half above the old −1 K.
    expect(lo).toBeCloseTo(-0.5, 12);
    expect(hi).toBeCloseTo(4.9, 12);
  });

  it("pads a flat series so the axis still has height", () => {
    const [lo, hi] = paddedDomain(2, 2);
    expect(lo).toBeCloseTo(1.92, 12);
    expect(hi).toBeCloseTo(2.08, 12);
    expect(paddedDomain(0, 0)).toEqual([-0.5, 0.5]);
  });

  it("refuses bounds that are not numbers", () => {
    expect(() => paddedDomain(Number.NaN, 1)).toThrow(/finite bounds/);
  });
});

describe("firstActiveIndex", () => {
  const years = Array.from({ length: 251 }, (_, i) => 1850 + i); // 1850–2100

  it("starts ten years before the first non-zero chance, on a decade", () => {
    const p = years.map((y) => (y < 1987 ? 0 : 0.01));
    // First above zero in 1987; 1977 rounds down to 1970.
    expect(years[firstActiveIndex(years, [p])]).toBe(1970);
  });

  it("takes the earliest of several curves and ignores chances below the floor", () => {
    const low = years.map((y) => (y < 2001 ? 0.0001 : 0.2));
    const high = years.map((y) => (y < 2030 ? 0 : 0.05));
    expect(years[firstActiveIndex(years, [high, low])]).toBe(1990);
  });

  it("never starts before the asked start, and keeps the span when nothing rises", () => {
    const p = years.map(() => 0.5);
    expect(firstActiveIndex(years, [p], 50)).toBe(50);
    expect(firstActiveIndex(years, [years.map(() => 0)], 3)).toBe(3);
  });
});
