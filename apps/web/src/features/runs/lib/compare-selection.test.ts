import { describe, expect, it } from "vitest";
import { readCompareSelection, writeCompareSelection } from "./compare-selection";

describe("compare selection in the address", () => {
  it("reads ?runs=a,b,c with pathways aligned to them", () => {
    expect(readCompareSelection(new URLSearchParams("runs=a,b,c&pathways=,p2,"))).toEqual([
      { runId: "a", pathwayId: "" },
      { runId: "b", pathwayId: "p2" },
      { runId: "c", pathwayId: "" },
    ]);
  });

  it("keeps at least two slots, at most four, and opens older ?a=&b= links", () => {
    expect(readCompareSelection(new URLSearchParams("runs=a"))).toHaveLength(2);
    expect(readCompareSelection(new URLSearchParams("runs=a,b,c,d,e"))).toHaveLength(4);
    expect(readCompareSelection(new URLSearchParams("a=x&b=y&pb=q"))).toEqual([
      { runId: "x", pathwayId: "" },
      { runId: "y", pathwayId: "q" },
    ]);
  });

  it("writes back what it reads", () => {
    const slots = readCompareSelection(new URLSearchParams("runs=a,b,c&pathways=,p2,"));
    expect(writeCompareSelection(slots)).toBe("runs=a,b,c&pathways=,p2,");
    expect(readCompareSelection(new URLSearchParams(writeCompareSelection(slots)))).toEqual(slots);
    expect(
      writeCompareSelection([
        { runId: "a", pathwayId: "" },
        { runId: "", pathwayId: "" },
      ]),
    ).toBe("runs=a,");
  });
});
