import { createHash } from "node:crypto";
import { demoPortfolioCsv } from "@plumeline/seeds";
import ExcelJS from "exceljs";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";
import { MAX_PORTFOLIO_UPLOAD_BYTES } from "./portfolios.routes.js";

let t: TestContext;
let analyst: SignedInAgent;
let actuary: SignedInAgent;
let manager: SignedInAgent;

// The demo upload file (seeds test: identical to seeds/src/perils/demo-portfolio.csv).
const demoCsv = Buffer.from(demoPortfolioCsv());

beforeAll(async () => {
  t = await createTestContext();
  [analyst, actuary, manager] = await Promise.all([signIn(t.app, "analyst"), signIn(t.app, "actuary"), signIn(t.app, "manager")]);
});
afterAll(async () => {
  await t.close();
});

const csv = (lines: string[]) => Buffer.from(lines.join("\n") + "\n");
const HEADER = "region,peril,currency,aal,loss100,loss200";

function upload(agent: SignedInAgent, file: Buffer, fileName: string, fields: Record<string, string> = {}) {
  let req = agent.post("/api/portfolios/upload");
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req.attach("file", file, fileName);
}

describe("POST /api/portfolios/upload", () => {
  it("previews the demo CSV without saving, with the checksum it would get", async () => {
    const before = await t.ctx.models.Portfolio.count();
    const res = await upload(actuary, demoCsv, "demo-portfolio.csv", { preview: "true" });
    expect(res.status).toBe(200);
    expect(res.body.rowCount).toBe(5);
    expect(res.body.rows[0]).toEqual({ region: "Northmere Coast", peril: "flood-heavy-rainfall", currency: "EUR", aal: 18400000, loss100: 310000000, loss200: 455000000 });
    expect(res.body.currencies).toEqual(["EUR"]);
    expect(res.body.checksum).toMatch(/^[0-9a-f]{64}$/);
    expect(await t.ctx.models.Portfolio.count()).toBe(before);
  });

  it("saves the upload with its owner, checksum and audit row; list and read return it", async () => {
    const res = await upload(actuary, demoCsv, "demo-portfolio.csv", { name: "Test baseline" });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: "Test baseline", rowCount: 5, createdBy: t.userIds.actuary, fileName: "demo-portfolio.csv" });
    expect(res.body.regions).toEqual(["Northmere Coast", "Vellan Basin", "Ostrand Uplands"]);
    // Checksum: SHA-256 of the RFC 8785 canonical JSON of the rows (keys sorted, integers plain).
    const canonical = JSON.stringify(
      res.body.rows.map((r: Record<string, unknown>) => Object.fromEntries(Object.keys(r).sort().map((k) => [k, r[k]]))),
    );
    expect(res.body.checksum).toBe(createHash("sha256").update(canonical).digest("hex"));
    const list = await manager.get("/api/portfolios");
    expect(list.status).toBe(200);
    expect(list.body.find((p: { id: string }) => p.id === res.body.id)).toMatchObject({ rowCount: 5, checksum: res.body.checksum });
    expect(list.body[0].rows).toBeUndefined();
    const one = await analyst.get(`/api/portfolios/${res.body.id}`);
    expect(one.status).toBe(200);
    expect(one.body.rows).toHaveLength(5);
    const audit = await t.ctx.models.AuditEvent.findOne({ where: { action: "portfolio.uploaded", entityId: res.body.id } });
    expect(audit?.actorId).toBe(t.userIds.actuary);
  });

  it("reads the same rows from an XLSX workbook (first sheet, columns in any order)", async () => {
    const wb = new ExcelJS.Workbook();
    const sheet = wb.addWorksheet("Baseline");
    sheet.addRow(["Peril", "Region", "Currency", "AAL", "loss100", "loss200"]);
    sheet.addRow(["wind", "Northmere Coast", "GBP", 1200.5, 30000, 41000]);
    const buffer = Buffer.from(await wb.xlsx.writeBuffer());
    const res = await upload(analyst, buffer, "baseline.xlsx", { preview: "true" });
    expect(res.status).toBe(200);
    expect(res.body.rows).toEqual([{ region: "Northmere Coast", peril: "wind", currency: "GBP", aal: 1200.5, loss100: 30000, loss200: 41000 }]);
  });

  it("names row and column of every bad cell and saves nothing (negative loss, 1-in-200 below 1-in-100, unknown currency, duplicate, not a number)", async () => {
    const before = await t.ctx.models.Portfolio.count();
    const auditsBefore = await t.ctx.models.AuditEvent.count({ where: { action: "portfolio.uploaded" } });
    const res = await upload(
      actuary,
      csv([
        HEADER,
        "North,wind,EUR,100,1000,2000",
        "North,hail,EUR,-5,1000,2000",
        "South,wind,EUR,100,3000,2000",
        "South,flood-heavy-rainfall,ZZZ,100,1000,2000",
        "North,wind,EUR,100,1000,2000",
        "East,wind,EUR,12 M,1000,2000",
      ]),
      "bad.csv",
      { name: "Bad" },
    );
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/nothing was saved/);
    const details = res.body.error.details as Array<{ path: string; message: string }>;
    expect(details.map((d) => d.path)).toEqual([
      "row 3, column D (aal)",
      "row 4, column F (loss200)",
      "row 5, column C (currency)",
      "row 6, column A (region)",
      "row 7, column D (aal)",
    ]);
    expect(details[3]!.message).toContain("already given in row 2");
    expect(details[1]!.message).toContain("1-in-200");
    expect(await t.ctx.models.Portfolio.count()).toBe(before);
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "portfolio.uploaded" } })).toBe(auditsBefore);
  });

  it("names a value too large for a number (1e400) by row and column", async () => {
    const res = await upload(actuary, csv([HEADER, "North,wind,EUR,1e400,1000,2000"]), "big.csv", { preview: "true" });
    expect(res.status).toBe(400);
    expect(res.body.error.details).toEqual([{ path: "row 2, column D (aal)", message: '"1e400" is too large for a number' }]);
  });

  it("names header problems: unknown and missing columns", async () => {
    const res = await upload(actuary, csv(["region,peril,currency,aal,loss100,loss250", "North,wind,EUR,1,2,3"]), "h.csv", { preview: "true" });
    expect(res.status).toBe(400);
    expect(res.body.error.details).toEqual([
      { path: "row 1, column F (loss250)", message: expect.stringContaining("not a known column") },
      { path: "row 1", message: expect.stringContaining("has no loss200 column") },
    ]);
  });

  it("answers 400 for a missing file, a file of another type, an empty file and a missing name", async () => {
    const none = await actuary.post("/api/portfolios/upload").field("name", "x");
    expect(none.status).toBe(400);
    expect(none.body.error.details[0].path).toBe("file");
    const txt = await upload(actuary, demoCsv, "portfolio.txt", { name: "x" });
    expect(txt.status).toBe(400);
    expect(txt.body.error.code).toBe("unsupported_file_type");
    const empty = await upload(actuary, Buffer.from(""), "empty.csv", { name: "x" });
    expect(empty.status).toBe(400);
    const noName = await upload(actuary, demoCsv, "demo.csv");
    expect(noName.status).toBe(400);
    expect(noName.body.error.details).toEqual([{ path: "name", message: "must not be empty" }]);
  });

  it("answers 413 for a file above the size limit", async () => {
    const big = Buffer.alloc(MAX_PORTFOLIO_UPLOAD_BYTES + 10, "a");
    const res = await upload(actuary, big, "big.csv", { preview: "true" });
    expect(res.status).toBe(413);
  });

  it("answers 401 without a session and 403 for a role without perils:write", async () => {
    expect((await request(t.app).get("/api/portfolios")).status).toBe(401);
    const res = await upload(manager, demoCsv, "demo.csv", { preview: "true" });
    expect(res.status).toBe(403);
    expect(res.body.error.message).toContain("perils:write");
  });

  it("answers 404 for an unknown portfolio", async () => {
    expect((await analyst.get("/api/portfolios/missing")).status).toBe(404);
  });
});
