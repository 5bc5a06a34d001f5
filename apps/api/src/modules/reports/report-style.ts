import { createRequire } from "node:module";

const require = createRequire(import.meta.url);

/**
 * The report's fonts: IBM Plex Sans and Mono, the typefaces the web app ships, embedded from
 * the same npm packages (WOFF, latin subset: it holds the en dash, minus sign and euro sign
 * the report writes). Embedded fonts carry a Unicode map, so the text stays extractable.
 */
export const REPORT_FONTS = {
  sans: require.resolve("@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-400-normal.woff"),
  sansItalic: require.resolve("@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-400-italic.woff"),
  sansBold: require.resolve("@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-600-normal.woff"),
  mono: require.resolve("@fontsource/ibm-plex-mono/files/ibm-plex-mono-latin-400-normal.woff"),
} as const;

/** Plumeline's light-theme colours (apps/web/src/styles/index.css), the ones a printed page uses. */
export const INK = "#13294b";
export const TEXT = "#1b2433";
export const MUTED = "#5b6576";
export const FAINT = "#8a93a3";
export const LINE = "#dcd7cb";
export const LINE_STRONG = "#b9b2a3";
export const SURFACE_2 = "#efece4";
export const ACCENT = "#1f4f8f";
export const DANGER = "#b4322a";
export const OK = "#2f7a4f";
export const SERIES = ["#c4601a", "#2b6f9a", "#7d4c9c", "#4d7a2c", "#9c3d5b"];
export const seriesColor = (i: number) => SERIES[i % SERIES.length]!;

/**
 * Warming thresholds in the ink and accent blues with their own dash, lightest for the lowest
 * threshold — Plumeline's palette, not a yellow-to-red warming ramp.
 */
export const THRESHOLD_STYLES = [
  { color: "#6f9bd1", dash: [2, 2] },
  { color: ACCENT, dash: [5, 3] },
  { color: INK, dash: [9, 3] },
  { color: "#4c5a70", dash: [1, 3] },
];
export const thresholdStyle = (i: number) => THRESHOLD_STYLES[Math.min(i, THRESHOLD_STYLES.length - 1)]!;

/** Forcing agents: greenhouse gases warm tones, aerosols cool blues (as the web chart). */
export const AGENT_COLORS: Record<string, string> = {
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
