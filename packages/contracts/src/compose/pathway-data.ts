import type { z } from "zod";
import { AGENT_LABELS, FORCING_AGENTS, type ForcingAgent } from "../engine/agents.js";
import type { pathwayAgentsSchema } from "../engine/run-spec.js";

/** A pathway's agents exactly as the create body and the engine take them. */
export type PathwayAgents = z.infer<typeof pathwayAgentsSchema>;
export type SeriesQuantity = "erf" | "ppm" | "ppb";

/** The numbers of a pathway, without its metadata: what the compose operations work on. */
export interface PathwayData {
  startYear: number;
  agents: PathwayAgents;
}

export interface AgentSeriesView {
  agent: ForcingAgent;
  quantity: SeriesQuantity;
  values: number[];
}

/** The series one agent carries, with the quantity it is given in (undefined when absent). */
export function agentSeries(agents: PathwayAgents, agent: ForcingAgent): AgentSeriesView | undefined {
  const s = agents[agent] as Partial<Record<SeriesQuantity, number[]>> | undefined;
  if (!s) return undefined;
  for (const quantity of ["erf", "ppm", "ppb"] as const) {
    const values = s[quantity];
    if (values) return { agent, quantity, values };
  }
  return undefined;
}

/** Every agent present, in the contract's order (FORCING_AGENTS). */
export function presentAgents(agents: PathwayAgents): AgentSeriesView[] {
  return FORCING_AGENTS.map((a) => agentSeries(agents, a)).filter((s): s is AgentSeriesView => s !== undefined);
}

/** A copy of `agents` with one agent's series replaced (same quantity it is given in). */
export function withSeries(agents: PathwayAgents, agent: ForcingAgent, quantity: SeriesQuantity, values: number[]): PathwayAgents {
  return { ...agents, [agent]: { [quantity]: values } };
}

/** Years a pathway covers: all its series share one length (the create schema checks that). */
export function pathwayLength(p: PathwayData): number {
  return Math.max(0, ...presentAgents(p.agents).map((s) => s.values.length));
}

export function lastYear(p: PathwayData): number {
  return p.startYear + pathwayLength(p) - 1;
}

/** "1850–2100", or a single year alone. */
export function yearSpan(from: number, to: number): string {
  return from === to ? String(from) : `${from}–${to}`;
}

/** Lists the agents a pathway carries, for messages that refuse an absent one. */
export function carriedAgents(p: PathwayData): string {
  return (
    presentAgents(p.agents)
      .map((s) => AGENT_LABELS[s.agent])
      .join(", ") || "no agent"
  );
}
