import { AGENT_LABELS } from "../engine/agents.js";
import { yearSpan } from "./pathway-data.js";
import type { ComposeStep, PathwayRecipe } from "./pathway-recipe.js";

/** Names a pathway for a reader: "Harbourline middle" (id 3f2a…). */
export type PathwayNamer = (id: string) => string;

const quoted = (name: PathwayNamer, id: string) => `"${name(id)}" (id ${id})`;

/** One step in plain words, e.g. "CO2 × 1.2 in 2030–2100". */
export function describeStep(step: ComposeStep, name: PathwayNamer): string {
  switch (step.kind) {
    case "scale": {
      const whole = step.fromYear === undefined && step.toYear === undefined;
      const from = step.fromYear?.toString() ?? "the first year";
      const to = step.toYear?.toString() ?? "the last year";
      const years = whole ? "in every year" : from === to ? `in ${from}` : `in ${from}–${to}`;
      return `${AGENT_LABELS[step.agent]} scaled by ${step.factor} ${years}`;
    }
    case "splice":
      return `${AGENT_LABELS[step.agent]} in ${yearSpan(step.fromYear, step.toYear)} replaced by the values of ${quoted(name, step.sourcePathwayId)}`;
    case "blend":
      return `blended ${step.weight} × the pathway so far + ${Number((1 - step.weight).toPrecision(12))} × ${quoted(name, step.otherPathwayId)}`;
    case "extend":
      return step.method === "hold"
        ? `extended to ${step.toYear} holding each agent's last value`
        : `extended to ${step.toYear} continuing each agent's least-squares line over its last ${step.fitYears ?? "?"} years`;
  }
}

/**
 * The recipe as a paragraph a reviewer can read on the pathway's page, recorded in its
 * description: where it started and every step in order.
 */
export function describeRecipe(recipe: PathwayRecipe, name: PathwayNamer): string {
  const steps = recipe.steps.map((s, i) => `${i + 1}. ${describeStep(s, name)}.`);
  return [`Composed in Plumeline from ${quoted(name, recipe.basePathwayId)}${steps.length ? ":" : " without changes."}`, ...steps].join(
    " ",
  );
}
