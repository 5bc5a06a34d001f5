/**
 * How a moment reads wherever Plumeline shows it — the web app and the exported workbook: in UTC,
 * and saying so ("2026-12-05 14:03 UTC"), so two people in different offices, and a workbook
 * read months later, see the same time. Text that is not a time is given back unchanged rather
 * than replaced by an invented one.
 */
export function formatUtcDateTime(moment: string | Date, { seconds = false }: { seconds?: boolean } = {}): string {
  const d = typeof moment === "string" ? new Date(moment) : moment;
  if (Number.isNaN(d.getTime())) return String(moment);
  const iso = d.toISOString(); // always UTC: YYYY-MM-DDTHH:MM:SS.sssZ
  return `${iso.slice(0, 10)} ${iso.slice(11, seconds ? 19 : 16)} UTC`;
}
