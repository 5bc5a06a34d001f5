import { parse } from "csv-parse/sync";
import ExcelJS from "exceljs";
import { quantile } from "d3-array";
import { MEMBER_SHEET_MAX_MEMBERS, type RunResult } from "@plumeline/contracts";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createSqlJobQueue } from "../../queue/sql-job-queue.js";
import { binaryBody } from "../../test-support/binary-body.js";
import { requestUserOf } from "../../test-support/request-user.js";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";
import { EngineThread } from "../../workers/engine-thread-client.js";
import { processNextRunJob } from "../../workers/process-run-job.js";
import { createModelVersion } from "../model-versions/model-versions.service.js";
import { createPathway } from "../pathways/pathways.service.js";
import { compressResult } from "../results/result-document.js";
import { testModelVersionBody, testPathwayBody } from "../runs/runs.fixtures.js";

let t: TestContext;
let analyst: SignedInAgent;
let actuary: SignedInAgent;

async function finishedRun(members: number, seed: string): Promise<{ runId: string; result: RunResult }> {
  const user = await requestUserOf(t, "analyst");
  const pathway = await createPathway(t.ctx, user, testPathwayBody(`Ramp ${seed}`));
  const version = await createModelVersion(t.ctx, user, testModelVersionBody({ name: `Assumptions ${seed}` }));
  const res = await analyst.post("/api/runs").send({ modelVersionId: version.id, pathwayIds: [pathway.id], members, seed, sampling: "latin-hypercube" });
  expect(res.status).toBe(201);
  const thread = new EngineThread(`members-${seed}`);
  try {
    expect(await processNextRunJob(t.ctx, createSqlJobQueue(t.ctx.models.Job), `members-${seed}`, thread)).toBe("succeeded");
  } finally {
    await thread.terminate();
  }
  return { runId: res.body.id, result: (await analyst.get(`/api/runs/${res.body.id}/result`)).body };
}

let small: { runId: string; result: RunResult };

beforeAll(async () => {
  t = await createTestContext();
  [analyst, actuary] = await Promise.all([signIn(t.app, "analyst"), signIn(t.app, "actuary")]);
  small = await finishedRun(500, "member-table");
});
afterAll(async () => t.close());

