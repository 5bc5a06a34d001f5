import { describe, expect, it } from "vitest";
import { changedAgents, composePathway } from "./apply-recipe.js";
import { describeRecipe } from "./describe-recipe.js";
import type { PathwayData } from "./pathway-data.js";
import { pathwayRecipeSchema, type ComposeStep } from "./pathway-recipe.js";

// Invented pathways: "base" 2000–2003, "other" the same years.
const base: PathwayData = { startYear: 2000, agents: { co2: { erf: [1, 1.5, 2, 2.5] }, solar: { erf: [0, 0, 0, 0] } } };
const other: PathwayData = { startYear: 2000, agents: { co2: { erf: [3, 3.5, 4, 4.5] }, solar: { erf: [0, 0, 0, 0] } } };
const lookup = (id: string) => ({ base, other })[id];

describe("composePathway", () => {
  it("applies steps in order, each from the previous result, and names the agents each changed", () => {
    const steps: ComposeStep[] = [
      { kind: "scale", agent: "co2", factor: 2 },
      { kind: "blend", otherPathwayId: "other", weight: 0.5 },
      { kind: "extend", toYear: 2005, method: "linear", fitYears: 4 },
    ];
    const { outcomes, result } = composePathway(base, steps, lookup);
    expect(outcomes.map((o) => o.ok && o.changed)).toEqual([["co2"], ["co2"], ["co2", "solar"]]);
    // co2: 2·x then (2x + y)/2 = [2.5, 3.25, 4, 4.75], a line of slope 0.75 that continues exactly.
    expect(result?.agents.co2).toEqual({ erf: [2.5, 3.25, 4, 4.75, 5.5, 6.25] });
    expect(result?.agents.solar).toEqual({ erf: [0, 0, 0, 0, 0, 0] });
  });

  it("stops at the first step that cannot be applied and names its field", () => {
    const steps: ComposeStep[] = [
      { kind: "scale", agent: "co2", factor: 2 },
      { kind: "splice", agent: "co2", sourcePathwayId: "missing", fromYear: 2000, toYear: 2001 },
      { kind: "scale", agent: "co2", factor: 3 },
    ];
    const { outcomes, result } = composePathway(base, steps, lookup);
    expect(result).toBeUndefined();
    expect(outcomes).toHaveLength(2);
    expect(outcomes[1]).toMatchObject({
      ok: false,
      error: { field: "sourcePathwayId", message: "sourcePathwayId names no known pathway (missing)" },
    });
  });

  it("changedAgents sees additions, removals and single changed values", () => {
    expect(changedAgents(base, base)).toEqual([]);
    expect(changedAgents(base, { startYear: 2000, agents: { co2: { erf: [1, 1.5, 2, 2.5] } } })).toEqual(["solar"]);
    expect(changedAgents(base, { startYear: 2000, agents: { ...base.agents, solar: { erf: [0, 0, 0.1, 0] } } })).toEqual(["solar"]);
  });
});

describe("pathwayRecipeSchema and describeRecipe", () => {
  it("reads a recipe back in words, with the pathways' names and ids", () => {
    const recipe = pathwayRecipeSchema.parse({
      basePathwayId: "base",
      steps: [
        { kind: "scale", agent: "aerosol-cloud", factor: 0.8, fromYear: 2030, toYear: 2100 },
        { kind: "splice", agent: "co2", sourcePathwayId: "other", fromYear: 2000, toYear: 2001 },
        { kind: "blend", otherPathwayId: "other", weight: 0.3 },
        { kind: "extend", toYear: 2150, method: "linear", fitYears: 30 },
      ],
    });
    const names: Record<string, string> = { base: "Base", other: "Other" };
    expect(describeRecipe(recipe, (id) => names[id] ?? id)).toBe(
      'Composed in Plumeline from "Base" (id base): 1. Aerosol–cloud scaled by 0.8 in 2030–2100. 2. CO2 in 2000–2001 replaced by the values of "Other" (id other). ' +
        '3. blended 0.3 × the pathway so far + 0.7 × "Other" (id other). 4. extended to 2150 continuing each agent\'s least-squares line over its last 30 years.',
    );
  });

  it("refuses a linear extension without its fit window and a weight outside 0–1, naming the field", () => {
    const bad = pathwayRecipeSchema.safeParse({
      basePathwayId: "b",
      steps: [
        { kind: "extend", toYear: 2150, method: "linear" },
        { kind: "blend", otherPathwayId: "o", weight: 1.5 },
      ],
    });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues.map((i) => i.path.join("."))).toEqual(["steps.0.fitYears", "steps.1.weight"]);
  });
});
