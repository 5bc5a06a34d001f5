import { AGENT_LABELS, FORCING_AGENTS } from "../engine/agents.js";
import { ComposeStepError } from "./compose-step-error.js";
import { agentSeries, lastYear, withSeries, yearSpan, type PathwayAgents, type PathwayData } from "./pathway-data.js";
import type { BlendStep } from "./pathway-recipe.js";

/** The years one pathway covers and the other does not, as readable spans. */
function yearsOnlyIn(a: PathwayData, b: PathwayData): string[] {
  const [aFirst, aLast, bFirst, bLast] = [a.startYear, lastYear(a), b.startYear, lastYear(b)];
  const spans: string[] = [];
  if (aFirst < bFirst) spans.push(yearSpan(aFirst, Math.min(aLast, bFirst - 1)));
  if (aLast > bLast) spans.push(yearSpan(Math.max(aFirst, bLast + 1), aLast));
  return spans;
}

/**
 * weight·A + (1 − weight)·B per agent and year, A being the pathway so far and B the other.
 * Both must cover the same years: where they differ the blend is refused, naming the years
 * each has alone (blending on the overlap would silently drop years). An agent given as
 * forcing in only one of them counts as 0 W m-2 in the other, as an absent agent does in a
 * run; one given as a concentration in only one of them is refused (0 ppm is not "none").
 * At weight 1 (or 0) the result is A (or B) exactly.
 */
export function blendPathways(a: PathwayData, step: BlendStep, b: PathwayData): PathwayData {
  const onlyA = yearsOnlyIn(a, b);
  const onlyB = yearsOnlyIn(b, a);
  if (onlyA.length > 0 || onlyB.length > 0) {
    const parts = [
      onlyA.length ? `years ${onlyA.join(" and ")} are only in the pathway so far` : null,
      onlyB.length ? `years ${onlyB.join(" and ")} are only in the other pathway` : null,
    ].filter(Boolean);
    throw new ComposeStepError(
      "otherPathwayId",
      `covers ${b.startYear}–${lastYear(b)} but the pathway so far covers ${a.startYear}–${lastYear(a)}: ${parts.join("; ")}. A blend needs the same years in both (extend the shorter one first, or pick another pathway)`,
    );
  }
  const w = step.weight;
  let agents: PathwayAgents = {};
  for (const agent of FORCING_AGENTS) {
    const sa = agentSeries(a.agents, agent);
    const sb = agentSeries(b.agents, agent);
    if (!sa && !sb) continue;
    // An agent whose only side gets weight 0 contributes nothing: leave it out, so weight 1 or 0 returns an input as it was.
    if ((!sb && w === 0) || (!sa && w === 1)) continue;
    const quantity = (sa ?? sb)!.quantity;
    if ((!sa || !sb) && quantity !== "erf")
      throw new ComposeStepError(
        "otherPathwayId",
        `${AGENT_LABELS[agent]} is given as a concentration (${quantity}) in only ${sa ? "the pathway so far" : "the other pathway"}; a concentration cannot be blended with an absent one`,
      );
    if (sa && sb && sa.quantity !== sb.quantity)
      throw new ComposeStepError(
        "otherPathwayId",
        `gives ${AGENT_LABELS[agent]} as ${sb.quantity} but the pathway so far gives it as ${sa.quantity}; blend only like with like`,
      );
    const length = (sa ?? sb)!.values.length;
    const values = Array.from({ length }, (_, i) => w * (sa?.values[i] ?? 0) + (1 - w) * (sb?.values[i] ?? 0));
    agents = withSeries(agents, agent, quantity, values);
  }
  return { startYear: a.startYear, agents };
}
