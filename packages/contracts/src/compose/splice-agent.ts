import { AGENT_LABELS } from "../engine/agents.js";
import { ComposeStepError } from "./compose-step-error.js";
import { agentSeries, carriedAgents, lastYear, withSeries, yearSpan, type PathwayData } from "./pathway-data.js";
import type { SpliceStep } from "./pathway-recipe.js";
import { yearRangeIndexes } from "./year-range.js";

/**
 * Replaces fromYear–toYear (inclusive) of one agent with the source pathway's values for the
 * same calendar years. The agent must be in both, in the same quantity, and the source must
 * cover every year of the range; every other value is returned unchanged.
 */
export function spliceAgent(p: PathwayData, step: SpliceStep, source: PathwayData): PathwayData {
  const label = AGENT_LABELS[step.agent];
  const target = agentSeries(p.agents, step.agent);
  if (!target) throw new ComposeStepError("agent", `${label} is not in this pathway (it carries ${carriedAgents(p)})`);
  const from = agentSeries(source.agents, step.agent);
  if (!from) throw new ComposeStepError("sourcePathwayId", `carries no ${label} series (it carries ${carriedAgents(source)})`);
  if (from.quantity !== target.quantity)
    throw new ComposeStepError(
      "sourcePathwayId",
      `gives ${label} as ${from.quantity} but this pathway gives it as ${target.quantity}; splice only like with like`,
    );
  const [first, last] = yearRangeIndexes(p, step.fromYear, step.toYear);
  const sourceLast = lastYear(source);
  if (step.fromYear < source.startYear || step.toYear > sourceLast) {
    const missing = [
      step.fromYear < source.startYear ? yearSpan(step.fromYear, Math.min(step.toYear, source.startYear - 1)) : null,
      step.toYear > sourceLast ? yearSpan(Math.max(step.fromYear, sourceLast + 1), step.toYear) : null,
    ].filter(Boolean);
    throw new ComposeStepError(
      "sourcePathwayId",
      `covers ${source.startYear}–${sourceLast} only; years ${missing.join(" and ")} of the splice are not in it`,
    );
  }
  const offset = p.startYear - source.startYear;
  const values = target.values.map((v, i) => (i >= first && i <= last ? from.values[i + offset]! : v));
  return { startYear: p.startYear, agents: withSeries(p.agents, step.agent, target.quantity, values) };
}
