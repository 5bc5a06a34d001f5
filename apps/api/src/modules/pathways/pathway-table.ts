import { FORCING_AGENTS, MAX_PATHWAY_YEARS, MAX_YEAR, MIN_YEAR, type ForcingAgent } from "@plumeline/contracts";
import type { ErrorDetail } from "@plumeline/contracts";
import { columnLetter, type RawCell, type RawRow } from "../../uploads/tabular-file.js";
import { readAgentHeader, type AgentColumn, type SeriesQuantity } from "./pathway-columns.js";

export type PathwaySeries = Partial<Record<ForcingAgent, Partial<Record<SeriesQuantity, number[]>>>>;

export interface ParsedPathwayTable {
  startYear: number;
  endYear: number;
  columns: AgentColumn[];
  /** The engine's pathway `agents` object, agents in FORCING_AGENTS order. */
  agents: PathwaySeries;
  /** Rows as numbers keyed by header (year + agent columns), for the preview. */
  rows: Array<Record<string, number>>;
}

export type TableParseOutcome = { ok: true; table: ParsedPathwayTable } | { ok: false; errors: ErrorDetail[] };

const where = (rowNumber: number, column: number, header: string) =>
  `row ${rowNumber}, column ${columnLetter(column)} (${header || "no header"})`;

function cellText(cell: RawCell): string {
  return cell === null ? "" : String(cell).trim();
}

function readNumber(cell: RawCell): number | string {
  if (typeof cell === "number") return Number.isFinite(cell) ? cell : "is not a finite number";
  const text = cellText(cell);
  if (text === "") return "is empty";
  // Plain decimal or scientific notation only: "1,5" or "12 ppm" would be silently misread.
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(text)) return `"${text}" is not a number`;
  // "1e400" matches the pattern but overflows to Infinity: named here, by its cell.
  const value = Number(text);
  return Number.isFinite(value) ? value : `"${text}" is too large for a number`;
}

/**
 * Validates a header row plus data rows against the upload convention and builds the series.
 * Every problem is collected (row and column named) so the user fixes the file in one go.
 * Years must be whole and consecutive (one value per year, as the engine integrates yearly).
 */
export function parsePathwayTable(rows: RawRow[]): TableParseOutcome {
  const errors: ErrorDetail[] = [];
  const headerRow = rows[0];
  if (!headerRow) return { ok: false, errors: [{ path: "file", message: "is empty; expected a header row" }] };
  const headers = headerRow.cells.map(cellText);
  while (headers.length > 0 && headers[headers.length - 1] === "") headers.pop();

  let yearColumn = -1;
  const columns: Array<{ index: number; column: AgentColumn }> = [];
  const seenAgents = new Map<ForcingAgent, string>();
  headers.forEach((header, index) => {
    if (header.toLowerCase() === "year") {
      if (yearColumn >= 0) errors.push({ path: where(headerRow.rowNumber, index, header), message: "repeats the year column" });
      else yearColumn = index;
      return;
    }
    const read = readAgentHeader(header);
    if (typeof read === "string") {
      errors.push({ path: where(headerRow.rowNumber, index, header), message: read });
      return;
    }
    const earlier = seenAgents.get(read.agent);
    if (earlier) {
      errors.push({
        path: where(headerRow.rowNumber, index, header),
        message: `gives ${read.agent} a second time (already in column ${earlier}); one column per agent`,
      });
      return;
    }
    seenAgents.set(read.agent, `${columnLetter(index)} (${header})`);
    columns.push({ index, column: read });
  });
  if (yearColumn < 0) errors.push({ path: `row ${headerRow.rowNumber}`, message: "has no year column; the header needs a column named year" });
  if (columns.length === 0 && errors.length === 0)
    errors.push({ path: `row ${headerRow.rowNumber}`, message: "names no agent columns (e.g. co2_ppm, aerosol-cloud_erf_wm2)" });

  const dataRows = rows.slice(1).filter((r) => r.cells.some((c) => cellText(c) !== ""));
  if (dataRows.length === 0) errors.push({ path: "file", message: "has a header but no data rows" });
  if (dataRows.length > MAX_PATHWAY_YEARS)
    errors.push({ path: "file", message: `has ${dataRows.length} data rows; at most ${MAX_PATHWAY_YEARS} years are accepted` });
  if (errors.length > 0 && (yearColumn < 0 || columns.length === 0 || dataRows.length === 0)) return { ok: false, errors };

  const values = new Map<ForcingAgent, number[]>(columns.map(({ column }) => [column.agent, []]));
  const previewRows: Array<Record<string, number>> = [];
  let previousYear: number | null = null;
  for (const row of dataRows) {
    const out: Record<string, number> = {};
    const extra = row.cells.findIndex((c, i) => i >= headers.length && cellText(c) !== "");
    if (extra >= 0) errors.push({ path: where(row.rowNumber, extra, ""), message: "holds a value in a column with no header" });

    const yearValue = readNumber(row.cells[yearColumn] ?? null);
    if (typeof yearValue === "string") {
      errors.push({ path: where(row.rowNumber, yearColumn, "year"), message: yearValue });
      previousYear = null;
    } else if (!Number.isInteger(yearValue)) {
      errors.push({ path: where(row.rowNumber, yearColumn, "year"), message: `${yearValue} is not a whole year` });
      previousYear = null;
    } else if (yearValue < MIN_YEAR || yearValue > MAX_YEAR) {
      errors.push({ path: where(row.rowNumber, yearColumn, "year"), message: `${yearValue} is not a plausible year (${MIN_YEAR} to ${MAX_YEAR})` });
      previousYear = null;
    } else {
      if (previousYear !== null && yearValue !== previousYear + 1)
        errors.push({
          path: where(row.rowNumber, yearColumn, "year"),
          message: `${yearValue} does not follow ${previousYear}; years must be consecutive and ascending`,
        });
      previousYear = yearValue;
      out.year = yearValue;
    }

    for (const { index, column } of columns) {
      const value = readNumber(row.cells[index] ?? null);
      if (typeof value === "string") {
        errors.push({ path: where(row.rowNumber, index, column.header), message: value });
        continue;
      }
      if (column.quantity !== "erf" && value < 0) {
        errors.push({ path: where(row.rowNumber, index, column.header), message: `${value} is negative; a concentration cannot be` });
        continue;
      }
      values.get(column.agent)!.push(value);
      out[column.header] = value;
    }
    previewRows.push(out);
  }
  if (errors.length > 0) return { ok: false, errors };

  const agents: PathwaySeries = {};
  const ordered = [...columns].sort((a, b) => FORCING_AGENTS.indexOf(a.column.agent) - FORCING_AGENTS.indexOf(b.column.agent));
  for (const { column } of ordered) agents[column.agent] = { [column.quantity]: values.get(column.agent)! };
  const firstYear = previewRows[0]!.year!;
  return {
    ok: true,
    table: {
      startYear: firstYear,
      endYear: firstYear + dataRows.length - 1,
      columns: ordered.map((c) => c.column),
      agents,
      rows: previewRows,
    },
  };
}
