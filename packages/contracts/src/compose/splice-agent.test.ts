import { describe, expect, it } from "vitest";
import { spliceAgent } from "./splice-agent.js";
import type { PathwayData } from "./pathway-data.js";

// Invented pathways: the base runs 2000–2005, the source 1998–2003 with recognisable values.
const base: PathwayData = {
  startYear: 2000,
  agents: { ozone: { erf: [1, 2, 3, 4, 5, 6] }, ch4: { ppb: [1700, 1710, 1720, 1730, 1740, 1750] } },
};
const source: PathwayData = {
  startYear: 1998,
  agents: { ozone: { erf: [-98, -99, -100, -101, -102, -103] }, ch4: { erf: [0.5, 0.5, 0.5, 0.5, 0.5, 0.5] } },
};

describe("spliceAgent", () => {
  it("replaces exactly the chosen years with the source's values for the same calendar years", () => {
    const out = spliceAgent(base, { kind: "splice", agent: "ozone", sourcePathwayId: "s", fromYear: 2001, toYear: 2002 }, source);
    // Source year 2001 is its index 3 (-101), 2002 its index 4 (-102); 2000 and 2003–2005 keep the base values.
    expect(out.agents.ozone).toEqual({ erf: [1, -101, -102, 4, 5, 6] });
    expect(out.agents.ch4).toBe(base.agents.ch4);
  });

  it("a one-year splice changes one value only", () => {
    const out = spliceAgent(base, { kind: "splice", agent: "ozone", sourcePathwayId: "s", fromYear: 2003, toYear: 2003 }, source);
    expect(out.agents.ozone).toEqual({ erf: [1, 2, 3, -103, 5, 6] });
  });

  it("refuses years the source does not cover, naming them", () => {
    expect(() => spliceAgent(base, { kind: "splice", agent: "ozone", sourcePathwayId: "s", fromYear: 2002, toYear: 2005 }, source)).toThrow(
      /^sourcePathwayId covers 1998–2003 only; years 2004–2005 of the splice are not in it$/,
    );
  });

  it("refuses an agent given in another quantity, or missing on either side", () => {
    expect(() => spliceAgent(base, { kind: "splice", agent: "ch4", sourcePathwayId: "s", fromYear: 2000, toYear: 2001 }, source)).toThrow(
      /gives CH4 as erf but this pathway gives it as ppb/,
    );
    expect(() => spliceAgent(base, { kind: "splice", agent: "solar", sourcePathwayId: "s", fromYear: 2000, toYear: 2001 }, source)).toThrow(
      /^agent Solar is not in this pathway/,
    );
    expect(() =>
      spliceAgent(
        source,
        { kind: "splice", agent: "ozone", sourcePathwayId: "b", fromYear: 1998, toYear: 1999 },
        { startYear: 1998, agents: { solar: { erf: [0, 0] } } },
      ),
    ).toThrow(/^sourcePathwayId carries no Ozone series \(it carries Solar\)$/);
  });
});
