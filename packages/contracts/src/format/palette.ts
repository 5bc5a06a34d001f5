import type { ForcingAgent } from "../engine/agents.js";

/**
 * Plumeline's colours, shared by the web charts and the printed report so the two never drift.
 *
 * LIGHT_COLORS are the light theme: the web app states them as CSS variables (`--pl-<name>` in
 * apps/web/src/styles/index.css, where the dark theme sits beside them, and a web test holds
 * the two equal); the report prints on white paper, so it uses them as they are.
 */
export const LIGHT_COLORS = {
  ink: "#13294b",
  text: "#1b2433",
  muted: "#5b6576",
  faint: "#8a93a3",
  line: "#dcd7cb",
  "line-strong": "#b9b2a3",
  "surface-2": "#efece4",
  accent: "#1f4f8f",
  danger: "#b4322a",
  ok: "#2f7a4f",
  "series-1": "#c4601a",
  "series-2": "#2b6f9a",
  "series-3": "#7d4c9c",
  "series-4": "#4d7a2c",
  "series-5": "#9c3d5b",
  "threshold-1": "#6f9bd1",
  "threshold-4": "#4c5a70",
} as const;
export type ColorName = keyof typeof LIGHT_COLORS;

/** Series colours by name: the first is the ember warming signal; the rest separate pathways or runs. */
export const SERIES_COLOR_NAMES: readonly ColorName[] = ["series-1", "series-2", "series-3", "series-4", "series-5"];

/**
 * Warming-threshold lines: Plumeline's blues from light to ink, each with its own dash (lengths
 * in the drawing's own units), lightest for the lowest threshold — not a yellow-to-red warming
 * ramp, and never the ember of the data.
 */
export const THRESHOLD_LINES: readonly { color: ColorName; dash: readonly number[] }[] = [
  { color: "threshold-1", dash: [2, 2] },
  { color: "accent", dash: [5, 3] },
  { color: "ink", dash: [9, 3] },
  { color: "threshold-4", dash: [1, 3] },
];

/**
 * Forcing agents: greenhouse gases in warm tones (they warm), aerosols in cool blues (they
 * cool), natural and surface agents in greens and greys, so the sign reads from the colour.
 * Solar is a dark gold rather than a yellow: a yellow line is too faint on white paper.
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
  solar: "#b89a2a",
  volcanic: "#6b7280",
  other: "#9aa3b2",
};
