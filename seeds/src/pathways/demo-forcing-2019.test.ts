import { describe, expect, it } from "vitest";
import { demoPathways } from "./harbourline-pathways.js";

/**
 * The demo pathways against the assessed 2019 forcing. IPCC AR6 WGI SPM A.4.1 (also Forster et
 * al. 2021, Chapter 7 Table 7.8): total anthropogenic ERF 1750–2019 = 2.72 [1.96 to 3.48] W m-2,
 * 5–95 % range, from a Monte Carlo combination of independent per-agent uncertainties.
 */
const AR6_TOTAL = { central: 2.72, low: 1.96, high: 3.48 };
const ANTHROPOGENIC = ["co2", "ch4", "n2o", "other-wmghg", "ozone", "aerosol-radiation", "aerosol-cloud", "land-use", "other"] as const;
const at2019 = (series: number[]) => series[2019 - 1750]!;

describe("demo pathways' 2019 forcing", () => {
  it("adds up to AR6's total anthropogenic ERF in every ERF pathway (the smaller categories included)", () => {
    for (const p of demoPathways.filter((x) => x.key !== "harbourline-middle-gases")) {
      const total = ANTHROPOGENIC.reduce((sum, agent) => sum + at2019((p.agents[agent] as { erf: number[] }).erf), 0);
      // Each agent is stored to 1e-4 W m-2; nine of them.
      expect(Math.abs(total - AR6_TOTAL.central)).toBeLessThan(1e-3);
    }
  });

  it("carries stratospheric water vapour, particles on snow and ice and contrails as `other` = 0.19 W m-2 in 2019", () => {
    // AR6 Table 7.8 rows, from memory: 0.05 + 0.08 + 0.06.
    for (const p of demoPathways) expect(at2019((p.agents.other as { erf: number[] }).erf)).toBeCloseTo(0.19, 4);
  });
});
