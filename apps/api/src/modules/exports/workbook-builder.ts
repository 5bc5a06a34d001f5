import type * as ExcelJS from "exceljs";
import { loadExcelJs } from "../../lazy-modules.js";
import {
  CLIMATE_INPUT_UNITS,
  PERIL_RULES,
  PORTFOLIO_TOTAL_NOTES,
  RANGE_SHAPE_LABELS,
  RESULT_CAUTIONS,
  formatUtcDateTime,
  type Distribution,
  type ModelSpec,
  type ResultTable,
  type RunResult,
} from "@plumeline/contracts";
import { PERIL_TABLE_SHEETS } from "../peril-profiles/peril-result-tables.js";
import { perilWarnings } from "../peril-profiles/peril-warnings.js";
import { columnNumberFormat } from "./column-number-format.js";
import { PROBABILITY_FORMAT, probabilityNumberFormat } from "./probability-number-format.js";
import { addMemberSheet, type MemberSheet } from "./member-sheet.js";
import { neutraliseFormula } from "./neutralise-formula.js";
import { withFixedEntryDates } from "./stable-zip.js";
import { resultTable } from "./result-tables.js";
import type { Table, TableCell } from "./table.js";

/** What the manifest sheet states about the run (all of it read from the database, not the request). */
export interface WorkbookManifest {
  runId: string;
  runName: string;
  exploratory: boolean;
  createdBy: string;
  createdAt: string;
  finishedAt: string | null;
  modelVersion: {
    id: string;
    name: string;
    versionNumber: number;
    status: string;
    changeClass: string | null;
    decidedBy: string | null;
    decidedAt: string | null;
  };
  pathways: Array<{ id: string; name: string; source: string; vintage: string; startYear: number; endYear: number; checksum: string }>;
  seed: string;
  members: number;
  sampling: string;
  baseline: [number, number];
  percentiles: number[];
  thresholds: number[];
  horizons: number[];
  engineVersion: string;
  inputHash: string;
  resultHash: string;
  exportedBy: string;
  exportedAt: string;
  /** Reliance and limitation statements recorded with the run, oldest first. */
  statements: Array<{ kind: "reliance" | "limitation"; text: string; by: string; at: string }>;
}

const BOLD = { bold: true } as const;

function safe(cell: TableCell): TableCell {
  return typeof cell === "string" ? neutraliseFormula(cell) : cell;
}

/**
 * A result table on its own sheet: an italic note, the bold header, the rows; the two top
 * rows frozen; each column as wide as its header or widest text (within 10–40 characters);
 * every numeric cell formatted by its column (columnNumberFormat; a probability by its value too,
 * probabilityNumberFormat), the value kept in full.
 */
function addTableSheet(workbook: ExcelJS.Workbook, name: string, table: Table, note: string, quantity: "money" | "physical" = "physical"): ExcelJS.Worksheet {
  const sheet = workbook.addWorksheet(name, { views: [{ state: "frozen", ySplit: 2 }] });
  sheet.addRow([note]).font = { italic: true };
  const header = sheet.addRow(table.columns.map(safe));
  header.font = BOLD;
  for (const row of table.rows) sheet.addRow(row.map(safe));
  table.columns.forEach((column, i) => {
    const numFmt = columnNumberFormat(column, quantity);
    let widest = column.length;
    sheet.getColumn(i + 1).eachCell({ includeEmpty: false }, (cell, rowNumber) => {
      if (rowNumber <= 2) return;
      if (typeof cell.value === "number") {
        cell.numFmt = numFmt === PROBABILITY_FORMAT ? probabilityNumberFormat(cell.value) : numFmt;
        widest = Math.max(widest, numFmt.includes("#,##") ? 14 : 9);
      } else if (typeof cell.value === "string") widest = Math.max(widest, cell.value.length);
    });
    sheet.getColumn(i + 1).width = Math.min(40, Math.max(10, widest + 2));
  });
  return sheet;
}

function describeDistribution(d: Distribution): string {
  switch (d.type) {
    case "fixed":
      return `fixed at ${d.value}`;
    case "normal":
      return `normal, mean ${d.mean}, sd ${d.sd}`;
    case "lognormal":
      return `lognormal, median ${d.median}, log-sd ${d.logSd}`;
    case "uniform":
      return `uniform ${d.min} to ${d.max}`;
    case "triangular":
      return `triangular ${d.min} / mode ${d.mode} / ${d.max}`;
    case "truncated-normal":
      return `truncated normal, mean ${d.mean}, sd ${d.sd}, within ${d.min} to ${d.max}`;
    case "range":
      return `median ${d.p50}, ${d.coverage === 90 ? "5th–95th" : "17th–83rd"} percentiles ${d.low} to ${d.high}, ${RANGE_SHAPE_LABELS[d.shape]}`;
  }
}

