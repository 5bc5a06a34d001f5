import ExcelJS from "exceljs";
import { unzipSync } from "fflate";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../test-support/test-context.js";
import { buildZip, type ZipEntrySpec } from "../test-support/zip-bomb.js";

// Zip bombs in uploads: the workbook library used to unpack every part fully before reading
// the sheet (a 0.6 MB file that expands to 600 MB was accepted after 10 s, memory +3.5 GB).
// Each must now be refused with a 4xx within 10 s while memory grows by less than 200 MB.

const MIB = 1 << 20;
let t: TestContext;
let analyst: SignedInAgent;
beforeAll(async () => {
  t = await createTestContext();
  analyst = await signIn(t.app, "analyst");
});
afterAll(async () => t.close());

/** The parts of a real, small workbook (written by ExcelJS), to which a bomb is added. */
async function workbookParts(rows: unknown[][]): Promise<ZipEntrySpec[]> {
  const wb = new ExcelJS.Workbook();
  const sheet = wb.addWorksheet("Data");
  for (const row of rows) sheet.addRow(row);
  const parts = unzipSync(new Uint8Array(await wb.xlsx.writeBuffer()));
  return Object.entries(parts).map(([name, data]) => ({ name, data: Buffer.from(data) }));
}

const pathwayRows = [["year", "co2_ppm"], [2000, 370], [2001, 372]];
const portfolioRows = [["region", "peril", "currency", "aal", "loss100", "loss200"], ["North Vale", "flood-heavy-rainfall", "EUR", 12, 300, 420]];

/** Sends the upload while sampling resident memory; returns the response, the time and the peak growth. */
async function measuredUpload(path: string, file: Buffer, fields: Record<string, string>) {
  global.gc?.();
  const before = process.memoryUsage().rss;
  let peak = before;
  const sampler = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 20);
  const started = Date.now();
  let req = analyst.post(path);
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  const res = await req.attach("file", file, "bomb.xlsx").timeout(60_000);
  const ms = Date.now() - started;
  clearInterval(sampler);
  peak = Math.max(peak, process.memoryUsage().rss);
  return { res, ms, growthMb: (peak - before) / 1e6 };
}

describe("XLSX zip bombs", () => {
  it("refuses a pathway workbook carrying a 600 MB part (declared honestly) with 413, quickly and without the memory", async () => {
    const file = buildZip([...(await workbookParts(pathwayRows)), { name: "xl/media/image1.png", zeros: 600 * MIB }]);
    expect(file.length).toBeLessThan(MIB);
    const { res, ms, growthMb } = await measuredUpload("/api/pathways/upload", file, { preview: "true" });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe("xlsx_too_large_unpacked");
    expect(res.body.error.message).toMatch(/unpacks to/);
    expect(ms).toBeLessThan(10_000);
    expect(growthMb).toBeLessThan(200);
  }, 60_000);

  it("refuses a sheet that declares 4 kB but inflates to 600 MB, reading no more than the cap", async () => {
    const parts = (await workbookParts(pathwayRows)).map((p) =>
      p.name === "xl/worksheets/sheet1.xml" ? { name: p.name, zeros: 600 * MIB, declaredSize: 4096 } : p,
    );
    const { res, ms, growthMb } = await measuredUpload("/api/pathways/upload", buildZip(parts), { preview: "true" });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe("xlsx_too_large_unpacked");
    expect(ms).toBeLessThan(10_000);
    expect(growthMb).toBeLessThan(200);
  }, 60_000);

  it("refuses a portfolio workbook expanding to 1.9 GB the same way (uploads share one reader)", async () => {
    const file = buildZip([...(await workbookParts(portfolioRows)), { name: "xl/worksheets/sheet2.xml", zeros: 1900 * MIB }]);
    const { res, ms, growthMb } = await measuredUpload("/api/portfolios/upload", file, { preview: "true" });
    expect(res.status).toBe(413);
    expect(ms).toBeLessThan(10_000);
    expect(growthMb).toBeLessThan(200);
  }, 60_000);

  it("still reads an ordinary workbook, skipping parts a table does not need", async () => {
    const parts = [...(await workbookParts(pathwayRows)), { name: "xl/media/logo.png", data: Buffer.alloc(2048, 7) }];
    const { res } = await measuredUpload("/api/pathways/upload", buildZip(parts), { preview: "true" });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ startYear: 2000, endYear: 2001 });
  }, 60_000);
});
