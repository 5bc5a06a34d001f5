import { runEnsemble } from "@plumeline/engine";
import type { RunSpec } from "@plumeline/contracts";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createSqlJobQueue } from "../../queue/sql-job-queue.js";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, demoUser, type TestContext } from "../../test-support/test-context.js";
import { EngineThread } from "../../workers/engine-thread-client.js";
import { RUN_JOB_TYPE } from "../../queue/job-types.js";
import { processNextRunJob } from "../../workers/process-run-job.js";
import { startWorkerPool } from "../../workers/worker-pool.js";
import { createModelVersion, decideModelVersion, retireModelVersion, submitModelVersion } from "../model-versions/model-versions.service.js";
import { createPathway } from "../pathways/pathways.service.js";
import { testModelVersionBody, testPathwayBody } from "./runs.fixtures.js";
import { requestUserOf } from "../../test-support/request-user.js";

let t: TestContext;
let analyst: SignedInAgent;
let actuary: SignedInAgent;
let manager: SignedInAgent;
let thread: EngineThread;
let draftId: string;
let approvedId: string;
let pathwayIds: string[];
const queue = () => createSqlJobQueue(t.ctx.models.Job);
const step = () => processNextRunJob(t.ctx, queue(), "test-worker", thread, { progressWriteMs: 20 });

const asUser = (key: "analyst" | "manager" | "manager2") => requestUserOf(t, key);
const waitFor = async (check: () => Promise<boolean>, ms = 20_000) => {
  const end = Date.now() + ms;
  while (Date.now() < end) {
    if (await check()) return;
    await new Promise((r) => setTimeout(r, 25));
  }
  throw new Error("timed out waiting");
};
const runBody = (overrides: Record<string, unknown> = {}) => ({ modelVersionId: draftId, pathwayIds, members: 400, seed: "harbour-1", sampling: "latin-hypercube", ...overrides });

beforeAll(async () => {
  t = await createTestContext();
  [analyst, actuary, manager] = await Promise.all([signIn(t.app, "analyst"), signIn(t.app, "actuary"), signIn(t.app, "manager")]);
  const a = await asUser("analyst");
  pathwayIds = [(await createPathway(t.ctx, a, testPathwayBody("Ramp 4"))).id, (await createPathway(t.ctx, a, testPathwayBody("Ramp 6", 6))).id];
  draftId = (await createModelVersion(t.ctx, a, testModelVersionBody({ name: "Draft" }))).id;
  approvedId = (await createModelVersion(t.ctx, a, testModelVersionBody({ name: "Approved" }))).id;
  await submitModelVersion(t.ctx, a, approvedId, "major");
  await decideModelVersion(t.ctx, await asUser("manager"), approvedId, "approved", "ok");
  thread = new EngineThread("test-worker");
});
afterAll(async () => {
  await thread.terminate();
  await t.close();
});

describe("POST /api/runs", () => {
  it("queues the run and its job together, locks the pathways and audits it", async () => {
    const res = await analyst.post("/api/runs").send(runBody());
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ status: "queued", progress: 0, exploratory: true, members: 400, modelVersion: { id: draftId, status: "draft" } });
    const run = (await t.ctx.models.Run.findByPk(res.body.id))!;
    const job = (await t.ctx.models.Job.findByPk(run.jobId!))!;
    expect(job).toMatchObject({ type: RUN_JOB_TYPE, status: "queued", payload: { runId: run.id } });
    expect(run.spec.pathways.map((p) => p.id)).toEqual(pathwayIds);
    expect(run.spec.horizons).toEqual([2030, 2050, 2100]);
    expect((await t.ctx.models.Pathway.findByPk(pathwayIds[0]))?.locked).toBe(true);
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "run.created", entityId: run.id } })).toBe(1);
    await t.ctx.models.Job.update({ status: "cancelled" }, { where: { id: job.id } }); // keep the queue clear for later tests
  });

  it("names each pathway in the run's manifest with the checksum, source and vintage the pathway has", async () => {
    const res = await analyst.post("/api/runs").send(runBody({ seed: "manifest-names" }));
    const got = await analyst.get(`/api/runs/${res.body.id}`);
    expect(got.status).toBe(200);
    const expected = await Promise.all(
      pathwayIds.map(async (id) => {
        const p = (await analyst.get(`/api/pathways/${id}`)).body as { id: string; name: string; checksum: string; source: string; vintage: string };
        return { id, name: p.name, checksum: p.checksum, source: p.source, vintage: p.vintage };
      }),
    );
    expect(got.body.manifest.pathways).toEqual(expected);
    expect(expected.every((p) => p.checksum.length === 64)).toBe(true);
    await queue().requestCancel((await t.ctx.models.Run.findByPk(res.body.id))!.jobId!);
  });

  it("answers 401, 403 (manager lacks runs:create), 400 naming bad fields, and 404", async () => {
    expect((await request(t.app).post("/api/runs").send(runBody())).status).toBe(401);
    const denied = await manager.post("/api/runs").send(runBody());
    expect(denied.status).toBe(403);
    expect(denied.body.error.message).toContain("runs:create");
    const bad = await analyst.post("/api/runs").send(runBody({ members: 0, sampling: "grid" }));
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.map((d: { path: string }) => d.path)).toEqual(["members", "sampling"]);
    const outside = await analyst.post("/api/runs").send(runBody({ horizons: [2030, 2200] }));
    expect(outside.status).toBe(400);
    expect(outside.body.error.details[0].path).toBe("spec.horizons[1]");
    const unknown = await analyst.post("/api/runs").send(runBody({ modelVersionId: "nope", pathwayIds: [pathwayIds[0], "gone"] }));
    expect(unknown.body.error.details).toEqual([
      { path: "modelVersionId", message: "model version nope does not exist" },
      { path: "pathwayIds[1]", message: "pathway gone does not exist" },
    ]);
    expect((await analyst.get("/api/runs/nope")).status).toBe(404);
    expect(await t.ctx.models.Job.count({ where: { status: "queued" } })).toBe(0);
  });
});

