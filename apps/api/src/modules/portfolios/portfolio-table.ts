import { portfolioRowsSchema, type ErrorDetail, type PortfolioRow } from "@plumeline/contracts";
import { columnLetter, type RawCell, type RawRow } from "../../uploads/tabular-file.js";

/**
 * The portfolio upload convention: a header row naming the six columns below (any order,
 * case-insensitive), then one row per region and peril. Losses in the row's currency, per
 * year (aal) and at the 1-in-100 and 1-in-200 annual return periods.
 */
export const PORTFOLIO_COLUMNS = ["region", "peril", "currency", "aal", "loss100", "loss200"] as const;
type Column = (typeof PORTFOLIO_COLUMNS)[number];
const NUMERIC: ReadonlySet<Column> = new Set(["aal", "loss100", "loss200"]);

/** Most rows one upload may hold (a baseline is a few hundred region x peril lines at most). */
export const MAX_PORTFOLIO_ROWS = 5000;

export type PortfolioParseOutcome = { ok: true; rows: PortfolioRow[] } | { ok: false; errors: ErrorDetail[] };

const text = (cell: RawCell | undefined) => (cell === null || cell === undefined ? "" : String(cell).trim());

function readNumber(cell: RawCell | undefined): number | string {
  if (typeof cell === "number") return Number.isFinite(cell) ? cell : "is not a finite number";
  const t = text(cell);
  if (t === "") return "is empty";
  // Plain decimal or scientific notation: "1,5" or "12 M" would be silently misread.
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(t)) return `"${t}" is not a number (write plain digits, e.g. 18400000)`;
  // "1e400" matches the pattern but overflows to Infinity: named here, by its cell.
  const value = Number(t);
  return Number.isFinite(value) ? value : `"${t}" is too large for a number`;
}

/**
 * Validates the header and every data row and returns the rows, or every problem found, each
 * named "row N, column L (field)" as the spreadsheet numbers them. Cell problems (not a
 * number) are found here; the rules of a row (ISO 4217 currency, no negative loss, 1-in-200 at
 * least the 1-in-100, no repeated region and peril) come from the shared contracts schema,
 * whose `[i].field` paths are mapped back to the file's rows and columns.
 */
export function parsePortfolioTable(rows: RawRow[]): PortfolioParseOutcome {
  const headerRow = rows[0];
  if (!headerRow) return { ok: false, errors: [{ path: "file", message: "is empty; expected a header row (region, peril, currency, aal, loss100, loss200)" }] };
  const errors: ErrorDetail[] = [];
  const columnOf = new Map<Column, number>();
  headerRow.cells.forEach((cell, index) => {
    const header = text(cell);
    if (header === "") return;
    const name = header.toLowerCase() as Column;
    const at = `row ${headerRow.rowNumber}, column ${columnLetter(index)} (${header})`;
    if (!(PORTFOLIO_COLUMNS as readonly string[]).includes(name))
      errors.push({ path: at, message: `is not a known column; the columns are ${PORTFOLIO_COLUMNS.join(", ")}` });
    else if (columnOf.has(name)) errors.push({ path: at, message: `repeats the ${name} column (already column ${columnLetter(columnOf.get(name)!)})` });
    else columnOf.set(name, index);
  });
  for (const c of PORTFOLIO_COLUMNS)
    if (!columnOf.has(c)) errors.push({ path: `row ${headerRow.rowNumber}`, message: `has no ${c} column; the header needs ${PORTFOLIO_COLUMNS.join(", ")}` });
  const dataRows = rows.slice(1).filter((r) => r.cells.some((c) => text(c) !== ""));
  if (dataRows.length === 0) errors.push({ path: "file", message: "has a header but no data rows" });
  if (dataRows.length > MAX_PORTFOLIO_ROWS) errors.push({ path: "file", message: `has ${dataRows.length} data rows; at most ${MAX_PORTFOLIO_ROWS} are accepted` });
  if (errors.length > 0) return { ok: false, errors };

  const where = (i: number, column: Column) => `row ${dataRows[i]!.rowNumber}, column ${columnLetter(columnOf.get(column)!)} (${column})`;
  const badCells = new Set<string>();
  const candidates = dataRows.map((row, i) => {
    const out: Record<string, unknown> = {};
    for (const column of PORTFOLIO_COLUMNS) {
      const cell = row.cells[columnOf.get(column)!];
      if (!NUMERIC.has(column)) {
        out[column] = text(cell);
        continue;
      }
      const value = readNumber(cell);
      if (typeof value === "string") {
        errors.push({ path: where(i, column), message: value });
        badCells.add(`${i}:${column}`);
        out[column] = 0;
      } else out[column] = value;
    }
    const extra = row.cells.findIndex((c, index) => text(c) !== "" && ![...columnOf.values()].includes(index));
    if (extra >= 0) errors.push({ path: `row ${row.rowNumber}, column ${columnLetter(extra)}`, message: "holds a value in a column with no header" });
    return out;
  });

  const parsed = portfolioRowsSchema.safeParse(candidates);
  if (!parsed.success)
    for (const issue of parsed.error.issues) {
      const [index, field] = issue.path;
      if (typeof index !== "number" || typeof field !== "string" || !columnOf.has(field as Column)) {
        errors.push({ path: "file", message: issue.message });
        continue;
      }
      if (badCells.has(`${index}:${field}`)) continue; // already reported as not a number
      // The schema names other rows by index (rows[3]); say the file's row number instead.
      const message = issue.message.replace(/rows\[(\d+)\]/g, (_, k: string) => `row ${dataRows[Number(k)]?.rowNumber ?? k}`);
      errors.push({ path: where(index, field as Column), message });
    }
  if (errors.length > 0) return { ok: false, errors: sortByRow(errors) };
  return { ok: true, rows: parsed.data! };
}

/** File order: header problems, then rows top to bottom, then columns left to right. */
function sortByRow(errors: ErrorDetail[]): ErrorDetail[] {
  const key = (e: ErrorDetail) => {
    const m = /^row (\d+)(?:, column ([A-Z]+))?/.exec(e.path);
    return m ? [Number(m[1]), m[2] ? m[2].length * 1000 + m[2].charCodeAt(m[2].length - 1) : 0] : [Number.MAX_SAFE_INTEGER, 0];
  };
  return errors
    .map((e, i) => ({ e, i, k: key(e) }))
    .sort((a, b) => a.k[0]! - b.k[0]! || a.k[1]! - b.k[1]! || a.i - b.i)
    .map(({ e }) => e);
}
