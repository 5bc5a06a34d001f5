import { createRequire } from "node:module";
import { AGENT_COLORS, LIGHT_COLORS, SERIES_COLOR_NAMES, THRESHOLD_LINES } from "@plumeline/contracts";

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

/** Plumeline's light-theme colours (the shared palette in contracts), the ones a printed page uses. */
export const INK = LIGHT_COLORS.ink;
export const TEXT = LIGHT_COLORS.text;
export const MUTED = LIGHT_COLORS.muted;
export const FAINT = LIGHT_COLORS.faint;
export const LINE = LIGHT_COLORS.line;
export const LINE_STRONG = LIGHT_COLORS["line-strong"];
export const SURFACE_2 = LIGHT_COLORS["surface-2"];
export const ACCENT = LIGHT_COLORS.accent;
export const DANGER = LIGHT_COLORS.danger;
export const OK = LIGHT_COLORS.ok;
export const SERIES = SERIES_COLOR_NAMES.map((name) => LIGHT_COLORS[name]);
export const seriesColor = (i: number) => SERIES[i % SERIES.length]!;

/** Warming thresholds as the shared palette draws them, in printed colours (dash lengths in points). */
export const THRESHOLD_STYLES = THRESHOLD_LINES.map((line) => ({ color: LIGHT_COLORS[line.color], dash: [...line.dash] }));
export const thresholdStyle = (i: number) => THRESHOLD_STYLES[Math.min(i, THRESHOLD_STYLES.length - 1)]!;

export { AGENT_COLORS };