describe("running a job", () => {
  let runId: string;
  let spec: RunSpec;

  it("runs the engine in a worker thread and stores the result in one go", async () => {
    const res = await actuary.post("/api/runs").send(runBody({ modelVersionId: approvedId, name: "Approved run" }));
    runId = res.body.id;
    expect(res.body.exploratory).toBe(false);
    expect(await step()).toBe("succeeded");
    const run = await actuary.get(`/api/runs/${runId}`);
    expect(run.body).toMatchObject({ status: "succeeded", progress: 1, exploratory: false });
    spec = run.body.manifest.spec;
    const result = await actuary.get(`/api/runs/${runId}/result`);
    expect(result.status).toBe(200);
    // Same spec in this process, straight through the engine: identical hashes (the contract's reproducibility rule).
    const direct = runEnsemble(spec);
    expect(result.body.resultHash).toBe(direct.resultHash);
    expect(run.body.manifest).toMatchObject({ resultHash: direct.resultHash, inputHash: direct.inputHash, engineVersion: direct.engineVersion });
    // Stored as one gzip document: served as those bytes to a client that accepts gzip, and
    // equal to the engine's own result once inflated (supertest inflates gzip answers).
    const raw = await actuary.get(`/api/runs/${runId}/result`).set("Accept-Encoding", "gzip");
    expect(raw.headers["content-encoding"]).toBe("gzip");
    expect(raw.body).toEqual(JSON.parse(JSON.stringify(direct)));
    const plain = await actuary.get(`/api/runs/${runId}/result`).set("Accept-Encoding", "identity");
    expect(plain.headers["content-encoding"]).toBeUndefined();
    expect(plain.body.resultHash).toBe(direct.resultHash);
    const stored = (await t.ctx.models.RunResult.findByPk(runId))!;
    expect(stored.encoding).toBe("gzip-json");
    expect(stored.document.length).toBeLessThan(stored.jsonBytes / 2);
    expect((await t.ctx.models.Job.findOne({ where: { id: (await t.ctx.models.Run.findByPk(runId))!.jobId! } }))?.status).toBe("succeeded");
  });

  it("mails the owner and audits the outcome", async () => {
    await t.ctx.mailer.idle();
    const mails = await t.ctx.models.OutboxMessage.findAll();
    expect(mails.some((m) => JSON.stringify(m.get({ plain: true })).includes(demoUser("actuary").email) && m.get("subject").includes("Run finished"))).toBe(true);
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "run.succeeded", entityId: runId } })).toBe(1);
  });

  it("lists runs (mine, by status) and replays a run to the same hash", async () => {
    const mine = await actuary.get("/api/runs?mine=true&status=succeeded");
    expect(mine.status).toBe(200);
    expect(mine.body.items.map((r: { id: string }) => r.id)).toEqual([runId]);
    expect(mine.body.total).toBe(1);
    expect((await actuary.get("/api/runs?status=bogus")).status).toBe(400);
    // A replay is queued like a run (same queue, same WORKERS limit) ...
    const replay = await actuary.post(`/api/runs/${runId}/replay`);
    expect(replay.status).toBe(202);
    expect(replay.body).toMatchObject({ status: "queued", progress: 0, matched: null });
    // ... one at a time per person: a second one waits for the first to finish.
    const second = await actuary.post(`/api/runs/${runId}/replay`);
    expect(second.status).toBe(409);
    expect(second.body.error.code).toBe("replay_in_progress");
    expect(await step()).toBe("succeeded");
    const done = await actuary.get(`/api/runs/${runId}/replays/${replay.body.id}`);
    expect(done.body).toMatchObject({ status: "succeeded", progress: 1, matched: true });
    expect(done.body.replayHash).toBe(done.body.resultHash);
    expect((await actuary.get(`/api/runs/${runId}/replays`)).body.map((r: { id: string }) => r.id)).toEqual([replay.body.id]);
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "run.replayed", entityId: runId } })).toBe(1);
    expect((await actuary.post(`/api/runs/${runId}/replay`)).status).toBe(202); // free again
    expect(await step()).toBe("succeeded");
  });

  it("answers 409 for the result of a run that has not finished", async () => {
    const res = await analyst.post("/api/runs").send(runBody());
    const early = await analyst.get(`/api/runs/${res.body.id}/result`);
    expect(early.status).toBe(409);
    expect(early.body.error.code).toBe("result_not_ready");
    expect((await actuary.post(`/api/runs/${res.body.id}/cancel`)).status).toBe(403);
    const cancelled = await analyst.post(`/api/runs/${res.body.id}/cancel`);
    expect(cancelled.body.status).toBe("cancelled");
    // A second cancel is a no-op: same answer, no second audit row.
    const again = await analyst.post(`/api/runs/${res.body.id}/cancel`);
    expect(again.status).toBe(200);
    expect(again.body).toMatchObject({ status: "cancelled", cancelRequested: false });
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "run.cancelled", entityId: res.body.id } })).toBe(1);
    expect(await step()).toBe("idle");
  });

  it("cancels a running run at the next year boundary", async () => {
    const res = await analyst.post("/api/runs").send(runBody({ members: 100_000 }));
    const running = step();
    await waitFor(async () => (await t.ctx.models.Run.findByPk(res.body.id))?.status === "running");
    // Two cancels at once (a double click): both answer "cancelling", one audit row.
    const [cancel, twice] = await Promise.all([analyst.post(`/api/runs/${res.body.id}/cancel`), analyst.post(`/api/runs/${res.body.id}/cancel`)]);
    expect([cancel.status, twice.status]).toEqual([200, 200]);
    for (const answer of [cancel, twice]) expect(answer.body).toMatchObject({ status: "running", cancelRequested: true });
    expect(await running).toBe("cancelled");
    const after = await analyst.post(`/api/runs/${res.body.id}/cancel`);
    expect(after.body).toMatchObject({ status: "cancelled", cancelRequested: false });
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "run.cancel-requested", entityId: res.body.id } })).toBe(1);
    expect((await t.ctx.models.Run.findByPk(res.body.id))?.status).toBe("cancelled");
    expect(await t.ctx.models.RunResult.count({ where: { runId: res.body.id } })).toBe(0);
  });

  it("gives the job back when the engine thread dies under it", async () => {
    const res = await analyst.post("/api/runs").send(runBody({ members: 100_000 }));
    const running = step();
    await waitFor(async () => (await t.ctx.models.Run.findByPk(res.body.id))?.status === "running");
    await thread.terminate();
    expect(await running).toBe("requeued");
    const run = (await t.ctx.models.Run.findByPk(res.body.id))!;
    expect(run.status).toBe("queued");
    const job = (await t.ctx.models.Job.findByPk(run.jobId!))!;
    expect(job).toMatchObject({ status: "queued", attempts: 1 });
    expect(job.lastError).toMatch(/exited/);
    thread = new EngineThread("test-worker");
    await queue().requestCancel(job.id);
    await run.update({ status: "cancelled" });
  });

  it("re-queues a job left running by a dead server; it completes with the same result hash", async () => {
    const res = await analyst.post("/api/runs").send(runBody({ seed: "restart" }));
    const claimed = await queue().claimNext("dead-server:worker-0", [RUN_JOB_TYPE]);
    expect(claimed?.payload).toEqual({ runId: res.body.id });
    await t.ctx.models.Run.update({ status: "running", progress: 0.4 }, { where: { id: res.body.id } });

    const pool = await startWorkerPool(t.ctx, queue(), { size: 1, pollMs: 50 });
    try {
      await waitFor(async () => (await t.ctx.models.Run.findByPk(res.body.id))?.status === "succeeded");
    } finally {
      await pool.stop();
    }
    const run = (await t.ctx.models.Run.findByPk(res.body.id))!;
    expect(run.resultHash).toBe(runEnsemble(run.spec).resultHash);
    expect((await t.ctx.models.Job.findByPk(run.jobId!))?.attempts).toBe(2);
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "run.requeued", entityId: run.id } })).toBe(1);
  });

  it("keeps a run exploratory after its version is approved, and refuses runs on a retired version", async () => {
    const a = await asUser("analyst");
    const v = await createModelVersion(t.ctx, a, testModelVersionBody({ name: "Later approved" }));
    const res = await analyst.post("/api/runs").send(runBody({ modelVersionId: v.id }));
    await submitModelVersion(t.ctx, a, v.id, "minor");
    await decideModelVersion(t.ctx, await asUser("manager"), v.id, "approved", "ok");
    expect((await analyst.get(`/api/runs/${res.body.id}`)).body).toMatchObject({ exploratory: true, modelVersion: { status: "approved" } });
    await queue().requestCancel((await t.ctx.models.Run.findByPk(res.body.id))!.jobId!);
    await retireModelVersion(t.ctx, await asUser("manager"), v.id, "superseded");
    const refused = await analyst.post("/api/runs").send(runBody({ modelVersionId: v.id }));
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe("model_version_retired");
  });
});
