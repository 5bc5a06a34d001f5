import { demoPortfolioCsv } from "@plumeline/seeds";
import ExcelJS from "exceljs";
import { parse } from "csv-parse/sync";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";
import { createSqlJobQueue } from "../../queue/sql-job-queue.js";
import { EngineThread } from "../../workers/engine-thread-client.js";
import { processNextRunJob } from "../../workers/process-run-job.js";
import { testModelVersionBody, testPathwayBody, testRainfallProfileBody } from "../runs/runs.fixtures.js";

let t: TestContext;
let analyst: SignedInAgent;
let actuary: SignedInAgent;
let pathwayId: string;
let versionId: string;
let portfolioId: string;

beforeAll(async () => {
  t = await createTestContext();
  [analyst, actuary] = await Promise.all([signIn(t.app, "analyst"), signIn(t.app, "actuary")]);
  pathwayId = (await analyst.post("/api/pathways").send(testPathwayBody())).body.id;
  versionId = (await analyst.post("/api/model-versions").send(testModelVersionBody())).body.id;
  portfolioId = (
    await actuary.post("/api/portfolios/upload").field("name", "Baseline").attach("file", Buffer.from(demoPortfolioCsv()), "demo.csv")
  ).body.id;
});
afterAll(async () => {
  await t.close();
});

const runBody = (extra: object) => ({ modelVersionId: versionId, pathwayIds: [pathwayId], members: 20, seed: "peril", sampling: "monte-carlo", ...extra });

describe("runs with the peril lens", () => {
  it("copies the profiles and the portfolio rows into the stored spec and locks the profiles", async () => {
    const profile = (await actuary.post("/api/peril-profiles").send(testRainfallProfileBody)).body;
    const res = await actuary.post("/api/runs").send(runBody({ perilProfileIds: [profile.id], portfolioId }));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ perilProfileIds: [profile.id], portfolioId });
    const run = await actuary.get(`/api/runs/${res.body.id}`);
    const spec = run.body.manifest.spec;
    expect(spec.perils).toEqual([{ id: profile.id, ...testRainfallProfileBody }]);
    expect(spec.portfolio.id).toBe(portfolioId);
    expect(spec.portfolio.rows).toEqual((await actuary.get(`/api/portfolios/${portfolioId}`)).body.rows);

    const after = (await actuary.get(`/api/peril-profiles/${profile.id}`)).body;
    expect(after.locked).toBe(true);
    expect(after.lockedBy.runIds).toEqual([res.body.id]);
    const edit = await actuary.patch(`/api/peril-profiles/${profile.id}`).send({ baselineWarming: 1.2 });
    expect(edit.status).toBe(409);
    expect(edit.body.error.code).toBe("peril_profile_locked");
  });

  it("leaves the spec without perils when the run names none", async () => {
    const res = await actuary.post("/api/runs").send(runBody({}));
    expect(res.status).toBe(201);
    const spec = (await actuary.get(`/api/runs/${res.body.id}`)).body.manifest.spec;
    expect(spec.perils).toBeUndefined();
    expect(spec.portfolio).toBeUndefined();
  });

  it("answers 400 naming unknown and repeated profile ids, an unknown portfolio, and a portfolio without profiles; queues nothing", async () => {
    const profile = (await actuary.post("/api/peril-profiles").send(testRainfallProfileBody)).body;
    const before = await t.ctx.models.Run.count();
    const bad = await actuary.post("/api/runs").send(runBody({ perilProfileIds: [profile.id, "missing", profile.id], portfolioId: "nope" }));
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.map((d: { path: string }) => d.path).sort()).toEqual(["perilProfileIds[1]", "perilProfileIds[2]", "portfolioId"]);
    const alone = await actuary.post("/api/runs").send(runBody({ portfolioId }));
    expect(alone.status).toBe(400);
    expect(alone.body.error.details).toEqual([{ path: "portfolioId", message: expect.stringContaining("at least one peril profile") }]);
    expect(await t.ctx.models.Run.count()).toBe(before);
    expect((await actuary.get(`/api/peril-profiles/${profile.id}`)).body.locked).toBe(false);
  });
});

