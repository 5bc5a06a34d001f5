import { describe, expect, it } from "vitest";
import {
  formatDate,
  formatDateTime,
  formatFixed,
  formatNumber,
  formatPercent,
  formatProbability,
  formatProbabilityTenths,
  percentileHeading,
} from "./format";

// Expected strings follow Number.prototype.toFixed (ECMAScript spec: -0.0004.toFixed(3) is "-0.000"),
// with the minus dropped only where the rounded value is zero.
describe("formatFixed", () => {
  it("drops the minus of a value that rounds to zero", () => {
    expect(formatFixed(-0.0004, 3)).toBe("0.000");
    expect(formatFixed(-0, 3)).toBe("0.000");
    expect(formatFixed(-1e-12, 0)).toBe("0");
  });

  it("keeps the minus of a value that does not round to zero", () => {
    expect(formatFixed(-0.0006, 3)).toBe("-0.001");
    expect(formatFixed(-10.5, 1)).toBe("-10.5");
    expect(formatFixed(0.0004, 3)).toBe("0.000");
  });

  it("is what the shared number and percent formats use", () => {
    expect(formatNumber(-0.001, 2)).toBe("0.00");
    expect(formatPercent(-0.00001, 1)).toBe("0.0 %");
  });
});

// English ordinal suffixes (common practice): 1st 2nd 3rd, but 11th 12th 13th.
describe("percentileHeading", () => {
  it("names the standard percentiles with ordinals", () => {
    expect(["p5", "p17", "p50", "p83", "p95"].map(percentileHeading)).toEqual(["5th pct", "17th pct", "50th pct", "83rd pct", "95th pct"]);
  });
  it("handles 1st, 2nd, 11th–13th and 99.5th", () => {
    expect(["p1", "p2", "p11", "p12", "p13", "p21", "p99.5"].map(percentileHeading)).toEqual([
      "1st pct",
      "2nd pct",
      "11th pct",
      "12th pct",
      "13th pct",
      "21st pct",
      "99.5th pct",
    ]);
  });
});

// Shares of ensemble members: 24 of 5,000 members is 0.48 %, 4,997 of 5,000 is 99.94 %.
describe("formatProbability", () => {
  it("keeps a rare but possible outcome visible instead of rounding it to 0 % or 100 %", () => {
    expect(formatProbability(24 / 5000)).toBe("< 1 %");
    expect(formatProbability(4997 / 5000)).toBe("> 99 %");
  });

  it("prints exact none, exact all and ordinary shares as whole percents", () => {
    expect([0, 1, 0.005, 0.2132, 0.9949].map(formatProbability)).toEqual(["0 %", "100 %", "1 %", "21 %", "99 %"]);
    expect(formatProbability(undefined)).toBe("–");
  });
});

describe("formatProbabilityTenths", () => {
  it("prints a vanishing weighted chance as < 0.1 %, never in scientific notation", () => {
    // String(5e-109) is "5e-109" (ECMAScript Number::toString); the screen must not show that.
    expect(formatProbabilityTenths(5e-109)).toBe("< 0.1 %");
    expect(formatProbabilityTenths(0.00049)).toBe("< 0.1 %");
    expect(formatProbabilityTenths(1 - 1e-6)).toBe("> 99.9 %");
  });

  it("prints exact none, exact all and ordinary shares to a tenth of a percent", () => {
    expect([0, 1, 0.0005, 0.123456, 0.9994].map(formatProbabilityTenths)).toEqual(["0.0 %", "100.0 %", "0.1 %", "12.3 %", "99.9 %"]);
    expect(formatProbabilityTenths(Number.NaN)).toBe("–");
  });
});

describe("formatDateTime and formatDate", () => {
  // Offsets resolved by hand from the ISO 8601 offset rule (local time minus offset = UTC).
  it("writes every moment in UTC and says so", () => {
    expect(formatDateTime("2026-12-05T14:03:59.999Z")).toBe("2026-12-05 14:03 UTC");
    expect(formatDateTime("2026-12-05T23:30:00+02:00")).toBe("2026-12-05 21:30 UTC");
    expect(formatDateTime("2026-12-06T00:30:00+01:00")).toBe("2026-12-05 23:30 UTC");
  });

  it("takes the day in UTC too, so a date and its time agree", () => {
    expect(formatDate("2026-12-06T00:30:00+01:00")).toBe("5 Dec 2026");
    expect(formatDate("2026-01-31T23:59:00Z")).toBe("31 Jan 2026");
  });

  it("reads the same whatever zone the browser is in", () => {
    const before = process.env.TZ;
    try {
      process.env.TZ = "Pacific/Auckland";
      expect(new Date("2026-12-05T14:03:00Z").getHours()).toBe(3); // NZDT is UTC+13 in December: the zone did change
      expect(formatDateTime("2026-12-05T14:03:00Z")).toBe("2026-12-05 14:03 UTC");
      expect(formatDate("2026-12-05T14:03:00Z")).toBe("5 Dec 2026");
    } finally {
      if (before === undefined) delete process.env.TZ;
      else process.env.TZ = before;
    }
  });

  it("shows a dash for no time and gives back text that is not a time rather than inventing one", () => {
    expect(formatDateTime(null)).toBe("–");
    expect(formatDateTime("soon")).toBe("soon");
    expect(formatDate(undefined)).toBe("–");
  });
});
