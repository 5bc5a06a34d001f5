/**
 * Reading uploaded tables (pathways, portfolios): CSV or XLSX bytes -> numbered raw rows.
 * Each module then parses the rows by its own header rules and names bad cells by row and column.
 */
import { parse } from "csv-parse/sync";
import type * as ExcelJS from "exceljs";
import { loadExcelJs } from "../lazy-modules.js";
import { AppError, badRequest } from "../errors/app-error.js";
import { extractNeededXlsxParts, XlsxNotAZipError } from "./xlsx-parts.js";

/** A cell as read from CSV (text) or XLSX (number, text, or empty). */
export type RawCell = string | number | null;
/** One sheet row with its row number as the user sees it (1 = the header row). */
export interface RawRow {
  rowNumber: number;
  cells: RawCell[];
}

/** The part of a multer file the readers need. */
export interface UploadedFile {
  originalname: string;
  buffer: Buffer;
}

/** Upload types accepted, by extension; the content is checked by parsing, not trusted from the name. */
export const TABULAR_FILE_TYPES = { ".csv": "csv", ".xlsx": "xlsx" } as const;
export type TabularFileType = (typeof TABULAR_FILE_TYPES)[keyof typeof TABULAR_FILE_TYPES];

export function tabularFileType(fileName: string): TabularFileType | null {
  const lower = fileName.toLowerCase();
  for (const [ext, type] of Object.entries(TABULAR_FILE_TYPES)) if (lower.endsWith(ext)) return type;
  return null;
}

/** Spreadsheet column letter of a zero-based column index (0 -> A, 26 -> AA). */
export function columnLetter(index: number): string {
  let n = index + 1;
  let out = "";
  while (n > 0) {
    const rem = (n - 1) % 26;
    out = String.fromCharCode(65 + rem) + out;
    n = Math.floor((n - 1) / 26);
  }
  return out;
}

/** A request without a file is a 400 naming the `file` field. */
export function assertFileGiven(file: UploadedFile | undefined): asserts file is UploadedFile {
  if (!file) throw badRequest([{ path: "file", message: "is required (a .csv or .xlsx file)" }]);
}

/**
 * The rows of an uploaded CSV or XLSX file. Another file type or unreadable bytes are a 400
 * naming the `file` field; bad cells are left to the caller's parser.
 */
export async function readUploadedRows(file: UploadedFile): Promise<RawRow[]> {
  const type = tabularFileType(file.originalname);
  if (!type)
    throw new AppError(400, "unsupported_file_type", `"${file.originalname}" is not a .csv or .xlsx file.`, [
      { path: "file", message: "must be a .csv or .xlsx file" },
    ]);
  try {
    return type === "csv" ? readCsvRows(file.buffer) : await readXlsxRows(file.buffer);
  } catch (error) {
    if (error instanceof UnreadableFileError) throw badRequest([{ path: "file", message: error.message }], "The file could not be read.");
    throw error;
  }
}

/** Thrown when the bytes are not a readable CSV/XLSX at all (as opposed to bad cells). */
export class UnreadableFileError extends Error {}

/**
 * CSV rows with the line numbers a text editor shows (csv-parse's `info.lines`), so errors can
 * name the row. Comma, semicolon or tab separated; a UTF-8 byte-order mark is dropped.
 */
export function readCsvRows(buffer: Buffer): RawRow[] {
  try {
    const records = parse(buffer, {
      bom: true,
      delimiter: [",", ";", "\t"],
      relax_column_count: true,
      skip_empty_lines: false,
      info: true,
    }) as unknown as Array<{ record: string[]; info: { lines: number } }>;
    return records.map(({ record, info }) => ({ rowNumber: info.lines, cells: record }));
  } catch (error) {
    throw new UnreadableFileError(`the CSV could not be read: ${(error as Error).message}`);
  }
}

/** A formula cell: its cached result is whatever the last program to save the file wrote. */
function isFormula(value: ExcelJS.CellValue): boolean {
  return typeof value === "object" && value !== null && ("formula" in value || "sharedFormula" in value);
}

function xlsxCell(value: ExcelJS.CellValue): RawCell {
  if (value === null || value === undefined) return null;
  if (typeof value === "number" || typeof value === "string") return value;
  if (typeof value === "boolean") return String(value);
  if (value instanceof Date) return value.toISOString();
  if (typeof value === "object") {
    if ("richText" in value) return value.richText.map((t) => t.text).join("");
    if ("text" in value) return value.text;
    if ("error" in value) return value.error;
  }
  return JSON.stringify(value);
}

/**
 * Rows of the workbook's first sheet, numbered as the spreadsheet numbers them. The bytes are
 * unpacked under size caps first (xlsx-parts.ts: a zip bomb is a 413). Formula cells are
 * refused, each named by row and column: their cached value is not checked by anyone and
 * need not match the formula, so an upload must carry typed values.
 */
export async function readXlsxRows(buffer: Buffer): Promise<RawRow[]> {
  let parts: Buffer;
  try {
    parts = await extractNeededXlsxParts(buffer);
  } catch (error) {
    if (error instanceof XlsxNotAZipError) throw new UnreadableFileError(`the XLSX workbook could not be read: ${error.message}`);
    throw error;
  }
  const workbook = new (await loadExcelJs()).Workbook();
  try {
    await workbook.xlsx.load(parts as unknown as ArrayBuffer);
  } catch (error) {
    throw new UnreadableFileError(`the XLSX workbook could not be read: ${(error as Error).message}`);
  }
  const sheet = workbook.worksheets[0];
  if (!sheet) throw new UnreadableFileError("the XLSX workbook has no sheet");
  const rows: RawRow[] = [];
  const formulas: Array<{ path: string; message: string }> = [];
  sheet.eachRow({ includeEmpty: false }, (row, rowNumber) => {
    const cells: RawCell[] = [];
    for (let c = 1; c <= row.cellCount; c++) {
      const value = row.getCell(c).value;
      if (isFormula(value)) {
        const formula = (value as { formula?: string }).formula;
        formulas.push({
          path: `row ${rowNumber}, column ${columnLetter(c - 1)}`,
          message: `is a formula${formula ? ` (=${formula})` : ""}; uploads take typed values only (paste the values in place of formulas)`,
        });
        cells.push(null);
      } else cells.push(xlsxCell(value));
    }
    rows.push({ rowNumber, cells });
  });
  if (formulas.length > 0)
    throw badRequest(formulas, `The workbook has ${formulas.length} formula cell${formulas.length === 1 ? "" : "s"}; nothing was saved.`);
  return rows;
}
