import ExcelJS from "exceljs";

/** Reads a downloaded .xlsx file with exceljs (the library the API writes it with, used independently here). */
export async function readWorkbook(file: string): Promise<ExcelJS.Workbook> {
  const workbook = new ExcelJS.Workbook();
  await workbook.xlsx.readFile(file);
  return workbook;
}

/** The Manifest sheet's key/value rows (column A -> column B). */
export function manifestPairs(workbook: ExcelJS.Workbook): Map<string, string> {
  const sheet = workbook.getWorksheet("Manifest");
  if (!sheet) throw new Error(`no Manifest sheet; sheets: ${workbook.worksheets.map((w) => w.name).join(", ")}`);
  const pairs = new Map<string, string>();
  sheet.eachRow((row) => {
    const key = row.getCell(1).text;
    if (key && !pairs.has(key)) pairs.set(key, row.getCell(2).text);
  });
  return pairs;
}

/**
 * A result-table sheet (note on row 1, header on row 2, then data) as records keyed by the
 * header, numbers kept as numbers.
 */
export function tableRows(workbook: ExcelJS.Workbook, name: string): Array<Record<string, unknown>> {
  const sheet = workbook.getWorksheet(name);
  if (!sheet) throw new Error(`no sheet "${name}"; sheets: ${workbook.worksheets.map((w) => w.name).join(", ")}`);
  const header = (sheet.getRow(2).values as unknown[]).slice(1).map(String);
  const rows: Array<Record<string, unknown>> = [];
  sheet.eachRow((row, n) => {
    if (n <= 2) return;
    const values = (row.values as unknown[]).slice(1);
    rows.push(Object.fromEntries(header.map((h, i) => [h, values[i]])));
  });
  return rows;
}
