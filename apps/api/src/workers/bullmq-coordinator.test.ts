import { runEnsemble } from "@plumeline/engine";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createModelVersion } from "../modules/model-versions/model-versions.service.js";
import { createPathway } from "../modules/pathways/pathways.service.js";
import { testModelVersionBody, testPathwayBody } from "../modules/runs/runs.fixtures.js";
import { startRedisTestServer, type RedisTestServer } from "../queue/redis-test-server.js";
import { createSqlJobQueue } from "../queue/sql-job-queue.js";
import { requestUserOf } from "../test-support/request-user.js";
import { signIn, type SignedInAgent } from "../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../test-support/test-context.js";
import { startBullmqCoordinator, type BullmqCoordinator } from "./bullmq-coordinator.js";
import { REPLAY_JOB_TYPE, RUN_JOB_TYPE } from "../queue/job-types.js";
import { replayJobKind } from "./process-replay-job.js";
import { startRemoteEngineWorker, type RemoteEngineWorker } from "./remote-engine-worker.js";
import { runJobKind } from "./run-job-kind.js";

// QUEUE=bullmq against a real Redis (Debian's redis-server on a random port; the test fails,
// never skips, when it is missing), the real SQLite file, API and engine threads. The
// coordinator runs with WORKERS=0; engine workers are started beside it as separate objects
// with their own Redis connections, as `pnpm worker` would (scale-out.test.ts does it with
// real processes).
let redis: RedisTestServer;
let t: TestContext;
let analyst: SignedInAgent;
let versionId: string;
let pathwayIds: string[];
let queueNumber = 0;
const queue = () => createSqlJobQueue(t.ctx.models.Job);
const runBody = (overrides: Record<string, unknown> = {}) => ({ modelVersionId: versionId, pathwayIds, members: 300, seed: "bullmq-1", sampling: "latin-hypercube", ...overrides });
const runOf = async (id: string) => (await t.ctx.models.Run.findByPk(id))!;
const jobOf = async (runId: string) => (await t.ctx.models.Job.findByPk((await runOf(runId)).jobId!))!;
const waitFor = async (check: () => Promise<boolean>, ms = 60_000) => {
  const end = Date.now() + ms;
  while (Date.now() < end) {
    if (await check()) return;
    await new Promise((r) => setTimeout(r, 25));
  }
  throw new Error("timed out waiting");
};
/** A coordinator (the API's side, WORKERS=0) on a fresh BullMQ queue, so no test sees another's jobs. */
async function coordinator(queueName = `plumeline-test-${++queueNumber}`): Promise<BullmqCoordinator> {
  return startBullmqCoordinator(t.ctx, queue(), {
    redisUrl: redis.url,
    queueName,
    workers: 0,
    kinds: { [RUN_JOB_TYPE]: runJobKind(t.ctx, queue()), [REPLAY_JOB_TYPE]: replayJobKind(t.ctx, queue()) },
    reconcileMs: 500,
    progressWriteMs: 20,
  });
}
const worker = (c: BullmqCoordinator, name = "worker-1"): RemoteEngineWorker =>
  startRemoteEngineWorker({ redisUrl: redis.url, queueName: c.transport.queueName, concurrency: 1, name, progressEveryMs: 20 });

beforeAll(async () => {
  redis = await startRedisTestServer();
  t = await createTestContext({ QUEUE: "bullmq", REDIS_URL: redis.url, WORKERS: "0" });
  analyst = await signIn(t.app, "analyst");
  const a = await requestUserOf(t, "analyst");
  pathwayIds = [(await createPathway(t.ctx, a, testPathwayBody("Ramp 4"))).id, (await createPathway(t.ctx, a, testPathwayBody("Ramp 6", 6))).id];
  versionId = (await createModelVersion(t.ctx, a, testModelVersionBody({ name: "Queue test" }))).id;
});
afterAll(async () => {
  await t?.close();
  await redis?.stop();
});