describe("a finished run with the peril lens (worker step, result, CSV, workbook, replay)", () => {
  it("returns the perils block, exports it as CSV and workbook sheets equal to the JSON, and replays to the same hash", async () => {
    const profile = (await actuary.post("/api/peril-profiles").send({ ...testRainfallProfileBody, name: "Flood e2e" })).body;
    // Only this run in the queue: earlier tests' runs are cancelled first.
    for (const run of await t.ctx.models.Run.findAll({ where: { status: "queued" } })) await actuary.post(`/api/runs/${run.id}/cancel`);
    const created = await actuary.post("/api/runs").send(runBody({ perilProfileIds: [profile.id], portfolioId, members: 60, seed: "peril-e2e" }));
    expect(created.status).toBe(201);
    const thread = new EngineThread("peril-e2e");
    try {
      expect(await processNextRunJob(t.ctx, createSqlJobQueue(t.ctx.models.Job), "peril-test", thread, { progressWriteMs: 20 })).toBe("succeeded");
    } finally {
      await thread.terminate();
    }
    const result = (await actuary.get(`/api/runs/${created.body.id}/result`)).body;
    expect(result.perils.portfolioId).toBe(portfolioId);
    // The demo file has five rows; one profile (flood, Northmere Coast) projects one of them.
    expect(result.perils.unmatchedRows).toHaveLength(4);
    const flood2100 = result.perils.pathways[0].profiles[0].horizons.find((h: { year: number }) => h.year === 2100);
    expect(flood2100.losses[0]).toMatchObject({ region: "Northmere Coast", peril: "flood-heavy-rainfall", currency: "EUR" });
    // Fixed 7 %/K: each member's multiplier is 1.07^(its warming − 1.1), a monotone map, so the median multiplier is
    // 1.07^(median warming − 1.1) up to R-7's interpolation between the two middle members (60 members).
    const t2100 = result.pathways[0].horizons.find((h: { year: number }) => h.year === 2100).temperature.p50;
    expect(flood2100.multiplier.p50 / 1.07 ** (t2100 - 1.1) - 1).toBeLessThan(1e-3);
    expect(flood2100.multiplier.p50 / 1.07 ** (t2100 - 1.1) - 1).toBeGreaterThan(-1e-3);

    const csv = await actuary.get(`/api/runs/${created.body.id}/tables/peril-losses.csv`);
    expect(csv.status).toBe(200);
    const rows = parse<Record<string, string>>(csv.text, { columns: true });
    const aal2100 = rows.find((r) => r.year === "2100" && r.measure === "aal")!;
    expect(Number(aal2100.loss_p50)).toBe(flood2100.losses[0].aal.p50);

    const xlsx = await actuary.get(`/api/runs/${created.body.id}/workbook.xlsx`).buffer(true).parse((res, cb) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("end", () => cb(null, Buffer.concat(chunks)));
    });
    expect(xlsx.status).toBe(200);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(xlsx.body as ArrayBuffer);
    const sheet = wb.getWorksheet("Peril multipliers")!;
    const header = (sheet.getRow(2).values as unknown[]).slice(1) as string[];
    const row2100 = sheet.getRows(3, sheet.rowCount - 2)!.find((r) => r.getCell(header.indexOf("year") + 1).value === 2100)!;
    expect(row2100.getCell(header.indexOf("multiplier_p50") + 1).value).toBe(flood2100.multiplier.p50);
    expect(wb.getWorksheet("Projected losses")).toBeDefined();
    expect(wb.getWorksheet("Return periods")).toBeDefined();

    // A replay goes through the run queue like a run: queued (202), then a worker step runs it.
    const replay = await actuary.post(`/api/runs/${created.body.id}/replay`);
    expect(replay.status).toBe(202);
    const replayThread = new EngineThread("peril-replay");
    try {
      expect(await processNextRunJob(t.ctx, createSqlJobQueue(t.ctx.models.Job), "peril-test", replayThread, { progressWriteMs: 20 })).toBe("succeeded");
    } finally {
      await replayThread.terminate();
    }
    const replayed = await actuary.get(`/api/runs/${created.body.id}/replays/${replay.body.id}`);
    expect(replayed.body).toMatchObject({ status: "succeeded", matched: true });
  });
});
