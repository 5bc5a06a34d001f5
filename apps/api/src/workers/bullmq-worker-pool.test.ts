import { spawnSync } from "node:child_process";
import os from "node:os";
import { runEnsemble } from "@plumeline/engine";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createModelVersion } from "../modules/model-versions/model-versions.service.js";
import { createPathway } from "../modules/pathways/pathways.service.js";
import { testModelVersionBody, testPathwayBody } from "../modules/runs/runs.fixtures.js";
import { createBullmqTransport } from "../queue/bullmq-transport.js";
import { startRedisTestServer, type RedisTestServer } from "../queue/redis-test-server.js";
import { createSqlJobQueue } from "../queue/sql-job-queue.js";
import { signIn, type SignedInAgent } from "../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../test-support/test-context.js";
import { startBullmqWorkerPool, type BullmqWorkerPool } from "./bullmq-worker-pool.js";
import { EngineThread } from "./engine-thread-client.js";
import { startWorkers } from "./index.js";
import { processNextRunJob, RUN_JOB_TYPE } from "./process-run-job.js";
import { requestUserOf } from "../test-support/request-user.js";

// QUEUE=bullmq against a real Redis (Debian's redis-server on a random port; the test fails,
// never skips, when it is missing) and the real SQLite file, engine threads and API.
let redis: RedisTestServer;
let t: TestContext;
let analyst: SignedInAgent;
let versionId: string;
let pathwayIds: string[];
let queueNumber = 0;
const queue = () => createSqlJobQueue(t.ctx.models.Job);
/** A fresh BullMQ queue name per test, so no test sees another's deliveries. */
const nextQueueName = () => `plumeline-test-${++queueNumber}`;
const runBody = (overrides: Record<string, unknown> = {}) => ({ modelVersionId: versionId, pathwayIds, members: 300, seed: "bullmq-1", sampling: "latin-hypercube", ...overrides });
const runOf = async (id: string) => (await t.ctx.models.Run.findByPk(id))!;
const jobOf = async (runId: string) => (await t.ctx.models.Job.findByPk((await runOf(runId)).jobId!))!;

const waitFor = async (check: () => Promise<boolean>, ms = 20_000) => {
  const end = Date.now() + ms;
  while (Date.now() < end) {
    if (await check()) return;
    await new Promise((r) => setTimeout(r, 25));
  }
  throw new Error("timed out waiting");
};
/** Nothing left in Redis for any worker to take or finish. */
const drained = (pool: BullmqWorkerPool) => async () => {
  const counts = await pool.transport.queue.getJobCounts("wait", "active", "delayed", "prioritized");
  return Object.values(counts).every((n) => n === 0);
};

beforeAll(async () => {
  redis = await startRedisTestServer();
  t = await createTestContext({ QUEUE: "bullmq", REDIS_URL: redis.url });
  analyst = await signIn(t.app, "analyst");
  const a = await requestUserOf(t, "analyst");
  pathwayIds = [(await createPathway(t.ctx, a, testPathwayBody("Ramp 4"))).id, (await createPathway(t.ctx, a, testPathwayBody("Ramp 6", 6))).id];
  versionId = (await createModelVersion(t.ctx, a, testModelVersionBody({ name: "Queue test" }))).id;
});
afterAll(async () => {
  await t?.close();
  await redis?.stop();
});

