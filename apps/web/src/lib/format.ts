/** Number and date formatting shared by tables and charts, so the same value reads the same everywhere. */

// One home for the rules a figure is written by, shared with the PDF report (contracts).
export {
  formatFixed,
  formatKelvin,
  formatPercent,
  formatProbability,
  formatMoney,
  formatSignificant,
  moneyScale,
  moneyUnit,
  type MoneyScale,
} from "@plumeline/contracts";
import { formatFixed, formatPercent, formatUtcDateTime } from "@plumeline/contracts";

export const formatNumber = (v: number | null | undefined, digits = 2) =>
  v === null || v === undefined || !Number.isFinite(v) ? "–" : formatFixed(v, digits);

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

/**
 * A moment as "2026-12-05 14:03 UTC": every time in the app is shown in UTC and says so, the same
 * for every reader whatever their browser's zone, and the same as the exported workbook.
 */
export function formatDateTime(iso: string | null | undefined): string {
  return iso ? formatUtcDateTime(iso) : "–";
}

/** A day as "5 Dec 2026", taken in UTC like the times, so a date and its time never disagree. */
export function formatDate(iso: string | null | undefined): string {
  if (!iso) return "–";
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  return d.toLocaleDateString("en-GB", { dateStyle: "medium", timeZone: "UTC" });
}

export { percentileOfKey, percentileHeading } from "@plumeline/contracts";
