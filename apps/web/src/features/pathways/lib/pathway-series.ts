import { AGENT_LABELS, FORCING_AGENTS, type ForcingAgent } from "@plumeline/contracts";
import type { AgentSeries } from "@/components/charts/forcing-stack-chart";
import type { LineSeries } from "@/components/charts/line-chart";

type Agents = Partial<Record<ForcingAgent, { erf: number[] } | { ppm: number[] } | { ppb: number[] }>>;

/**
 * Splits a pathway's agents into forcing series (W m-2, stackable) and concentration series
 * (ppm/ppb, which the engine turns into forcing with the model version's expression).
 */
export function splitPathwaySeries(startYear: number, agents: Agents) {
  const forcing: AgentSeries[] = [];
  const ppm: LineSeries[] = [];
  const ppb: LineSeries[] = [];
  let length = 0;
  for (const agent of FORCING_AGENTS) {
    const s = agents[agent];
    if (!s) continue;
    if ("erf" in s) forcing.push({ agent, label: AGENT_LABELS[agent], values: s.erf });
    else if ("ppm" in s) ppm.push({ id: agent, label: `${AGENT_LABELS[agent]} (ppm)`, values: s.ppm });
    else if ("ppb" in s) ppb.push({ id: agent, label: `${AGENT_LABELS[agent]} (ppb)`, values: s.ppb });
    length = Math.max(length, "erf" in s ? s.erf.length : "ppm" in s ? s.ppm.length : s.ppb.length);
  }
  const years = Array.from({ length }, (_, i) => startYear + i);
  return { years, forcing, ppm, ppb };
}