describe("QUEUE=bullmq", () => {
  it("completes a run queued through the API with the same result hash as the QUEUE=sqlite worker", async () => {
    // The table poller's step (QUEUE=sqlite) on one run ...
    const viaTable = await analyst.post("/api/runs").send(runBody({ name: "via table" }));
    const thread = new EngineThread("sqlite-worker");
    try {
      expect(await processNextRunJob(t.ctx, queue(), "sqlite-worker", thread)).toBe("succeeded");
    } finally {
      await thread.terminate();
    }
    // ... and the server's worker start-up as config selects it (QUEUE=bullmq) on the same inputs.
    expect(t.ctx.config.queue).toBe("bullmq");
    const pool = (await startWorkers(t.ctx)) as BullmqWorkerPool;
    try {
      expect(pool.transport).toBeDefined(); // the BullMQ pool, not the table poller
      const viaRedis = await analyst.post("/api/runs").send(runBody({ name: "via redis" }));
      expect(viaRedis.status).toBe(201);
      // The delivery counts once the worker is done with it (after the owner's mail).
      await waitFor(async () => pool.deliveries.succeeded === 1);
      const [a, b] = [await runOf(viaTable.body.id), await runOf(viaRedis.body.id)];
      expect(b.resultHash).toBe(a.resultHash);
      // Reproducibility rule of the engine contract (packages/engine/README.md: same spec, engine version and Node major → same hash): the same spec straight through the engine.
      expect(b.resultHash).toBe(runEnsemble(b.spec).resultHash);
      const job = await jobOf(b.id);
      expect(job).toMatchObject({ status: "succeeded", attempts: 1 });
      expect(job.dispatchedAt).toBeInstanceOf(Date);
      expect(job.lockedBy).toBeNull();
      expect(b.status).toBe("succeeded");
      expect(await t.ctx.models.RunResult.count({ where: { runId: b.id } })).toBe(1);
    } finally {
      await pool.stop();
    }
  });

  it("never lets two workers (two pools, as two machines) process one job, even when Redis delivers it twice", async () => {
    const queueName = nextQueueName();
    const ids: string[] = [];
    for (let i = 0; i < 6; i++) ids.push((await analyst.post("/api/runs").send(runBody({ seed: `twice-${i}` }))).body.id);
    // Publish every row, then publish it again as if the process had died between publishing
    // and marking the row dispatched: 12 deliveries for 6 jobs.
    const publisher = createBullmqTransport(t.ctx.models.Job, { redisUrl: redis.url, queueName });
    try {
      expect(await publisher.publishPending()).toBe(6);
      await t.ctx.models.Job.update({ dispatchedAt: null }, { where: { status: "queued" } });
      expect(await publisher.publishPending()).toBe(6);
      expect(await publisher.queue.getWaitingCount()).toBe(12);
    } finally {
      await publisher.close();
    }
    const pools = await Promise.all(
      ["machine-a", "machine-b"].map((name) => startBullmqWorkerPool(t.ctx, queue(), { size: 1, redisUrl: redis.url, queueName, workerPrefix: name })),
    );
    try {
      await waitFor(async () => (await Promise.all(ids.map(runOf))).every((r) => r.status === "succeeded"));
      await waitFor(drained(pools[0]!));
    } finally {
      await Promise.all(pools.map((p) => p.stop()));
    }
    const total = (key: "succeeded" | "skipped") => pools.reduce((sum, p) => sum + p.deliveries[key], 0);
    expect(total("succeeded")).toBe(6);
    expect(total("skipped")).toBe(6); // every second delivery met the guarded claim and changed nothing
    for (const id of ids) {
      const job = await jobOf(id);
      expect(job.attempts).toBe(1);
      expect(job.status).toBe("succeeded");
      expect(await t.ctx.models.AuditEvent.count({ where: { action: "run.succeeded", entityId: id } })).toBe(1);
      expect(await t.ctx.models.RunResult.count({ where: { runId: id } })).toBe(1);
    }
  });

  it("cancels a run while it is queued in Redis; its delivery is skipped and nothing runs", async () => {
    const queueName = nextQueueName();
    const res = await analyst.post("/api/runs").send(runBody({ seed: "cancel-queued" }));
    const publisher = createBullmqTransport(t.ctx.models.Job, { redisUrl: redis.url, queueName });
    try {
      expect(await publisher.publishPending()).toBe(1);
    } finally {
      await publisher.close();
    }
    const cancel = await analyst.post(`/api/runs/${res.body.id}/cancel`);
    expect(cancel.status).toBe(200);
    expect(cancel.body.status).toBe("cancelled");

    const pool = await startBullmqWorkerPool(t.ctx, queue(), { size: 1, redisUrl: redis.url, queueName });
    try {
      await waitFor(async () => pool.deliveries.skipped === 1);
      await waitFor(drained(pool));
    } finally {
      await pool.stop();
    }
    expect(pool.deliveries.succeeded).toBe(0);
    expect((await runOf(res.body.id)).status).toBe("cancelled");
    expect(await jobOf(res.body.id)).toMatchObject({ status: "cancelled", attempts: 0 });
    expect(await t.ctx.models.RunResult.count({ where: { runId: res.body.id } })).toBe(0);
  });

  it("recovers on start: publishes rows a crash left undispatched, re-queues jobs of dead processes, leaves live ones alone", async () => {
    const queueName = nextQueueName();
    // Committed but never published (the process died right after the transaction).
    const unpublished = await analyst.post("/api/runs").send(runBody({ seed: "unpublished" }));
    // Held by a process on this host that no longer exists.
    const deadPid = spawnSync(process.execPath, ["-e", ""]).pid;
    const deadHere = await analyst.post("/api/runs").send(runBody({ seed: "dead-here" }));
    expect((await queue().claim((await jobOf(deadHere.body.id)).id, `${os.hostname()}:${deadPid}:worker-0`))?.payload).toEqual({ runId: deadHere.body.id });
    await t.ctx.models.Run.update({ status: "running", progress: 0.3 }, { where: { id: deadHere.body.id } });
    // Held on another machine that stopped beating its heartbeat 10 minutes ago.
    const silent = await analyst.post("/api/runs").send(runBody({ seed: "silent-machine" }));
    await queue().claim((await jobOf(silent.body.id)).id, "other-host:41:worker-0");
    await t.ctx.models.Job.update({ heartbeatAt: new Date(Date.now() - 600_000) }, { where: { id: (await jobOf(silent.body.id)).id } });
    // Held on another machine that is alive (fresh heartbeat): must not be taken from it.
    const alive = await analyst.post("/api/runs").send(runBody({ seed: "alive-machine" }));
    await queue().claim((await jobOf(alive.body.id)).id, "other-host:42:worker-0");
    // All four rows are waiting for a publish that never happened: Redis holds none of them.
    expect(await t.ctx.models.Job.count({ where: { dispatchedAt: null, type: RUN_JOB_TYPE } })).toBeGreaterThanOrEqual(4);

    const pool = await startBullmqWorkerPool(t.ctx, queue(), { size: 1, redisUrl: redis.url, queueName, staleAfterMs: 60_000 });
    try {
      const recovered = [unpublished, deadHere, silent].map((r) => r.body.id as string);
      await waitFor(async () => (await Promise.all(recovered.map(runOf))).every((r) => r.status === "succeeded"));
      await waitFor(drained(pool));
    } finally {
      await pool.stop();
    }
    expect((await jobOf(unpublished.body.id)).attempts).toBe(1);
    expect((await jobOf(deadHere.body.id)).attempts).toBe(2);
    expect((await jobOf(silent.body.id)).attempts).toBe(2);
    for (const r of [deadHere, silent]) expect(await t.ctx.models.AuditEvent.count({ where: { action: "run.requeued", entityId: r.body.id } })).toBe(1);
    const run = await runOf(deadHere.body.id);
    expect(run.resultHash).toBe(runEnsemble(run.spec).resultHash);
    expect(await jobOf(alive.body.id)).toMatchObject({ status: "running", lockedBy: "other-host:42:worker-0", attempts: 1 });
  });
});
