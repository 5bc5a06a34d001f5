import { describe, expect, it } from "vitest";
import { initialModelDraftForm, modelDraftReducer, NEW_AGENT_SCALE, type ModelDraft } from "./model-draft-form";

const ecs = { type: "range", p50: 3, low: 2.5, high: 4, coverage: 66, shape: "split-normal" } as const;

const draft: ModelDraft = {
  name: "Base",
  notes: "",
  parentId: null,
  model: {
    climate: { ecs },
    agents: { co2: { scale: NEW_AGENT_SCALE } },
    correlations: [{ between: ["ecs", "co2"], rank: 0.2 }],
    constraint: null,
    forcingExpression: "ar6",
  },
  defaults: { percentiles: [5, 50, 95], thresholds: [1.5, 2], horizons: [2050, 2100], baseline: [1850, 1900] },
} as unknown as ModelDraft;

describe("model draft form", () => {
  it("starts from the draft with its numbers as editable text", () => {
    const form = initialModelDraftForm(draft);
    expect(form.defaults).toEqual({ percentiles: "5, 50, 95", thresholds: "1.5, 2", horizons: "2050, 2100", baseline: "1850, 1900" });
    expect(form.correlations).toEqual([{ a: "ecs", b: "co2", rank: "0.2" }]);
    expect(form.constraintOn).toBe(false);
    expect(form.agents).toEqual({ co2: NEW_AGENT_SCALE });
    expect(form.perilProfileIds).toEqual([]);
  });

  it("adds the chosen agent with a neutral scale and clears the choice; Add without a choice changes nothing", () => {
    let form = initialModelDraftForm(draft);
    expect(modelDraftReducer(form, { type: "addChosenAgent" })).toBe(form);
    form = modelDraftReducer(form, { type: "chooseAgentToAdd", agent: "ch4" });
    form = modelDraftReducer(form, { type: "addChosenAgent" });
    expect(form.agents).toEqual({ co2: NEW_AGENT_SCALE, ch4: NEW_AGENT_SCALE });
    expect(form.agentToAdd).toBe("");
    form = modelDraftReducer(form, { type: "removeAgent", agent: "co2" });
    expect(Object.keys(form.agents)).toEqual(["ch4"]);
  });

  it("edits, adds and removes correlation rows by position without touching the others", () => {
    let form = initialModelDraftForm(draft);
    form = modelDraftReducer(form, { type: "addCorrelation" });
    form = modelDraftReducer(form, { type: "correlation", index: 1, field: "rank", value: "-0.5" });
    expect(form.correlations.map((c) => c.rank)).toEqual(["0.2", "-0.5"]);
    form = modelDraftReducer(form, { type: "removeCorrelation", index: 0 });
    expect(form.correlations).toEqual([{ a: "ecs", b: "aerosol-cloud", rank: "-0.5" }]);
  });

  it("keeps an invalid distribution as null so the submit can name it", () => {
    const form = modelDraftReducer(initialModelDraftForm(draft), { type: "climate", input: "ecs", distribution: null });
    expect(form.climate.ecs).toBeNull();
  });
});