/** A time on a sheet: to the second, in UTC, and saying so (a bare ISO "Z" is easy to misread as local). */
const utc = (iso: string | null): string | null => (iso === null ? null : formatUtcDateTime(iso, { seconds: true }));

function addManifest(workbook: ExcelJS.Workbook, m: WorkbookManifest, result: RunResult): void {
  const sheet = workbook.addWorksheet("Manifest");
  sheet.getColumn(1).width = 28;
  sheet.getColumn(2).width = 70;
  const status = sheet.addRow([
    "Status",
    m.exploratory
      ? "EXPLORATORY — made with a model version that was not approved; not for filings"
      : "APPROVED — made with an approved model version",
  ]);
  status.font = { bold: true, size: 13, color: { argb: m.exploratory ? "FFB42318" : "FF05603A" } };
  const mv = m.modelVersion;
  const pairs: Array<[string, TableCell]> = [
    ["Run", `${m.runName} (${m.runId})`],
    ["Run made by", m.createdBy],
    ["Times", "All times in this workbook are UTC."],
    ["Run created at", utc(m.createdAt)],
    ["Run finished at", utc(m.finishedAt)],
    ["Model version", `${mv.name} v${mv.versionNumber} (${mv.id})`],
    ["Model version status (now)", mv.status],
    ["Change class", mv.changeClass],
    ["Decided by", mv.decidedBy],
    ["Decided at", utc(mv.decidedAt)],
    ["Seed", m.seed],
    ["Members", m.members],
    ["Effective members", result.effectiveMembers],
    ["Sampling", m.sampling],
    ["Baseline period", `${m.baseline[0]}–${m.baseline[1]}`],
    ["Percentiles", m.percentiles.join(", ")],
    ["Thresholds (K)", m.thresholds.join(", ")],
    ["Horizons", m.horizons.join(", ")],
    ["Engine version", m.engineVersion],
    ["Input hash", m.inputHash],
    ["Result hash", m.resultHash],
    ["Exported by", m.exportedBy],
    ["Exported at", utc(m.exportedAt)],
  ];
  for (const [k, v] of pairs) {
    const row = sheet.addRow([k, safe(v)]);
    row.getCell(1).font = BOLD;
    // Counts read as counts (10,000), effective members to one decimal; left-aligned like the text beside them.
    if (typeof v === "number") {
      row.getCell(2).numFmt = k === "Effective members" ? "#,##0.0" : "#,##0";
      row.getCell(2).alignment = { horizontal: "left" };
    }
  }
  sheet.addRow([]);
  sheet.addRow(["Pathways"]).font = BOLD;
  sheet.addRow(["id", "name", "source", "vintage", "years", "checksum (SHA-256)"]).font = BOLD;
  for (const p of m.pathways)
    sheet.addRow([p.id, p.name, p.source, p.vintage, `${p.startYear}–${p.endYear}`, p.checksum].map(safe));
  sheet.addRow([]);
  addStatements(sheet, m.statements);
}

/**
 * The reliance and limitation statements recorded with the run (or a line saying none
 * were), on the Manifest and again on the Cautions sheet, so they travel with the numbers.
 */
function addStatements(sheet: ExcelJS.Worksheet, statements: WorkbookManifest["statements"]): void {
  sheet.addRow(["Reliance and limitation statements recorded with this run"]).font = BOLD;
  if (statements.length === 0) {
    sheet.addRow(["none recorded"]);
    return;
  }
  sheet.addRow(["kind", "statement", "recorded by", "recorded at (UTC)"]).font = BOLD;
  for (const st of statements) sheet.addRow([st.kind, st.text, st.by, utc(st.at)].map(safe));
}

function addInputs(workbook: ExcelJS.Workbook, model: ModelSpec): void {
  const sheet = workbook.addWorksheet("Inputs");
  sheet.getColumn(1).width = 24;
  sheet.getColumn(2).width = 16;
  sheet.getColumn(3).width = 70;
  sheet.addRow(["input", "unit", "distribution", "parameters (JSON)"]).font = BOLD;
  for (const [input, d] of Object.entries(model.climate))
    sheet.addRow([input, CLIMATE_INPUT_UNITS[input as keyof typeof CLIMATE_INPUT_UNITS] ?? "", describeDistribution(d), JSON.stringify(d)].map(safe));
  for (const [agent, a] of Object.entries(model.agents))
    if (a) sheet.addRow([`${agent} forcing scale`, "1", describeDistribution(a.scale), JSON.stringify(a.scale)].map(safe));
  sheet.addRow(["other agents' forcing scale", "1", "fixed at 1", ""]);
  sheet.addRow([]);
  sheet.addRow(["Rank correlations (Iman–Conover)"]).font = BOLD;
  if (model.correlations.length === 0) sheet.addRow(["none"]);
  for (const c of model.correlations) sheet.addRow([`${c.between[0]} ~ ${c.between[1]}`, c.rank]).getCell(2).numFmt = "0.00";
  sheet.addRow([]);
  sheet.addRow(["Observational constraint"]).font = BOLD;
  const c = model.constraint;
  sheet.addRow([c ? `warming ${c.from}–${c.to}: observed ${c.observed} K, sd ${c.sd} K` : "none"]);
  sheet.addRow(["Concentration-to-forcing expression", model.forcingExpression]);
}

