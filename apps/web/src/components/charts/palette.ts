import { AGENT_COLORS, SERIES_COLOR_NAMES, THRESHOLD_LINES, type ColorName, type ForcingAgent } from "@plumeline/contracts";

/**
 * The shared palette (contracts) as the screen draws it: named colours go through their CSS
 * variables so they follow the light or dark theme; agent colours are the same in both.
 */
const cssColor = (name: ColorName) => `var(--pl-${name})`;

/** Series colours: the first is the ember warming signal; the rest separate pathways or runs. */
export const SERIES_COLORS = SERIES_COLOR_NAMES.map(cssColor);
export const seriesColor = (i: number) => SERIES_COLORS[i % SERIES_COLORS.length]!;

export const agentColor = (agent: string) => AGENT_COLORS[agent as ForcingAgent] ?? AGENT_COLORS.other;

/** Warming thresholds: Plumeline's blues from light to ink, each with its own dash (SVG dash array). */
export const THRESHOLD_STYLES = THRESHOLD_LINES.map((line) => ({ color: cssColor(line.color), dash: line.dash.join(" ") }));
export const thresholdStyle = (i: number) => THRESHOLD_STYLES[Math.min(i, THRESHOLD_STYLES.length - 1)]!;
