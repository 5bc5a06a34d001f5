import type { RunResult } from "@plumeline/contracts";
import type { Table, TableCell } from "../exports/table.js";
import { summaryKeys } from "./peril-result-tables.js";

const METRICS = [
  ["aal", "aal"],
  ["loss100", "loss_1_in_100"],
  ["loss200", "loss_1_in_200"],
] as const;

/**
 * The portfolio totals as one flat table: a row per pathway, horizon, metric and currency,
 * with today's total (`baseline`), the percentiles and mean of the member-by-member totals,
 * and each percentile's change against today (`change_p50` = p50 − baseline: today's total
 * is the same for every member, so subtracting it commutes with taking percentiles). Amounts
 * in the row's currency at full precision; a result without totals gives the header alone.
 */
export function portfolioTotalsTable(result: RunResult): Table {
  const names = new Map(result.pathways.map((p) => [p.id, p.name]));
  const blocks = (result.perils?.pathways ?? []).flatMap((pw) => (pw.totals ?? []).map((total) => ({ pw, total })));
  const keys = summaryKeys(blocks[0]?.total.horizons[0]?.aal);
  const percentileKeys = keys.filter((k) => k !== "mean");
  const rows: TableCell[][] = [];
  for (const { pw, total } of blocks)
    for (const h of total.horizons)
      for (const [field, metric] of METRICS) {
        const summary = h[field];
        const baseline = total.baseline[field];
        rows.push([
          pw.pathwayId,
          names.get(pw.pathwayId) ?? "",
          h.year,
          metric,
          total.currency,
          total.rows,
          total.projectedRows,
          baseline,
          ...keys.map((k) => summary[k] ?? null),
          ...percentileKeys.map((k) => (summary[k] === undefined ? null : summary[k] - baseline)),
        ]);
      }
  return {
    columns: [
      "pathway_id",
      "pathway_name",
      "horizon",
      "metric",
      "currency",
      "rows",
      "projected_rows",
      "baseline",
      ...keys,
      ...percentileKeys.map((k) => `change_${k}`),
    ],
    rows,
  };
}
