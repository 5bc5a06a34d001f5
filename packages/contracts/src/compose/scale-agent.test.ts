import { describe, expect, it } from "vitest";
import { createPathwayBodySchema } from "../api/pathways.js";
import { scaleAgent } from "./scale-agent.js";
import type { PathwayData } from "./pathway-data.js";

// Small invented pathway: 2000–2004, two forcing agents and CO2 as a concentration.
const base: PathwayData = {
  startYear: 2000,
  agents: {
    co2: { ppm: [370, 372, 374, 376, 378] },
    "aerosol-cloud": { erf: [-0.8, -0.75, -0.7, -0.65, -0.6] },
    solar: { erf: [0.01, -0.02, 0.03, 0, 0.05] },
  },
};

describe("scaleAgent", () => {
  it("scaling by 2 doubles every value of that agent and leaves the others untouched (closed form: 2·x)", () => {
    const out = scaleAgent(base, { kind: "scale", agent: "aerosol-cloud", factor: 2 });
    expect(out.agents["aerosol-cloud"]).toEqual({ erf: [-1.6, -1.5, -1.4, -1.3, -1.2] });
    expect(out.agents.co2).toBe(base.agents.co2);
    expect(out.agents.solar).toBe(base.agents.solar);
    expect(out.startYear).toBe(2000);
    expect(base.agents["aerosol-cloud"]).toEqual({ erf: [-0.8, -0.75, -0.7, -0.65, -0.6] }); // input not mutated
  });

  it("scales only the chosen years, both ends included", () => {
    const out = scaleAgent(base, { kind: "scale", agent: "co2", factor: 0.5, fromYear: 2001, toYear: 2003 });
    expect(out.agents.co2).toEqual({ ppm: [370, 186, 187, 188, 378] });
  });

  it("an open-ended range runs to the last year", () => {
    const out = scaleAgent(base, { kind: "scale", agent: "solar", factor: 10, fromYear: 2003 });
    expect(out.agents.solar).toEqual({ erf: [0.01, -0.02, 0.03, 0, 0.5] });
  });

  it("refuses an absent agent, years outside the pathway, a backwards range and a negative concentration, naming the field", () => {
    expect(() => scaleAgent(base, { kind: "scale", agent: "volcanic", factor: 2 })).toThrow(
      /^agent Volcanic is not in this pathway \(it carries CO2, Aerosol–cloud, Solar\)$/,
    );
    expect(() => scaleAgent(base, { kind: "scale", agent: "co2", factor: 2, fromYear: 1999 })).toThrow(
      /^fromYear 1999 lies outside the pathway's years 2000–2004$/,
    );
    expect(() => scaleAgent(base, { kind: "scale", agent: "co2", factor: 2, toYear: 2005 })).toThrow(/^toYear 2005 lies outside/);
    expect(() => scaleAgent(base, { kind: "scale", agent: "co2", factor: 2, fromYear: 2003, toYear: 2001 })).toThrow(
      /^toYear 2001 comes before fromYear 2003$/,
    );
    expect(() => scaleAgent(base, { kind: "scale", agent: "co2", factor: -1 })).toThrow(
      /^factor -1 would make the CO2 concentration \(ppm\) negative$/,
    );
  });

  it("the result passes the same create schema an upload goes through", () => {
    const out = scaleAgent(base, { kind: "scale", agent: "solar", factor: -3 });
    expect(createPathwayBodySchema.safeParse({ name: "n", source: "s", vintage: "v", ...out }).success).toBe(true);
  });
});