const TABLE_SHEETS: Array<[ResultTable, string, string]> = [
  ["temperature", "Temperature", "Temperature anomaly (K) vs the baseline period, percentiles by year (linear interpolation, R type 7)"],
  ["horizons", "Horizons", "At each horizon: temperature percentiles (K), probability of exceeding each threshold, committed warming (K: the equilibrium warming F/λ minus the warming since the pathway start, if forcing stayed at that year's level), total forcing (W m-2)"],
  ["exceedance", "Exceedance", "Probability (0–1) that the year's temperature anomaly exceeds each threshold"],
  ["crossing", "Crossing years", "Percentiles of the first year each threshold is crossed; share_never = members that never cross within the pathway"],
  ["sensitivity", "Sensitivity", "What drives the spread at each horizon: variance_share = the input's first-order share of the variance of warming (the shares of one horizon add up to at most 100 %; the rest is interactions between inputs); rank_correlation = Spearman rank correlation with warming (sign = direction). Both weighted under an observational constraint"],
  ["forcing", "Forcing", "Total effective radiative forcing (W m-2), percentiles by year"],
  ["imbalance", "Imbalance", "Top-of-atmosphere imbalance (W m-2), percentiles by year"],
];

/**
 * The portfolio totals sheet: the table (money as #,##0 in each row's currency), then what
 * the totals are and are not — member-by-member sums, no diversification credit, currencies
 * kept apart — so the caveat travels with the numbers.
 */
function addPortfolioTotals(workbook: ExcelJS.Workbook, result: RunResult, tag: string): void {
  const sheet = addTableSheet(
    workbook,
    "Portfolio totals",
    resultTable(result, "portfolio-totals"),
    `${tag}Portfolio totals per pathway, horizon and currency: each member's projected figures summed over all rows, then percentiles; change_pN = pN − today's total (baseline)`,
    "money",
  );
  sheet.addRow([]);
  for (const line of PORTFOLIO_TOTAL_NOTES) sheet.addRow([neutraliseFormula(line)]).font = { italic: true };
  if (result.perils?.totalsRefused) sheet.addRow([neutraliseFormula(`No totals: ${result.perils.totalsRefused}.`)]);
}

/** The run's workbook: Manifest first, result tables, Inputs, Cautions. Returns the .xlsx bytes. */
export async function buildRunWorkbook(manifest: WorkbookManifest, result: RunResult, model: ModelSpec, members: MemberSheet): Promise<Buffer> {
  const workbook = new (await loadExcelJs()).Workbook();
  workbook.creator = "Plumeline";
  // Fixed dates keep the bytes of two exports of the same run comparable apart from the manifest.
  workbook.created = new Date(manifest.exportedAt);
  workbook.modified = new Date(manifest.exportedAt);
  addManifest(workbook, manifest, result);
  const tag = manifest.exploratory ? "EXPLORATORY — " : "";
  for (const [table, name, note] of TABLE_SHEETS) addTableSheet(workbook, name, resultTable(result, table), `${tag}${note}`);
  if (result.perils) for (const [table, name, note] of PERIL_TABLE_SHEETS) addTableSheet(workbook, name, resultTable(result, table), `${tag}${note}`);
  if (result.perils?.portfolioId) addPortfolioTotals(workbook, result, tag);
  addMemberSheet(workbook, members, tag);
  addInputs(workbook, model);
  const cautions = workbook.addWorksheet("Cautions");
  cautions.getColumn(1).width = 120;
  cautions.addRow(["Cautions — read before using these results"]).font = BOLD;
  for (const c of RESULT_CAUTIONS) cautions.addRow([neutraliseFormula(c)]);
  cautions.addRow([]);
  addStatements(cautions, manifest.statements);
  if (result.perils) {
    cautions.addRow([]);
    cautions.addRow(["Peril lens — how the multipliers were applied"]).font = BOLD;
    for (const rule of PERIL_RULES) cautions.addRow([neutraliseFormula(rule)]);
    const warnings = perilWarnings(result);
    if (warnings.length > 0) {
      cautions.addRow([]);
      cautions.addRow(["Peril lens — warnings for this run"]).font = BOLD;
      for (const w of warnings) cautions.addRow([neutraliseFormula(w)]);
    }
  }
  return withFixedEntryDates(Buffer.from(await workbook.xlsx.writeBuffer()), new Date(manifest.exportedAt));
}