describe("GET /api/runs/:id/tables/members.csv", () => {
  let rows: Array<Record<string, string>>;
  let header: string[];

  it("has one row per member: member, the uncertain inputs by name, weight, then <pathwayId>@<year>", async () => {
    const res = await actuary.get(`/api/runs/${small.runId}/tables/members.csv`);
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toContain("text/csv");
    expect(res.headers["content-disposition"]).toContain("-members.csv");
    rows = parse<Record<string, string>>(res.text, { columns: true });
    header = Object.keys(rows[0]!);
    const p = small.result.pathways[0]!;
    const inputs = [...new Set(p.sensitivity.map((s) => s.input))];
    expect(header).toEqual(["member", ...inputs, "weight", ...p.horizons.map((h) => `${p.id}@${h.year}`)]);
    expect(rows).toHaveLength(500);
    expect(rows.map((r) => Number(r.member))).toEqual(Array.from({ length: 500 }, (_, i) => i + 1));
    // No observational constraint in this model: every member weighs 1.
    expect(rows.every((r) => r.weight === "1")).toBe(true);
  });

  it("reproduces the run's horizon percentiles exactly from its warming columns (R type 7, d3-array quantile)", () => {
    // Hyndman & Fan (1996) definition 7, which d3-array's quantile implements: linear
    // interpolation between order statistics at (n − 1)p.
    const p = small.result.pathways[0]!;
    for (const h of p.horizons) {
      const column = rows.map((r) => Number(r[`${p.id}@${h.year}`]));
      for (const [key, value] of Object.entries(h.temperature)) expect(quantile(column, Number(key.slice(1)) / 100)).toBe(value);
    }
  });

  it("records the export in the register with the checksum of the bytes handed out", async () => {
    const list = await actuary.get(`/api/exports?runId=${small.runId}`);
    expect(list.body.items[0]).toMatchObject({ table: "members", format: "csv", resultHash: small.result.resultHash });
    expect(list.body.items[0].checksum).toMatch(/^[0-9a-f]{64}$/);
  });

  it("refuses with 409 when the stored engine version or result hash does not come back, and records nothing", async () => {
    const stored = (await t.ctx.models.RunResult.findByPk(small.runId))!;
    const original = stored.document;
    const before = await t.ctx.models.ExportRecord.count({ where: { runId: small.runId } });
    try {
      await stored.update({ document: compressResult({ ...small.result, engineVersion: "0.0.1" }).document });
      const old = await actuary.get(`/api/runs/${small.runId}/tables/members.csv`);
      expect(old.status).toBe(409);
      expect(old.body.error.code).toBe("engine_version_mismatch");
      expect(old.body.error.message).toContain("engine 0.0.1");
      await stored.update({ document: compressResult({ ...small.result, resultHash: "0".repeat(64) }).document });
      const changed = await actuary.get(`/api/runs/${small.runId}/tables/members.csv`);
      expect(changed.status).toBe(409);
      expect(changed.body.error.code).toBe("result_hash_mismatch");
      expect(changed.body.error.message).toContain(small.result.resultHash);
    } finally {
      await stored.update({ document: original });
    }
    expect(await t.ctx.models.ExportRecord.count({ where: { runId: small.runId } })).toBe(before);
  });

  it("answers 404 for an unknown run", async () => {
    expect((await actuary.get("/api/runs/missing/tables/members.csv")).status).toBe(404);
  });
});

describe("the workbook's Members sheet", () => {
  it("holds the member table for a run within the sheet limit, equal to the CSV", async () => {
    const res = await actuary.get(`/api/runs/${small.runId}/workbook.xlsx`).buffer(true).parse(binaryBody);
    expect(res.status).toBe(200);
    const book = new ExcelJS.Workbook();
    await book.xlsx.load(res.body);
    const sheet = book.getWorksheet("Members")!;
    expect(sheet.getRow(1).getCell(1).text).toContain("One row per member");
    const csv = parse<Record<string, string>>((await actuary.get(`/api/runs/${small.runId}/tables/members.csv`)).text, { columns: true });
    const header = (sheet.getRow(2).values as unknown[]).slice(1);
    expect(header).toEqual(Object.keys(csv[0]!));
    expect(sheet.rowCount).toBe(2 + 500);
    for (const m of [0, 249, 499]) expect((sheet.getRow(3 + m).values as unknown[]).slice(1)).toEqual(header.map((c) => Number(csv[m]![c as string])));
  });

  it(`says the sheet is left out above ${MEMBER_SHEET_MAX_MEMBERS.toLocaleString("en-GB")} members and points to the CSV`, async () => {
    const big = await finishedRun(MEMBER_SHEET_MAX_MEMBERS + 1, "member-table-big");
    const res = await actuary.get(`/api/runs/${big.runId}/workbook.xlsx`).buffer(true).parse(binaryBody);
    expect(res.status).toBe(200);
    const book = new ExcelJS.Workbook();
    await book.xlsx.load(res.body);
    const text = book.getWorksheet("Members")!.getSheetValues().flat().map(String).join("\n");
    expect(text).toContain("Member table left out of this workbook");
    expect(text).toContain(`/api/runs/${big.runId}/tables/members.csv`);
    // The CSV itself has no such limit.
    const csv = await actuary.get(`/api/runs/${big.runId}/tables/members.csv`);
    expect(csv.status).toBe(200);
    expect(csv.text.trimEnd().split("\r\n")).toHaveLength(1 + MEMBER_SHEET_MAX_MEMBERS + 1);
  });
});
