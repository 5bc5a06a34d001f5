import type { PathwayResult, ResultTable, RunResult } from "@plumeline/contracts";
import { perilTable } from "../peril-profiles/peril-result-tables.js";
import { portfolioTotalsTable } from "../peril-profiles/portfolio-totals-table.js";
import type { Table, TableCell } from "./table.js";

/** Percentile keys in the order the result gives them ("p5", "p17", …), then "mean" if present. */
function statKeys(series: Record<string, number[]>): string[] {
  const keys = Object.keys(series).filter((k) => k.startsWith("p"));
  keys.sort((a, b) => Number(a.slice(1)) - Number(b.slice(1)));
  return "mean" in series ? [...keys, "mean"] : keys;
}

function yearlySeries(result: RunResult, pick: (p: PathwayResult) => Record<string, number[]>): Table {
  const first = result.pathways[0];
  const keys = first ? statKeys(pick(first)) : [];
  const rows: TableCell[][] = [];
  for (const p of result.pathways) {
    const series = pick(p);
    p.years.forEach((year, i) => rows.push([p.id, p.name, year, ...keys.map((k) => series[k]?.[i] ?? null)]));
  }
  return { columns: ["pathway_id", "pathway_name", "year", ...keys], rows };
}

const thresholdKeys = (result: RunResult) =>
  Object.keys(result.pathways[0]?.exceedance ?? {}).sort((a, b) => Number(a) - Number(b));

/** Per-year probability (0–1) that warming exceeds each threshold. */
function exceedanceTable(result: RunResult): Table {
  const thresholds = thresholdKeys(result);
  const rows: TableCell[][] = [];
  for (const p of result.pathways)
    p.years.forEach((year, i) => rows.push([p.id, p.name, year, ...thresholds.map((t) => p.exceedance[t]?.[i] ?? null)]));
  return { columns: ["pathway_id", "pathway_name", "year", ...thresholds.map((t) => `p_exceed_${t}K`)], rows };
}

/** First-crossing year percentiles per threshold; "never" is the share of members that never cross. */
function crossingTable(result: RunResult): Table {
  const first = result.pathways[0];
  const sample = first ? Object.values(first.crossing)[0] ?? {} : {};
  const keys = Object.keys(sample).filter((k) => k !== "never");
  keys.sort((a, b) => Number(a.slice(1)) - Number(b.slice(1)));
  const rows: TableCell[][] = [];
  for (const p of result.pathways)
    for (const t of Object.keys(p.crossing).sort((a, b) => Number(a) - Number(b))) {
      const c = p.crossing[t]!;
      rows.push([p.id, p.name, Number(t), ...keys.map((k) => c[k] ?? null), c.never ?? null]);
    }
  return { columns: ["pathway_id", "pathway_name", "threshold_K", ...keys.map((k) => `${k}_year`), "share_never"], rows };
}

/** One row per pathway and horizon: temperature percentiles, exceedance, committed warming, forcing. */
function horizonsTable(result: RunResult): Table {
  const h0 = result.pathways[0]?.horizons[0];
  const pk = h0 ? statKeys(Object.fromEntries(Object.keys(h0.temperature).map((k) => [k, []]))) : [];
  const tk = h0 ? Object.keys(h0.exceedance).sort((a, b) => Number(a) - Number(b)) : [];
  const rows: TableCell[][] = [];
  for (const p of result.pathways)
    for (const h of p.horizons)
      rows.push([
        p.id,
        p.name,
        h.year,
        ...pk.map((k) => h.temperature[k] ?? null),
        ...tk.map((t) => h.exceedance[t] ?? null),
        ...pk.map((k) => h.committed[k] ?? null),
        ...pk.map((k) => h.forcing[k] ?? null),
      ]);
  return {
    columns: [
      "pathway_id",
      "pathway_name",
      "year",
      ...pk.map((k) => `temperature_${k}_K`),
      ...tk.map((t) => `p_exceed_${t}K`),
      ...pk.map((k) => `committed_${k}_K`),
      ...pk.map((k) => `forcing_${k}_Wm2`),
    ],
    rows,
  };
}

/**
 * The sensitivity budget: per pathway, horizon and input, the first-order share (0–1) of the
 * variance of warming (`variance_share`; empty for results of engines before 0.3.0) and the
 * rank correlation with warming (`rank_correlation`, Spearman; both weighted under a
 * constraint). The shares of one horizon add up to at most 1; the rest is interactions.
 */
function sensitivityTable(result: RunResult): Table {
  const rows: TableCell[][] = [];
  for (const p of result.pathways)
    for (const s of p.sensitivity) rows.push([p.id, p.name, s.horizon, s.input, s.varianceShare ?? null, s.index]);
  return { columns: ["pathway_id", "pathway_name", "horizon", "input", "variance_share", "rank_correlation"], rows };
}

/**
 * The result as flat tables, one per export table name. Units: temperature and committed warming
 * in K (anomaly vs the run's baseline period), forcing and imbalance in W m-2, probabilities 0–1.
 */
export function resultTable(result: RunResult, table: ResultTable): Table {
  switch (table) {
    case "temperature":
      return yearlySeries(result, (p) => p.temperature);
    case "forcing":
      return yearlySeries(result, (p) => p.forcing);
    case "imbalance":
      return yearlySeries(result, (p) => p.imbalance);
    case "exceedance":
      return exceedanceTable(result);
    case "crossing":
      return crossingTable(result);
    case "horizons":
      return horizonsTable(result);
    case "sensitivity":
      return sensitivityTable(result);
    case "peril-multipliers":
    case "peril-return-periods":
    case "peril-losses":
      return perilTable(result, table);
    case "portfolio-totals":
      return portfolioTotalsTable(result);
  }
}
