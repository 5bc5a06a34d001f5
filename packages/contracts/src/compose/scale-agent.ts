import { AGENT_LABELS } from "../engine/agents.js";
import { ComposeStepError } from "./compose-step-error.js";
import { agentSeries, carriedAgents, lastYear, withSeries, type PathwayData } from "./pathway-data.js";
import type { ScaleStep } from "./pathway-recipe.js";
import { yearRangeIndexes } from "./year-range.js";

/**
 * Multiplies one agent's values by `factor` in fromYear–toYear (inclusive; the whole series
 * when the years are left out). Other agents and years are returned unchanged.
 */
export function scaleAgent(p: PathwayData, step: ScaleStep): PathwayData {
  const series = agentSeries(p.agents, step.agent);
  if (!series) throw new ComposeStepError("agent", `${AGENT_LABELS[step.agent]} is not in this pathway (it carries ${carriedAgents(p)})`);
  if (series.quantity !== "erf" && step.factor < 0)
    throw new ComposeStepError(
      "factor",
      `${step.factor} would make the ${AGENT_LABELS[step.agent]} concentration (${series.quantity}) negative`,
    );
  const [first, last] = yearRangeIndexes(p, step.fromYear ?? p.startYear, step.toYear ?? lastYear(p));
  const values = series.values.map((v, i) => (i >= first && i <= last ? v * step.factor : v));
  return { startYear: p.startYear, agents: withSeries(p.agents, step.agent, series.quantity, values) };
}
