import { neutraliseFormula } from "./neutralise-formula.js";
import type { Table, TableCell } from "./table.js";

/**
 * RFC 4180 CSV: comma-separated, CRLF line ends, fields quoted when they hold a comma, quote or
 * line break (quotes doubled). Text is formula-neutralised first; numbers are written with
 * JavaScript's shortest round-trip form so reading them back gives the same doubles.
 */
function field(cell: TableCell): string {
  if (cell === null) return "";
  if (typeof cell === "number") return Number.isFinite(cell) ? String(cell) : "";
  const text = neutraliseFormula(cell);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** One CSV record with its CRLF, for writers that stream rows batch by batch. */
export function csvRecord(cells: readonly TableCell[]): string {
  return cells.map(field).join(",") + "\r\n";
}

export function tableToCsv(table: Table): string {
  return csvRecord(table.columns) + table.rows.map(csvRecord).join("");
}
