import { CLIMATE_INPUTS, FORCING_AGENTS, type Distribution, type RunSpec } from "../spec/types.js";

/** One input of the model as the sampler sees it: its name in correlations and budgets, its field, its law. */
export interface ModelInput {
  /** "ecs", "f2x", …, or an agent id for that agent's scale factor. */
  name: string;
  field: string;
  distribution: Distribution;
  kind: "climate" | "agent";
}

/**
 * Every input the spec gives, in a fixed order (climate inputs in the order of the spec's climate block, then
 * agent scales in agent order), so the same spec always samples the same way. Agents absent
 * from model.agents are not inputs: their scale is fixed at 1.
 */
export function listModelInputs(spec: RunSpec): ModelInput[] {
  const inputs: ModelInput[] = CLIMATE_INPUTS.map((name) => ({
    name,
    field: `model.climate.${name}`,
    distribution: spec.model.climate[name],
    kind: "climate" as const,
  }));
  for (const agent of FORCING_AGENTS) {
    const entry = spec.model.agents[agent];
    if (entry) inputs.push({ name: agent, field: `model.agents.${agent}.scale`, distribution: entry.scale, kind: "agent" });
  }
  return inputs;
}
