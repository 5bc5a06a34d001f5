import { FORCING_AGENTS, MAX_PATHWAY_YEARS, type ErrorDetail } from "@plumeline/contracts";
import type { SeriesQuantity } from "./pathway-columns.js";
import type { PathwaySeries } from "./pathway-table.js";

/** The agents a series object carries, in contract order, with the quantity each is given in. */
export function seriesAgents(agents: PathwaySeries): Array<{ agent: string; quantity: SeriesQuantity; values: number[] }> {
  const out: Array<{ agent: string; quantity: SeriesQuantity; values: number[] }> = [];
  for (const agent of FORCING_AGENTS) {
    const s = agents[agent];
    if (!s) continue;
    const quantity = Object.keys(s)[0] as SeriesQuantity | undefined;
    if (quantity) out.push({ agent, quantity, values: s[quantity] ?? [] });
  }
  return out;
}

/**
 * Shape rules a JSON-submitted pathway must meet beyond its schema (the upload enforces the
 * same through its table): at least one agent, every series the same length, 1 to
 * MAX_PATHWAY_YEARS values. Returns every problem, each naming its field.
 */
export function checkSeriesShape(agents: PathwaySeries): ErrorDetail[] {
  const list = seriesAgents(agents);
  if (list.length === 0) return [{ path: "agents", message: "must hold at least one agent" }];
  const expected = list[0]!.values.length;
  const errors: ErrorDetail[] = [];
  if (expected < 1 || expected > MAX_PATHWAY_YEARS)
    errors.push({ path: `agents.${list[0]!.agent}.${list[0]!.quantity}`, message: `has ${expected} values, expected 1 to ${MAX_PATHWAY_YEARS}` });
  for (const { agent, quantity, values } of list.slice(1))
    if (values.length !== expected)
      errors.push({ path: `agents.${agent}.${quantity}`, message: `has ${values.length} values, expected ${expected} like ${list[0]!.agent}` });
  return errors;
}

export function seriesLength(agents: PathwaySeries): number {
  return seriesAgents(agents)[0]?.values.length ?? 0;
}
