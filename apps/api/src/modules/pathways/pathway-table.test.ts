import ExcelJS from "exceljs";
import { describe, expect, it } from "vitest";
import { readCsvRows, readXlsxRows } from "../../uploads/tabular-file.js";
import { parsePathwayTable } from "./pathway-table.js";

// The header convention is ours (apps/api/UPLOADS.md); the expected errors below are the
// rows and columns a person reading the file would point at.
const csv = (text: string) => parsePathwayTable(readCsvRows(Buffer.from(text)));

describe("parsePathwayTable", () => {
  it("builds engine series from year + agent columns, agents in contract order", () => {
    const out = csv("year,aerosol-cloud_erf_wm2,CO2_ppm\n1850,-0.1,285\n1851,-0.12,285.5\n");
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.table.startYear).toBe(1850);
    expect(out.table.endYear).toBe(1851);
    expect(Object.keys(out.table.agents)).toEqual(["co2", "aerosol-cloud"]);
    expect(out.table.agents).toEqual({ co2: { ppm: [285, 285.5] }, "aerosol-cloud": { erf: [-0.1, -0.12] } });
  });

  it("names every bad cell by row and column, all at once", () => {
    const out = csv("year,co2_ppm,ch4_ppb\n1850,285,abc\n1851,,800\n1853,-2,810\n");
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.errors).toEqual([
      { path: "row 2, column C (ch4_ppb)", message: '"abc" is not a number' },
      { path: "row 3, column B (co2_ppm)", message: "is empty" },
      { path: "row 4, column A (year)", message: "1853 does not follow 1851; years must be consecutive and ascending" },
      { path: "row 4, column B (co2_ppm)", message: "-2 is negative; a concentration cannot be" },
    ]);
  });

  it("rejects unknown columns, wrong units, repeated agents and a missing year column", () => {
    const out = csv("co2_ppb,sulphate_erf_wm2,ch4_ppb,ch4_erf_wm2\n1,2,3,4\n");
    expect(out.ok).toBe(false);
    if (out.ok) return;
    const paths = out.errors.map((e) => e.path);
    expect(paths).toEqual([
      "row 1, column A (co2_ppb)",
      "row 1, column B (sulphate_erf_wm2)",
      "row 1, column D (ch4_erf_wm2)",
      "row 1",
    ]);
    expect(out.errors[0]!.message).toContain("co2_erf_wm2 (W m-2) or co2_ppm");
  });

  it("reads the same table from an XLSX first sheet", async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet("Pathway");
    ws.addRow(["year", "co2_erf_wm2"]);
    ws.addRow([2000, 1.5]);
    ws.addRow([2001, 1.6]);
    ws.addRow([2002, "x"]);
    const rows = await readXlsxRows(Buffer.from(await wb.xlsx.writeBuffer()));
    const out = parsePathwayTable(rows);
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.errors).toEqual([{ path: "row 4, column B (co2_erf_wm2)", message: '"x" is not a number' }]);
    const fixed = parsePathwayTable(rows.slice(0, 3));
    expect(fixed.ok && fixed.table.agents).toEqual({ co2: { erf: [1.5, 1.6] } });
  });

  it("refuses XLSX formula cells, naming each by row and column, instead of trusting their cached value", async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet("Pathway");
    ws.addRow(["year", "co2_erf_wm2"]);
    ws.addRow([2000, 1.5]);
    // The cached result (99) need not match the formula: nothing checks it.
    ws.addRow([{ formula: "A2+1", result: 2001 }, { formula: "B2+0.1", result: 99 }]);
    const refused = await readXlsxRows(Buffer.from(await wb.xlsx.writeBuffer())).then(
      () => null,
      (error: unknown) => error as { status: number; details: unknown },
    );
    expect(refused?.status).toBe(400);
    expect(refused?.details).toEqual([
      { path: "row 3, column A", message: "is a formula (=A2+1); uploads take typed values only (paste the values in place of formulas)" },
      { path: "row 3, column B", message: "is a formula (=B2+0.1); uploads take typed values only (paste the values in place of formulas)" },
    ]);
  });

  it("names a value too large for a number (1e400) by row and column, not under its agent", () => {
    const out = parsePathwayTable(readCsvRows(Buffer.from("year,co2_ppm\n2000,370\n2001,1e400\n")));
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.errors).toEqual([{ path: "row 3, column B (co2_ppm)", message: '"1e400" is too large for a number' }]);
  });

  it("refuses implausible years (1000–3000), naming the cell", () => {
    const far = parsePathwayTable(readCsvRows(Buffer.from("year,co2_ppm\n1000000000000000,370\n")));
    expect(far.ok).toBe(false);
    if (far.ok) return;
    expect(far.errors).toEqual([{ path: "row 2, column A (year)", message: "1000000000000000 is not a plausible year (1000 to 3000)" }]);
  });
});
