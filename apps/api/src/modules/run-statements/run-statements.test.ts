import request from "supertest";
import ExcelJS from "exceljs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createSqlJobQueue } from "../../queue/sql-job-queue.js";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";
import { EngineThread } from "../../workers/engine-thread-client.js";
import { processNextRunJob } from "../../workers/process-run-job.js";
import { createModelVersion } from "../model-versions/model-versions.service.js";
import { createPathway } from "../pathways/pathways.service.js";
import { testModelVersionBody, testPathwayBody } from "../runs/runs.fixtures.js";
import { binaryBody } from "../../test-support/binary-body.js";
import { requestUserOf } from "../../test-support/request-user.js";

let t: TestContext;
let analyst: SignedInAgent;
let actuary: SignedInAgent;
let manager: SignedInAgent;
let finishedRunId: string;
let queuedRunId: string;


beforeAll(async () => {
  t = await createTestContext();
  [analyst, actuary, manager] = await Promise.all([signIn(t.app, "analyst"), signIn(t.app, "actuary"), signIn(t.app, "manager")]);
  const user = await requestUserOf(t, "analyst");
  const pathway = await createPathway(t.ctx, user, testPathwayBody());
  const version = await createModelVersion(t.ctx, user, testModelVersionBody());
  const body = { modelVersionId: version.id, pathwayIds: [pathway.id], members: 200, seed: "statements", sampling: "monte-carlo" };
  finishedRunId = (await analyst.post("/api/runs").send(body)).body.id;
  const thread = new EngineThread("statements-test");
  try {
    expect(await processNextRunJob(t.ctx, createSqlJobQueue(t.ctx.models.Job), "statements-test", thread)).toBe("succeeded");
  } finally {
    await thread.terminate();
  }
  queuedRunId = (await analyst.post("/api/runs").send({ ...body, seed: "still-queued" })).body.id;
});
afterAll(async () => t.close());

const reliance = "Relies on the firm's 2025 catastrophe-model baseline for AAL and the 1-in-200 loss.";
// Starts with "=": a spreadsheet would run it as a formula unless neutralised.
const limitation = "=Not used for reserving; heat losses exclude exposure growth.";

describe("run statements (reliance and limitations)", () => {
  it("records statements with a finished run, lists them oldest first, and audits each", async () => {
    const first = await actuary.post(`/api/runs/${finishedRunId}/statements`).send({ kind: "reliance", text: `  ${reliance}  ` });
    expect(first.status).toBe(201);
    expect(first.body).toMatchObject({ runId: finishedRunId, kind: "reliance", text: reliance, createdBy: t.userIds.actuary });
    expect(first.body.createdByName).toBeTruthy();
    expect((await actuary.post(`/api/runs/${finishedRunId}/statements`).send({ kind: "limitation", text: limitation })).status).toBe(201);

    const list = await manager.get(`/api/runs/${finishedRunId}/statements`);
    expect(list.status).toBe(200);
    expect(list.body.map((s: { kind: string }) => s.kind)).toEqual(["reliance", "limitation"]);
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "run.statement-recorded", entityId: finishedRunId } })).toBe(2);
  });

  it("writes them into the workbook's Manifest and Cautions sheets, neutralised", async () => {
    const res = await actuary.get(`/api/runs/${finishedRunId}/workbook.xlsx`).buffer(true).parse(binaryBody);
    expect(res.status).toBe(200);
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.load(res.body);
    for (const sheet of ["Manifest", "Cautions"]) {
      const values = workbook.getWorksheet(sheet)!.getSheetValues().flat().map(String);
      expect(values).toContain("Reliance and limitation statements recorded with this run");
      expect(values).toContain(reliance);
      // OWASP CSV-injection guidance: a leading "=" gets an apostrophe so the cell stays text.
      expect(values).toContain(`'${limitation}`);
    }
  });

  it("answers 400 naming the field, 401, 403, 404 and 409 for a run without results", async () => {
    const empty = await actuary.post(`/api/runs/${finishedRunId}/statements`).send({ kind: "reliance", text: "   " });
    expect(empty.status).toBe(400);
    expect(empty.body.error.details[0].path).toBe("text");
    const kind = await actuary.post(`/api/runs/${finishedRunId}/statements`).send({ kind: "opinion", text: "x" });
    expect(kind.status).toBe(400);
    expect(kind.body.error.details[0].path).toBe("kind");
    expect((await request(t.app).get(`/api/runs/${finishedRunId}/statements`)).status).toBe(401);
    // Managers read statements but record none (runs:create is the analyst's and the actuary's).
    expect((await manager.post(`/api/runs/${finishedRunId}/statements`).send({ kind: "reliance", text: "x" })).status).toBe(403);
    expect((await actuary.get("/api/runs/missing/statements")).status).toBe(404);
    expect((await actuary.post("/api/runs/missing/statements").send({ kind: "reliance", text: "x" })).status).toBe(404);
    const early = await actuary.post(`/api/runs/${queuedRunId}/statements`).send({ kind: "reliance", text: "x" });
    expect(early.status).toBe(409);
    expect(early.body.error.code).toBe("run_not_finished");
  });
});
