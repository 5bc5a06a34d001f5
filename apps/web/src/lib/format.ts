/** Number and date formatting shared by tables and charts, so the same value reads the same everywhere. */

/**
 * `v.toFixed(digits)` without the minus sign of a value that rounds to zero: -0.0000004 and
 * -0 both read "0.000", not "-0.000" (which looks like a sign error in the data).
 * Example: formatFixed(-0.0004, 3) === "0.000"; formatFixed(-0.0006, 3) === "-0.001".
 */
export function formatFixed(v: number, digits: number): string {
  const text = v.toFixed(digits);
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}

export const formatKelvin = (v: number | null | undefined, digits = 2) =>
  v === null || v === undefined || !Number.isFinite(v) ? "–" : formatFixed(v, digits);

export const formatNumber = (v: number | null | undefined, digits = 2) =>
  v === null || v === undefined || !Number.isFinite(v) ? "–" : formatFixed(v, digits);

export const formatPercent = (share: number | null | undefined, digits = 0) =>
  share === null || share === undefined || !Number.isFinite(share) ? "–" : `${formatFixed(share * 100, digits)} %`;

/**
 * A probability as a whole percent that never rounds a possibility away: 0.48 % reads "< 1 %",
 * not "0 %" (which says it cannot happen), and 99.94 % reads "> 99 %", not "100 %" (which says
 * it must). Only an exact 0 or 1 — no member or every member — prints as 0 % or 100 %.
 */
export function formatProbability(share: number | null | undefined): string {
  if (share === null || share === undefined || !Number.isFinite(share)) return "–";
  if (share > 0 && share < 0.005) return "< 1 %";
  if (share < 1 && share >= 0.995) return "> 99 %";
  return formatPercent(share, 0);
}

/**
 * A probability to a tenth of a percent, for tables where a chance can be small (weighted
 * exceedance can be 5e-109): below 0.05 % it reads "< 0.1 %", from 99.95 % below 1 it reads
 * "> 99.9 %" — never 0.0 % or 100.0 % unless exactly none or all, and never scientific notation.
 */
export function formatProbabilityTenths(share: number | null | undefined): string {
  if (share === null || share === undefined || !Number.isFinite(share)) return "–";
  if (share > 0 && share < 0.0005) return "< 0.1 %";
  if (share < 1 && share >= 0.9995) return "> 99.9 %";
  return formatPercent(share, 1);
}

export const formatInteger = (v: number | null | undefined) =>
  v === null || v === undefined || !Number.isFinite(v) ? "–" : Math.round(v).toLocaleString("en-GB");

export function formatDateTime(iso: string | null | undefined): string {
  if (!iso) return "–";
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  return d.toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short" });
}

export function formatDate(iso: string | null | undefined): string {
  if (!iso) return "–";
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  return d.toLocaleDateString("en-GB", { dateStyle: "medium" });
}

/** "p17" -> 17 */
export const percentileOfKey = (key: string) => Number(key.slice(1));

/**
 * A percentile key as a column heading an actuary cannot misread as a share of loss:
 * "p5" -> "5th pct", "p83" -> "83rd pct" (English ordinals: 1st, 2nd, 3rd, 11th–13th, nth).
 */
export function percentileHeading(key: string): string {
  const n = percentileOfKey(key);
  const lastTwo = n % 100;
  const suffix = lastTwo >= 11 && lastTwo <= 13 ? "th" : ({ 1: "st", 2: "nd", 3: "rd" } as Record<number, string>)[n % 10] ?? "th";
  return `${n}${suffix} pct`;
}
