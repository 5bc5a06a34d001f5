import { CONCENTRATION_UNITS, FORCING_AGENTS, type ForcingAgent } from "@plumeline/contracts";

/**
 * The upload header convention (apps/api/UPLOADS.md): a `year` column, then one column per agent
 * named `<agent>_<unit>` with the agent ids of the engine contract:
 *   `<agent>_erf_wm2`  effective radiative forcing in W m-2 (any agent)
 *   `co2_ppm`, `ch4_ppb`, `n2o_ppb`  concentrations, turned into forcing by the engine
 * Headers are matched case-insensitively with surrounding spaces ignored.
 */
export type SeriesQuantity = "erf" | "ppm" | "ppb";

export interface AgentColumn {
  agent: ForcingAgent;
  quantity: SeriesQuantity;
  header: string;
}

const ERF_SUFFIX = "_erf_wm2";

/** Every header the convention accepts, for error messages and the docs. */
export const ACCEPTED_AGENT_HEADERS: readonly string[] = [
  ...FORCING_AGENTS.map((a) => `${a}${ERF_SUFFIX}`),
  ...Object.entries(CONCENTRATION_UNITS).map(([a, unit]) => `${a}_${unit}`),
];

/** Reads one header cell; returns the agent column or a sentence saying what is wrong. */
export function readAgentHeader(raw: string): AgentColumn | string {
  const header = raw.trim().toLowerCase();
  if (header === "") return "header is empty; name the column like co2_ppm or aerosol-cloud_erf_wm2";
  if (header.endsWith(ERF_SUFFIX)) {
    const agent = header.slice(0, -ERF_SUFFIX.length);
    if ((FORCING_AGENTS as readonly string[]).includes(agent))
      return { agent: agent as ForcingAgent, quantity: "erf", header };
    return `"${raw}" names an unknown agent "${agent}"; agents are ${FORCING_AGENTS.join(", ")}`;
  }
  for (const [agent, unit] of Object.entries(CONCENTRATION_UNITS)) {
    if (header === `${agent}_${unit}`) return { agent: agent as ForcingAgent, quantity: unit, header };
  }
  const wrongUnit = Object.entries(CONCENTRATION_UNITS).find(([agent]) => header.startsWith(`${agent}_`));
  if (wrongUnit)
    return `"${raw}" has an unknown unit; ${wrongUnit[0]} is given as ${wrongUnit[0]}${ERF_SUFFIX} (W m-2) or ${wrongUnit[0]}_${wrongUnit[1]}`;
  return `"${raw}" is not a known column; use year and <agent>_erf_wm2 (W m-2) or co2_ppm / ch4_ppb / n2o_ppb`;
}
