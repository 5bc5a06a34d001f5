import { describe, expect, it } from "vitest";
import { evaluateComposeDrafts } from "./evaluate-compose-drafts";
import type { StepDraft } from "./compose-step-draft";

// Invented pathways over 2000–2003.
const base = { startYear: 2000, agents: { co2: { erf: [1, 2, 3, 4] } } };
const other = { startYear: 2000, agents: { co2: { erf: [5, 5, 5, 5] } } };

describe("evaluateComposeDrafts", () => {
  it("applies valid steps in order and returns the checked steps for the recipe", () => {
    const drafts: StepDraft[] = [
      { key: "a", kind: "scale", agent: "co2", factor: "2", fromYear: "", toYear: "" },
      { key: "b", kind: "extend", toYear: "2005", method: "linear", fitYears: "4" },
    ];
    const out = evaluateComposeDrafts(base, drafts, () => undefined);
    expect(out.states.map((s) => s.status)).toEqual(["applied", "applied"]);
    // 2·[1,2,3,4] = [2,4,6,8], a line of slope 2 continued exactly.
    expect(out.result?.agents.co2).toEqual({ erf: [2, 4, 6, 8, 10, 12] });
    expect(out.steps).toEqual([
      { kind: "scale", agent: "co2", factor: 2 },
      { kind: "extend", toYear: 2005, method: "linear", fitYears: 4 },
    ]);
  });

  it("waits for another pathway's numbers, then blocks the steps after it", () => {
    const drafts: StepDraft[] = [
      { key: "a", kind: "blend", otherPathwayId: "other", weight: "0.5" },
      { key: "b", kind: "scale", agent: "co2", factor: "2", fromYear: "", toYear: "" },
    ];
    const waiting = evaluateComposeDrafts(base, drafts, () => undefined);
    expect(waiting.states).toEqual([{ status: "loading" }, { status: "blocked", reason: "waits for step 1" }]);
    expect(waiting.result).toBeUndefined();
    const ready = evaluateComposeDrafts(base, drafts, (id) => (id === "other" ? other : undefined));
    expect(ready.result?.agents.co2).toEqual({ erf: [6, 7, 8, 9] });
  });

  it("puts a refused step's message under the field it names", () => {
    const drafts: StepDraft[] = [{ key: "a", kind: "extend", toYear: "2003", method: "hold", fitYears: "" }];
    expect(evaluateComposeDrafts(base, drafts, () => undefined).states).toEqual([
      { status: "failed", errors: { toYear: "2003 must come after the pathway's last year 2003" } },
    ]);
  });
});
