import type { ForcingAgent } from "@plumeline/contracts";

/** Series colours: the first is the ember warming signal; the rest separate pathways or runs. */
export const SERIES_COLORS = ["var(--pl-series-1)", "var(--pl-series-2)", "var(--pl-series-3)", "var(--pl-series-4)", "var(--pl-series-5)"];
export const seriesColor = (i: number) => SERIES_COLORS[i % SERIES_COLORS.length]!;

/**
 * Forcing agents: greenhouse gases in warm tones (they warm), aerosols in cool blues (they
 * cool), natural and surface agents in greens and greys, so the sign reads from the colour.
 */
export const AGENT_COLORS: Record<ForcingAgent, string> = {
  co2: "#c4601a",
  ch4: "#e08a3c",
  n2o: "#e9ad6a",
  "other-wmghg": "#c98f8f",
  ozone: "#9c3d5b",
  "aerosol-radiation": "#2b6f9a",
  "aerosol-cloud": "#5a98c4",
  "land-use": "#6b8e4e",
  solar: "#e3c547",
  volcanic: "#6b7280",
  other: "#9aa3b2",
};

export const agentColor = (agent: string) => AGENT_COLORS[agent as ForcingAgent] ?? "#9aa3b2";

/**
 * Warming thresholds: Plumeline's blues from light to ink, each with its own dash, lightest
 * for the lowest threshold — not a yellow-to-red warming ramp, and never the ember of the data.
 */
export const THRESHOLD_STYLES = [
  { color: "var(--pl-threshold-1)", dash: "2 3" },
  { color: "var(--pl-accent)", dash: "6 4" },
  { color: "var(--pl-ink)", dash: "10 4" },
  { color: "var(--pl-muted)", dash: "1 4" },
];
export const thresholdStyle = (i: number) => THRESHOLD_STYLES[Math.min(i, THRESHOLD_STYLES.length - 1)]!;
