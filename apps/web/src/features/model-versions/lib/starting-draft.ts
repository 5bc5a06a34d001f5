import { DEFAULT_CLIMATE, DEFAULT_CLIMATE_NOTES, defaultRunSettings } from "@plumeline/contracts";
import type { ModelDraft } from "./model-draft-form";

/**
 * Where a version with no parent starts: the published default assumptions of the contracts
 * (AR6 ECS and F2x, the illustrative two-layer ocean), with their sources in the notes.
 */
export const STARTING_DRAFT: ModelDraft = {
  name: "",
  parentId: null,
  notes: [DEFAULT_CLIMATE_NOTES.ecs, DEFAULT_CLIMATE_NOTES.f2x, DEFAULT_CLIMATE_NOTES.ocean].join("\n"),
  model: {
    climate: { ...DEFAULT_CLIMATE },
    agents: {},
    correlations: [],
    constraint: null,
    forcingExpression: "ar6",
  },
  defaults: defaultRunSettings(),
};
