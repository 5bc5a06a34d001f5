import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { expectBadQuery, insertRun, setCreatedAt } from "../../test-support/list-fixtures.js";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";
import { testModelVersionBody } from "../runs/runs.fixtures.js";

let t: TestContext;
let actuary: SignedInAgent;

beforeAll(async () => {
  t = await createTestContext();
  actuary = await signIn(t.app, "actuary");
  const analyst = await signIn(t.app, "analyst");
  const version = await analyst.post("/api/model-versions").send(testModelVersionBody());
  const coastal = await insertRun(t, {
    name: "Coastal review",
    modelVersionId: version.body.id,
    createdBy: t.userIds.analyst,
    status: "succeeded",
  });
  const inland = await insertRun(t, {
    name: "Inland review",
    modelVersionId: version.body.id,
    createdBy: t.userIds.analyst,
    status: "succeeded",
  });
  // Register rows as the export service writes them (the files themselves are not needed to list them).
  const rows = [
    {
      runId: coastal,
      format: "csv",
      table: "warming_percentiles",
      fileName: "coastal-review-warming_percentiles.csv",
      byteSize: 300,
      by: "actuary",
      day: "2026-05-01",
    },
    {
      runId: coastal,
      format: "xlsx",
      table: "workbook",
      fileName: "coastal-review.xlsx",
      byteSize: 9000,
      by: "analyst",
      day: "2026-05-02",
    },
    { runId: inland, format: "pdf", table: "report", fileName: "inland-review.pdf", byteSize: 5000, by: "actuary", day: "2026-05-03" },
  ] as const;
  for (const row of rows) {
    const id = randomUUID();
    await t.ctx.models.ExportRecord.create({
      id,
      runId: row.runId,
      format: row.format,
      resultTable: row.table,
      fileName: row.fileName,
      exploratory: true,
      resultHash: "1".repeat(64),
      checksum: "2".repeat(64),
      byteSize: row.byteSize,
      createdBy: t.userIds[row.by],
      manifest: null,
    });
    await setCreatedAt(t, "exports", id, `${row.day}T08:00:00Z`);
  }
});
afterAll(async () => {
  await t.close();
});

const files = (body: { items: Array<{ fileName: string }> }) => body.items.map((r) => r.fileName);

describe("GET /api/exports as a paged list", () => {
  it("pages newest first with the total, and sorts by size", async () => {
    const p1 = await actuary.get("/api/exports?limit=2");
    expect(p1.status).toBe(200);
    expect(p1.body.total).toBe(3);
    expect(files(p1.body)).toEqual(["inland-review.pdf", "coastal-review.xlsx"]);
    expect(files((await actuary.get("/api/exports?limit=2&offset=2")).body)).toEqual(["coastal-review-warming_percentiles.csv"]);
    expect(files((await actuary.get("/api/exports?sort=byteSize:asc")).body)).toEqual([
      "coastal-review-warming_percentiles.csv",
      "inland-review.pdf",
      "coastal-review.xlsx",
    ]);
  });

  it("searches file name, table and the run's name; _ literally", async () => {
    expect(files((await actuary.get("/api/exports?q=WORKBOOK")).body)).toEqual(["coastal-review.xlsx"]);
    expect((await actuary.get("/api/exports?q=Coastal Review")).body.total).toBe(2);
    expect(files((await actuary.get("/api/exports?q=_")).body)).toEqual(["coastal-review-warming_percentiles.csv"]);
  });

  it("filters by format, author, mine, run and creation date", async () => {
    expect(files((await actuary.get("/api/exports?format=pdf")).body)).toEqual(["inland-review.pdf"]);
    expect(files((await actuary.get("/api/exports?author=calloway")).body)).toEqual(["coastal-review.xlsx"]);
    expect((await actuary.get("/api/exports?mine=true")).body.total).toBe(2);
    expect(files((await actuary.get("/api/exports?from=2026-05-02&to=2026-05-02")).body)).toEqual(["coastal-review.xlsx"]);
  });

  it("answers 400 naming each bad query field", async () => {
    await expectBadQuery(actuary, "/api/exports?format=docx&sort=checksum:asc&mine=maybe", ["format", "sort", "mine"]);
  });
});
