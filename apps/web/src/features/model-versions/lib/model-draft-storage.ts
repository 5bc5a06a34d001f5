import { z } from "zod";
import {
  CLIMATE_INPUTS,
  FORCING_AGENTS,
  FORCING_EXPRESSIONS,
  distributionSchema,
  type ClimateInput,
  type Distribution,
  type ForcingAgent,
} from "@plumeline/contracts";
import { DEFAULT_INTERNAL_VARIABILITY } from "@plumeline/engine";
import { inputLabel } from "@/lib/input-labels";
import { initialModelDraftForm, type ModelDraft, type ModelDraftForm } from "./model-draft-form";

/** What the model editor keeps in the browser: the form as typed, without last submit's messages. */
export type StoredModelForm = Omit<ModelDraftForm, "errors" | "agentToAdd">;

const text = z.string();
// Distributions are checked with the API's own schema; `null` is an input that was half-typed.
const maybeDistribution = distributionSchema.nullable();

export const storedModelFormSchema: z.ZodType<StoredModelForm> = z.object({
  name: text,
  notes: text,
  climate: z
    .object(Object.fromEntries(CLIMATE_INPUTS.map((k) => [k, maybeDistribution])) as Record<ClimateInput, typeof maybeDistribution>)
    .strict(),
  agents: z
    .object(
      Object.fromEntries(FORCING_AGENTS.map((a) => [a, maybeDistribution.optional()])) as Record<
        ForcingAgent,
        z.ZodOptional<typeof maybeDistribution>
      >,
    )
    .strict(),
  correlations: z.array(z.object({ a: text, b: text, rank: text }).strict()),
  constraintOn: z.boolean(),
  // internalVariability joined the form later: a draft kept before then restores with the default.
  constraint: z
    .object({ from: text, to: text, observed: text, sd: text, internalVariability: text.default(String(DEFAULT_INTERNAL_VARIABILITY)) })
    .strict(),
  expression: z.enum(FORCING_EXPRESSIONS),
  defaults: z.object({ percentiles: text, thresholds: text, horizons: text, baseline: text }).strict(),
  perilProfileIds: z.array(text),
});

/** The part of the form that is the user's work (what "unsaved changes" compares). */
export function storedPart(form: ModelDraftForm): StoredModelForm {
  const { errors: _errors, agentToAdd: _agentToAdd, ...rest } = form;
  return rest;
}

/** The form of a version as loaded, in the shape that is stored and compared. */
export const loadedForm = (initial: ModelDraft): StoredModelForm => storedPart(initialModelDraftForm(initial));

/**
 * Where the editor starts from a restored draft. An input that was half-typed when the draft was
 * kept (stored as null) starts again from the loaded value, since its typed text is not kept;
 * `resetInputs` names those inputs so the page can say so.
 */
export function startFromStored(
  initial: ModelDraft,
  stored: StoredModelForm,
): { seed: ModelDraft; form: ModelDraftForm; resetInputs: string[] } {
  const resetInputs: string[] = [];
  const climate = { ...initial.model.climate };
  for (const k of CLIMATE_INPUTS) {
    const d = stored.climate[k];
    if (d) climate[k] = d;
    else resetInputs.push(inputLabel(k));
  }
  const agents: Partial<Record<ForcingAgent, { scale: Distribution }>> = {};
  const formAgents: Partial<Record<ForcingAgent, Distribution>> = {};
  for (const a of FORCING_AGENTS) {
    if (!(a in stored.agents)) continue;
    const d = stored.agents[a] ?? initial.model.agents[a]?.scale ?? null;
    if (!stored.agents[a]) resetInputs.push(inputLabel(a));
    if (d) {
      agents[a] = { scale: d };
      formAgents[a] = d;
    }
  }
  const seed: ModelDraft = { ...initial, model: { ...initial.model, climate, agents } };
  return { seed, form: { ...stored, climate, agents: formAgents, agentToAdd: "", errors: {} }, resetInputs };
}
