import { describe, expect, it } from "vitest";
import { blendPathways } from "./blend-pathways.js";
import type { PathwayData } from "./pathway-data.js";

// Invented pathways over 2000–2003.
const a: PathwayData = {
  startYear: 2000,
  agents: { co2: { erf: [1.1, 1.2, 1.3, 1.4] }, volcanic: { erf: [-0.3, 0, -1.7, 0] }, n2o: { ppb: [316, 317, 318, 319] } },
};
const b: PathwayData = {
  startYear: 2000,
  agents: { co2: { erf: [2.1, 2.3, 2.5, 2.7] }, solar: { erf: [0.05, 0, -0.05, 0] }, n2o: { ppb: [320, 322, 324, 326] } },
};
const blend = (weight: number, x = a, y = b) => blendPathways(x, { kind: "blend", otherPathwayId: "b", weight }, y);

describe("blendPathways", () => {
  it("weight 1 returns the pathway so far and weight 0 the other pathway, exactly", () => {
    expect(blend(1)).toEqual(a);
    expect(blend(0)).toEqual(b);
  });

  it("weight w gives w·A + (1−w)·B per agent and year; an ERF agent absent on one side counts as 0", () => {
    const out = blend(0.25);
    const expected = (x: number, y: number) => 0.25 * x + 0.75 * y;
    expect(out.agents.co2).toEqual({ erf: [expected(1.1, 2.1), expected(1.2, 2.3), expected(1.3, 2.5), expected(1.4, 2.7)] });
    expect(out.agents.n2o).toEqual({ ppb: [319, 320.75, 322.5, 324.25] });
    expect(out.agents.volcanic).toEqual({ erf: [expected(-0.3, 0), 0, expected(-1.7, 0), 0] });
    expect(out.agents.solar).toEqual({ erf: [expected(0, 0.05), 0, expected(0, -0.05), 0] });
  });

  it("weight 0.5 of a pathway with itself returns it (the mean of equal values)", () => {
    expect(blend(0.5, a, a)).toEqual(a);
  });

  it("refuses pathways over different years, naming the years each holds alone", () => {
    const longer: PathwayData = { startYear: 1998, agents: { co2: { erf: [0, 0, 1, 1, 1, 1, 1] } } };
    expect(() => blend(0.5, a, longer)).toThrow(
      /^otherPathwayId covers 1998–2004 but the pathway so far covers 2000–2003: years 1998–1999 and 2004 are only in the other pathway\. A blend needs the same years/,
    );
    const shifted: PathwayData = { startYear: 2001, agents: { co2: { erf: [0, 0, 0, 0] } } };
    expect(() => blend(0.5, a, shifted)).toThrow(/years 2000 are only in the pathway so far; years 2004 are only in the other pathway/);
  });

  it("refuses a concentration present on one side only, and mixed quantities", () => {
    const noN2o: PathwayData = { startYear: 2000, agents: { co2: { erf: [0, 0, 0, 0] } } };
    expect(() => blend(0.5, a, noN2o)).toThrow(/N2O is given as a concentration \(ppb\) in only the pathway so far/);
    const n2oErf: PathwayData = { startYear: 2000, agents: { n2o: { erf: [0.2, 0.2, 0.2, 0.2] } } };
    expect(() => blend(0.5, a, n2oErf)).toThrow(/gives N2O as erf but the pathway so far gives it as ppb/);
  });
});
