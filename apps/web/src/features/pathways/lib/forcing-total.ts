import { presentAgents, type PathwayData } from "@plumeline/contracts";

/**
 * Net forcing per year: the sum of the agents given as ERF (W m-2). Agents given as
 * concentrations are left out — turning them into forcing needs a model version's expression —
 * and `concentrationAgents` says which, so a chart can say so.
 */
export function forcingTotal(p: PathwayData): { total: number[]; concentrationAgents: string[] } {
  const list = presentAgents(p.agents);
  const length = Math.max(0, ...list.map((s) => s.values.length));
  const erf = list.filter((s) => s.quantity === "erf");
  const total = Array.from({ length }, (_, i) => erf.reduce((sum, s) => sum + (s.values[i] ?? 0), 0));
  return { total, concentrationAgents: list.filter((s) => s.quantity !== "erf").map((s) => s.agent) };
}
