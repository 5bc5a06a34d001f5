/** Number and date formatting shared by tables and charts, so the same value reads the same everywhere. */

// One home for the rules a figure is written by, shared with the PDF report (contracts).
export { formatFixed, formatKelvin, formatPercent, formatProbability, formatMoney, formatSignificant, moneyScale, moneyUnit, type MoneyScale } from "@plumeline/contracts";
import { formatFixed } from "@plumeline/contracts";

export const formatNumber = (v: number | null | undefined, digits = 2) =>
  v === null || v === undefined || !Number.isFinite(v) ? "–" : formatFixed(v, digits);

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

export { percentileOfKey, percentileHeading } from "@plumeline/contracts";
