import { describe, expect, it } from "vitest";
import { alignOnYears } from "./align-years";
import { forcingTotal } from "./forcing-total";
import { nameSeriesYear } from "./series-error-paths";

describe("alignOnYears", () => {
  it("puts series on the union of their years, NaN where one has no value", () => {
    const out = alignOnYears([
      { startYear: 2000, values: [1, 2] },
      { startYear: 2001, values: [5, 6, 7] },
    ]);
    expect(out.years).toEqual([2000, 2001, 2002, 2003]);
    expect(out.values).toEqual([
      [1, 2, NaN, NaN],
      [NaN, 5, 6, 7],
    ]);
  });
});

describe("forcingTotal", () => {
  it("adds the ERF agents year by year and names the agents given as concentrations", () => {
    const out = forcingTotal({
      startYear: 2000,
      agents: { co2: { ppm: [400, 401] }, ozone: { erf: [0.5, 0.25] }, "aerosol-cloud": { erf: [-1, -0.5] } },
    });
    expect(out).toEqual({ total: [-0.5, -0.25], concentrationAgents: ["co2"] });
  });
});

describe("nameSeriesYear", () => {
  it("turns a value's index into the year it stands for, and leaves other paths alone", () => {
    expect(nameSeriesYear("agents.co2.ppm[12]", 1850)).toBe("agents.co2.ppm, year 1862");
    expect(nameSeriesYear("agents.aerosol-cloud.erf.0", 2000)).toBe("agents.aerosol-cloud.erf, year 2000");
    expect(nameSeriesYear("name", 2000)).toBe("name");
  });
});