describe("QUEUE=bullmq with stateless workers", { timeout: 180_000 }, () => {
  it("config: WORKERS=0 starts no engine worker in the API process", async () => {
    expect(t.ctx.config.workers).toBe(0);
    const c = await coordinator();
    try {
      expect(c.localWorker).toBeNull();
    } finally {
      await c.stop();
    }
  });

  it("runs a job on a worker and stores the returned result once, with the engine's own hash", async () => {
    const c = await coordinator();
    const w = worker(c);
    const seen: number[] = [];
    try {
      const res = await analyst.post("/api/runs").send(runBody({ members: 30_000, seed: "via-worker" }));
      expect(res.status).toBe(201);
      await waitFor(async () => {
        const run = await runOf(res.body.id);
        if (run.status === "running") seen.push(run.progress);
        return run.status === "succeeded";
      });
      const run = await runOf(res.body.id);
      expect(run.resultHash).toBe(runEnsemble(run.spec).resultHash);
      expect(seen.some((p) => p > 0 && p < 1)).toBe(true); // progress came back through BullMQ
      expect(await jobOf(run.id)).toMatchObject({ status: "succeeded", attempts: 1, lockedBy: null });
      expect(await t.ctx.models.RunResult.count({ where: { runId: run.id } })).toBe(1);
      expect(await t.ctx.models.AuditEvent.count({ where: { action: "run.succeeded", entityId: run.id } })).toBe(1);
      const result = await analyst.get(`/api/runs/${run.id}/result`);
      expect(result.body.resultHash).toBe(run.resultHash);
      // Recorded, so Redis need not keep it.
      await waitFor(async () => (await c.transport.getJob(run.jobId!)) === undefined);
    } finally {
      await w.close();
      await c.stop();
    }
  });

  it("runs a replay through the same workers and reports its progress and verdict", async () => {
    const c = await coordinator();
    const w = worker(c);
    try {
      const res = await analyst.post("/api/runs").send(runBody({ seed: "to-replay" }));
      await waitFor(async () => (await runOf(res.body.id)).status === "succeeded");
      const replay = await analyst.post(`/api/runs/${res.body.id}/replay`);
      expect(replay.status).toBe(202);
      await waitFor(async () => (await analyst.get(`/api/runs/${res.body.id}/replays/${replay.body.id}`)).body.status === "succeeded");
      const done = await analyst.get(`/api/runs/${res.body.id}/replays/${replay.body.id}`);
      expect(done.body).toMatchObject({ matched: true, progress: 1, replayHash: (await runOf(res.body.id)).resultHash });
    } finally {
      await w.close();
      await c.stop();
    }
  });

  it("records a result once when two API processes both hear that it completed", async () => {
    const name = `plumeline-test-${++queueNumber}`;
    const [first, second] = [await coordinator(name), await coordinator(name)];
    const w = worker(first);
    try {
      const ids: string[] = [];
      for (let i = 0; i < 3; i++) ids.push((await analyst.post("/api/runs").send(runBody({ seed: `twice-${i}` }))).body.id);
      await waitFor(async () => (await Promise.all(ids.map(runOf))).every((r) => r.status === "succeeded"));
      for (const id of ids) {
        expect(await t.ctx.models.RunResult.count({ where: { runId: id } })).toBe(1);
        expect(await t.ctx.models.AuditEvent.count({ where: { action: "run.succeeded", entityId: id } })).toBe(1);
        expect((await jobOf(id)).attempts).toBe(1);
      }
    } finally {
      await w.close();
      await Promise.all([first.stop(), second.stop()]);
    }
  });

  it("cancels a queued job: it leaves Redis and no worker runs it", async () => {
    const c = await coordinator();
    try {
      const res = await analyst.post("/api/runs").send(runBody({ seed: "cancel-queued" }));
      const jobId = (await runOf(res.body.id)).jobId!;
      await waitFor(async () => (await c.transport.getJob(jobId)) !== undefined);
      const cancel = await analyst.post(`/api/runs/${res.body.id}/cancel`);
      expect(cancel.body.status).toBe("cancelled");
      await waitFor(async () => (await c.transport.getJob(jobId)) === undefined);
      const w = worker(c);
      await new Promise((r) => setTimeout(r, 1000));
      await w.close();
      expect(await runOf(res.body.id)).toMatchObject({ status: "cancelled" });
      expect(await jobOf(res.body.id)).toMatchObject({ status: "cancelled", attempts: 0 });
      expect(await t.ctx.models.RunResult.count({ where: { runId: res.body.id } })).toBe(0);
    } finally {
      await c.stop();
    }
  });

  it("cancels a running job through Redis; the run shows 'cancelling' until the worker confirms", async () => {
    const c = await coordinator();
    const w = worker(c);
    try {
      const res = await analyst.post("/api/runs").send(runBody({ members: 200_000, seed: "cancel-running" }));
      await waitFor(async () => (await runOf(res.body.id)).status === "running");
      const cancel = await analyst.post(`/api/runs/${res.body.id}/cancel`);
      expect(cancel.body).toMatchObject({ status: "running", cancelRequested: true });
      await waitFor(async () => (await runOf(res.body.id)).status === "cancelled");
      expect(await jobOf(res.body.id)).toMatchObject({ status: "cancelled" });
      expect(await t.ctx.models.RunResult.count({ where: { runId: res.body.id } })).toBe(0);
      expect(await t.ctx.models.AuditEvent.count({ where: { action: "run.cancelled", entityId: res.body.id } })).toBe(1);
    } finally {
      await w.close();
      await c.stop();
    }
  });

  it("fails a run the engine refuses at once, with the engine's reason and no retry", async () => {
    // A spec the contract let through but the engine refuses (as after an engine change),
    // changed before any coordinator publishes it.
    const res = await analyst.post("/api/runs").send(runBody({ seed: "refused" }));
    const run = await runOf(res.body.id);
    await run.update({ spec: { ...run.spec, members: -5 } });
    const c = await coordinator();
    const w = worker(c);
    try {
      await waitFor(async () => (await runOf(res.body.id)).status === "failed");
    } finally {
      await w.close();
      await c.stop();
    }
    const failed = await runOf(res.body.id);
    expect(failed.error).toMatch(/members/);
    expect(await jobOf(res.body.id)).toMatchObject({ status: "failed", attempts: 1 });
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "run.failed", entityId: res.body.id } })).toBe(1);
  });

  it("publishes rows a crash left undispatched when it starts", async () => {
    // Committed while no coordinator ran (the API died right after the transaction).
    const res = await analyst.post("/api/runs").send(runBody({ seed: "unpublished" }));
    expect((await jobOf(res.body.id)).dispatchedAt).toBeNull();
    const c = await coordinator();
    const w = worker(c);
    try {
      await waitFor(async () => (await runOf(res.body.id)).status === "succeeded");
      expect((await jobOf(res.body.id)).dispatchedAt).toBeInstanceOf(Date);
    } finally {
      await w.close();
      await c.stop();
    }
  });
});
