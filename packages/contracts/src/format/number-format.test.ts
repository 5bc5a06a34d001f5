import { describe, expect, it } from "vitest";
import { formatFixed, formatMoney, formatProbability, formatSignificant, moneyScale, moneyUnit } from "./number-format.js";

describe("number formats", () => {
  it("writes three significant figures with the decimals they need (common practice for rounded figures)", () => {
    expect(formatSignificant(458_388_776 / 1e6)).toBe("458");
    expect(formatSignificant(4.3)).toBe("4.30");
    expect(formatSignificant(18.44)).toBe("18.4");
    expect(formatSignificant(1234)).toBe("1,230");
    expect(formatSignificant(0.012345)).toBe("0.0123");
    expect(formatSignificant(999.6)).toBe("1,000");
    expect(formatSignificant(-12.34, 3, true)).toBe("-12.3");
    expect(formatSignificant(12.34, 3, true)).toBe("+12.3");
    expect(formatSignificant(0)).toBe("0");
    expect(formatSignificant(Number.NaN)).toBe("–");
  });

  it("picks one money scale for a set by its largest amount and names the unit", () => {
    const scale = moneyScale([18_400_000, 455_000_000, null]);
    expect(scale).toEqual({ divisor: 1e6, suffix: "m" });
    expect(moneyUnit("EUR", scale)).toBe("EUR m");
    expect(formatMoney(458_388_776, scale)).toBe("458");
    expect(formatMoney(4_300_000, scale)).toBe("4.30");
    expect(moneyScale([2.5e9]).suffix).toBe("bn");
    expect(moneyUnit("GBP", moneyScale([950]))).toBe("GBP");
  });

  it("keeps the existing fixed and probability rules", () => {
    expect(formatFixed(-0.0004, 3)).toBe("0.000");
    expect(formatProbability(0.0048)).toBe("< 1 %");
    expect(formatProbability(0.9994)).toBe("> 99 %");
    expect(formatProbability(1)).toBe("100 %");
  });
});
