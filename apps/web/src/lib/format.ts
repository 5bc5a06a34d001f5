/** Number and date formatting shared by tables and charts, so the same value reads the same everywhere. */
export const formatKelvin = (v: number | null | undefined, digits = 2) =>
  v === null || v === undefined || !Number.isFinite(v) ? "–" : `${v.toFixed(digits)}`;

export const formatNumber = (v: number | null | undefined, digits = 2) =>
  v === null || v === undefined || !Number.isFinite(v) ? "–" : v.toFixed(digits);

export const formatPercent = (share: number | null | undefined, digits = 0) =>
  share === null || share === undefined || !Number.isFinite(share) ? "–" : `${(share * 100).toFixed(digits)} %`;

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
