import { AGENT_LABELS } from "../engine/agents.js";
import { MAX_PATHWAY_YEARS } from "../engine/run-spec.js";
import { ComposeStepError } from "./compose-step-error.js";
import { lastYear, pathwayLength, presentAgents, withSeries, type PathwayAgents, type PathwayData } from "./pathway-data.js";
import type { ExtendStep } from "./pathway-recipe.js";

/**
 * Ordinary least-squares line through the last `n` values, evaluated `ahead` steps past the
 * last one (closed form: slope = Σ(x−x̄)(y−ȳ) / Σ(x−x̄)², line through (x̄, ȳ)). x is centred
 * on the fit window so the sums stay small and exact for evenly spaced years.
 */
export function linearTrendAhead(values: readonly number[], n: number, ahead: number): number {
  const window = values.slice(values.length - n);
  const xMean = (n - 1) / 2;
  const yMean = window.reduce((s, v) => s + v, 0) / n;
  let sxy = 0;
  let sxx = 0;
  window.forEach((y, i) => {
    sxy += (i - xMean) * (y - yMean);
    sxx += (i - xMean) ** 2;
  });
  const slope = sxy / sxx;
  return yMean + slope * (n - 1 - xMean + ahead);
}

/**
 * Continues every agent from the year after the last up to `toYear`: "hold" repeats the last
 * value; "linear" continues the least-squares line fitted over the last `fitYears` years.
 * A trend that would take a concentration below zero is refused, naming the agent and year.
 */
export function extendPathway(p: PathwayData, step: ExtendStep): PathwayData {
  const last = lastYear(p);
  const length = pathwayLength(p);
  if (step.toYear <= last) throw new ComposeStepError("toYear", `${step.toYear} must come after the pathway's last year ${last}`);
  const added = step.toYear - last;
  if (length + added > MAX_PATHWAY_YEARS)
    throw new ComposeStepError(
      "toYear",
      `${step.toYear} would make the pathway ${length + added} years long; at most ${MAX_PATHWAY_YEARS} are accepted`,
    );
  const fitYears = step.method === "linear" ? (step.fitYears ?? 0) : 0;
  if (step.method === "linear" && (fitYears < 2 || fitYears > length))
    throw new ComposeStepError("fitYears", `${fitYears} must lie from 2 to the pathway's ${length} years`);
  let agents: PathwayAgents = p.agents;
  for (const s of presentAgents(p.agents)) {
    const tail = Array.from({ length: added }, (_, k) =>
      step.method === "hold" ? s.values[s.values.length - 1]! : linearTrendAhead(s.values, fitYears, k + 1),
    );
    if (s.quantity !== "erf") {
      const negative = tail.findIndex((v) => v < 0);
      if (negative >= 0)
        throw new ComposeStepError(
          "method",
          `a linear trend takes the ${AGENT_LABELS[s.agent]} concentration below zero in ${last + negative + 1}; hold the last value or fit over more years`,
        );
    }
    agents = withSeries(agents, s.agent, s.quantity, [...s.values, ...tail]);
  }
  return { startYear: p.startYear, agents };
}
