import { parse } from "csv-parse/sync";
import ExcelJS from "exceljs";
import type { RawCell, RawRow } from "./pathway-table.js";

/** Upload types accepted, by extension; the content is checked by parsing, not trusted from the name. */
export const PATHWAY_FILE_TYPES = { ".csv": "csv", ".xlsx": "xlsx" } as const;
export type PathwayFileType = (typeof PATHWAY_FILE_TYPES)[keyof typeof PATHWAY_FILE_TYPES];

export function pathwayFileType(fileName: string): PathwayFileType | null {
  const lower = fileName.toLowerCase();
  for (const [ext, type] of Object.entries(PATHWAY_FILE_TYPES)) if (lower.endsWith(ext)) return type;
  return null;
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

function xlsxCell(value: ExcelJS.CellValue): RawCell {
  if (value === null || value === undefined) return null;
  if (typeof value === "number" || typeof value === "string") return value;
  if (typeof value === "boolean") return String(value);
  if (value instanceof Date) return value.toISOString();
  if (typeof value === "object") {
    if ("result" in value) return xlsxCell((value as ExcelJS.CellFormulaValue).result as ExcelJS.CellValue);
    if ("richText" in value) return value.richText.map((t) => t.text).join("");
    if ("text" in value) return String(value.text);
    if ("error" in value) return String(value.error);
  }
  return String(value);
}

/** Rows of the workbook's first sheet, numbered as the spreadsheet numbers them. */
export async function readXlsxRows(buffer: Buffer): Promise<RawRow[]> {
  const workbook = new ExcelJS.Workbook();
  try {
    await workbook.xlsx.load(buffer as unknown as ArrayBuffer);
  } catch (error) {
    throw new UnreadableFileError(`the XLSX workbook could not be read: ${(error as Error).message}`);
  }
  const sheet = workbook.worksheets[0];
  if (!sheet) throw new UnreadableFileError("the XLSX workbook has no sheet");
  const rows: RawRow[] = [];
  sheet.eachRow({ includeEmpty: false }, (row, rowNumber) => {
    const cells: RawCell[] = [];
    for (let c = 1; c <= row.cellCount; c++) cells.push(xlsxCell(row.getCell(c).value));
    rows.push({ rowNumber, cells });
  });
  return rows;
}
