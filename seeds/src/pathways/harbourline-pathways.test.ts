import { createModelVersionBodySchema, createPathwayBodySchema, pathwaySpecSchema } from "@plumeline/contracts";
import { describe, expect, it } from "vitest";
import { demoModelVersions } from "../model-versions/harbourline-core.js";
import { demoPathways } from "./harbourline-pathways.js";

const at = (series: number[], year: number) => series[year - 1750]!;

describe("demo pathways", () => {
  it("are valid engine pathway specs, 1750–2100, one value per year", () => {
    for (const p of demoPathways) {
      expect(pathwaySpecSchema.safeParse({ id: p.key, name: p.name, startYear: p.startYear, agents: p.agents }).success).toBe(true);
      const { key: _key, ...body } = p;
      expect(createPathwayBodySchema.safeParse(body).error?.issues ?? []).toEqual([]);
      for (const s of Object.values(p.agents)) expect(Object.values(s)[0]!.length).toBe(351);
      expect(p.description).toContain("ILLUSTRATIVE");
      expect(p.source).toContain("AR6");
    }
  });

  it("reach the AR6 2019 ERFs they cite and start from zero in 1750", () => {
    // IPCC AR6 WGI Ch. 7 Table 7.8 (Forster et al. 2021) / TS Section TS.2.2: ERF 2019 vs 1750, W m-2.
    const anchors = { co2: 2.16, ch4: 0.54, n2o: 0.21, "other-wmghg": 0.41, ozone: 0.47, "aerosol-radiation": -0.22, "aerosol-cloud": -0.84, "land-use": -0.2 };
    for (const p of demoPathways.filter((x) => x.key !== "harbourline-middle-gases"))
      for (const [agent, value] of Object.entries(anchors)) {
        const erf = (p.agents[agent as keyof typeof p.agents] as { erf: number[] }).erf;
        expect(at(erf, 2019)).toBeCloseTo(value, 4);
        expect(at(erf, 1750)).toBeCloseTo(0, 4);
      }
  });

  it("give the AR6 1750 and 2019 concentrations in the gas pathway", () => {
    // AR6 WGI TS Section TS.2.2: 2019 = 409.9 ppm, 1866.3 ppb, 332.1 ppb; 1750 by subtraction (1750 CH4 from memory).
    const p = demoPathways.find((x) => x.key === "harbourline-middle-gases")!;
    const co2 = (p.agents.co2 as { ppm: number[] }).ppm;
    const ch4 = (p.agents.ch4 as { ppb: number[] }).ppb;
    const n2o = (p.agents.n2o as { ppb: number[] }).ppb;
    expect([at(co2, 1750), at(co2, 2019)]).toEqual([278.3, 409.9]);
    expect([at(ch4, 1750), at(ch4, 2019)]).toEqual([729.2, 1866.3]);
    expect([at(n2o, 1750), at(n2o, 2019)]).toEqual([270.1, 332.1]);
  });

  it("order the three stories by 2100 CO2 forcing: Low < Middle < High", () => {
    const co2In2100 = (key: string) => at((demoPathways.find((p) => p.key === key)!.agents.co2 as { erf: number[] }).erf, 2100);
    expect(co2In2100("harbourline-low")).toBeLessThan(co2In2100("harbourline-middle"));
    expect(co2In2100("harbourline-middle")).toBeLessThan(co2In2100("harbourline-high"));
  });
});

describe("demo model versions", () => {
  it("are valid create bodies with AR6-sourced ranges", () => {
    for (const v of demoModelVersions) {
      const { pathwayKeys: _keys, ...body } = v.body;
      expect(createModelVersionBodySchema.safeParse(body).success).toBe(true);
    }
    const v1 = demoModelVersions[0]!.body.model;
    // AR6 SPM A.4.4: ECS very likely 2–5 K, best 3 K. AR6 Table 7.8: aerosol–cloud −0.84 [−1.45, −0.25].
    expect(v1.climate.ecs).toMatchObject({ p50: 3, low: 2, high: 5, coverage: 90 });
    expect(v1.agents?.["aerosol-cloud"]?.scale).toMatchObject({ p50: 1, low: 0.298, high: 1.726 });
  });
});
