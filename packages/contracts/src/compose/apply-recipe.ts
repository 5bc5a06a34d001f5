import { FORCING_AGENTS, type ForcingAgent } from "../engine/agents.js";
import { blendPathways } from "./blend-pathways.js";
import { ComposeStepError } from "./compose-step-error.js";
import { extendPathway } from "./extend-pathway.js";
import { agentSeries, type PathwayData } from "./pathway-data.js";
import type { ComposeStep } from "./pathway-recipe.js";
import { scaleAgent } from "./scale-agent.js";
import { spliceAgent } from "./splice-agent.js";

/** Finds another pathway's numbers by id (undefined when there is no such pathway). */
export type PathwayLookup = (id: string) => PathwayData | undefined;

function need(lookup: PathwayLookup, id: string, field: string): PathwayData {
  const found = lookup(id);
  if (!found) throw new ComposeStepError(field, `names no known pathway (${id})`);
  return found;
}

/** Applies one step to the pathway so far. Throws ComposeStepError naming the field at fault. */
export function applyStep(p: PathwayData, step: ComposeStep, lookup: PathwayLookup): PathwayData {
  switch (step.kind) {
    case "scale":
      return scaleAgent(p, step);
    case "splice":
      return spliceAgent(p, step, need(lookup, step.sourcePathwayId, "sourcePathwayId"));
    case "blend":
      return blendPathways(p, step, need(lookup, step.otherPathwayId, "otherPathwayId"));
    case "extend":
      return extendPathway(p, step);
  }
}

/** Agents whose series differ between two states (added, removed, lengthened or any value changed). */
export function changedAgents(before: PathwayData, after: PathwayData): ForcingAgent[] {
  return FORCING_AGENTS.filter((agent) => {
    const a = agentSeries(before.agents, agent);
    const b = agentSeries(after.agents, agent);
    if (!a || !b) return a !== b;
    if (before.startYear !== after.startYear || a.quantity !== b.quantity || a.values.length !== b.values.length) return true;
    return a.values.some((v, i) => v !== b.values[i]);
  });
}

export type StepOutcome =
  | { ok: true; before: PathwayData; after: PathwayData; changed: ForcingAgent[] }
  | { ok: false; before: PathwayData; error: ComposeStepError };

/**
 * Applies the steps in order and reports each one's outcome. The first step that cannot be
 * applied stops the recipe: later steps are not tried (they would start from the wrong
 * numbers), and `result` is undefined.
 */
export function composePathway(
  base: PathwayData,
  steps: readonly ComposeStep[],
  lookup: PathwayLookup,
): { outcomes: StepOutcome[]; result: PathwayData | undefined } {
  const outcomes: StepOutcome[] = [];
  let current = base;
  for (const step of steps) {
    try {
      const after = applyStep(current, step, lookup);
      outcomes.push({ ok: true, before: current, after, changed: changedAgents(current, after) });
      current = after;
    } catch (e) {
      if (!(e instanceof ComposeStepError)) throw e;
      outcomes.push({ ok: false, before: current, error: e });
      return { outcomes, result: undefined };
    }
  }
  return { outcomes, result: current };
}
