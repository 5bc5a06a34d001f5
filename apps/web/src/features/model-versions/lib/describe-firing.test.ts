import { describe, expect, it } from "vitest";
import { describeFiring } from "./describe-firing";

const base = { pathwayId: "p", pathwayName: "Harbourline Middle", year: 2050, warmingThreshold: null, limit: 0.1 } as const;

describe("describeFiring", () => {
  it("reads like the API's sentence, with the decimal that passes the limit", () => {
    expect(describeFiring({ ...base, metric: "median-shift", value: 0.14, unit: "K" })).toBe("median shift +0.14 K > 0.1 K on Harbourline Middle 2050");
    expect(describeFiring({ ...base, metric: "median-shift", value: 0.1042, unit: "K" })).toBe("median shift +0.104 K > 0.1 K on Harbourline Middle 2050");
    expect(describeFiring({ ...base, metric: "exceedance", warmingThreshold: 1.5, value: -6.24, limit: 5, unit: "pts", year: 2030 })).toBe(
      "P(>1.5 K) change −6.2 pts > 5 pts on Harbourline Middle 2030",
    );
  });
});
