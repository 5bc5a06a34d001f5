import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { createTestContext, type TestContext } from "../test-support/test-context.js";
import { createSqlJobQueue } from "./sql-job-queue.js";
import type { JobQueue } from "./job-queue.js";

let t: TestContext;
let queue: JobQueue;
beforeAll(async () => {
  t = await createTestContext();
  queue = createSqlJobQueue(t.ctx.models.Job);
});
afterAll(async () => t.close());
beforeEach(async () => {
  await t.ctx.models.Job.destroy({ where: {} });
});

const enqueueMany = async (count: number, maxAttempts = 3) => {
  const ids: string[] = [];
  for (let i = 0; i < count; i++) ids.push(await t.ctx.sequelize.transaction((tx) => queue.enqueue("test-job", { i }, tx, { maxAttempts })));
  return ids;
};

describe("SQL job queue", () => {
  it("never lets two workers claim the same job", async () => {
    const ids = await enqueueMany(40);
    // Four workers race, interleaving their candidate reads and guarded updates on one database.
    const claimedBy = new Map<string, string[]>();
    await Promise.all(
      ["w1", "w2", "w3", "w4"].map(async (worker) => {
        for (;;) {
          const job = await queue.claimNext(worker, ["test-job"]);
          if (!job) return;
          claimedBy.set(job.id, [...(claimedBy.get(job.id) ?? []), worker]);
        }
      }),
    );
    expect([...claimedBy.keys()].sort()).toEqual([...ids].sort());
    for (const owners of claimedBy.values()) expect(owners).toHaveLength(1);
    const rows = await t.ctx.models.Job.findAll();
    expect(rows.every((r) => r.status === "running" && r.attempts === 1 && r.lockedBy === claimedBy.get(r.id)![0])).toBe(true);
  });

  it("claims the oldest job first and only jobs of the asked types", async () => {
    const [first, second] = await enqueueMany(2);
    await t.ctx.sequelize.transaction((tx) => queue.enqueue("other-type", {}, tx));
    expect((await queue.claimNext("w", ["test-job"]))?.id).toBe(first);
    expect((await queue.claimNext("w", ["test-job"]))?.id).toBe(second);
    expect(await queue.claimNext("w", ["test-job"])).toBeNull();
  });

  it("re-queues jobs left running, and fails them once out of attempts", async () => {
    const [a, b] = await enqueueMany(2, 1);
    const [c] = await enqueueMany(1, 3);
    for (const w of ["dead-1", "dead-2", "dead-3"]) await queue.claimNext(w, ["test-job"]);
    const out = await queue.requeueAbandoned();
    const byId = new Map(out.map((o) => [o.id, o.status]));
    expect(byId.get(a!)).toBe("failed"); // 1 attempt allowed, 1 used
    expect(byId.get(b!)).toBe("failed");
    expect(byId.get(c!)).toBe("queued");
    const row = await t.ctx.models.Job.findByPk(c);
    expect(row?.lastError).toContain("stopped while running");
    expect((await queue.claimNext("w-new", ["test-job"]))?.attempts).toBe(2);
  });

  it("guards every write by the owner: a stale worker cannot finish a job someone else holds", async () => {
    const [id] = await enqueueMany(1);
    await queue.claimNext("old", ["test-job"]);
    await queue.requeueAbandoned();
    await queue.claimNext("new", ["test-job"]);
    expect(await t.ctx.sequelize.transaction((tx) => queue.finish(id!, "old", "succeeded", tx))).toBe(false);
    expect((await queue.heartbeat(id!, "old", 0.5)).stillOwned).toBe(false);
    expect(await t.ctx.sequelize.transaction((tx) => queue.finish(id!, "new", "succeeded", tx))).toBe(true);
    expect((await t.ctx.models.Job.findByPk(id))?.status).toBe("succeeded");
  });

  it("cancels a queued job at once and flags a running one for its worker", async () => {
    const [queued, running] = await enqueueMany(2);
    await t.ctx.models.Job.update({ createdAt: new Date(0) }, { where: { id: running! } });
    await queue.claimNext("w", ["test-job"]);
    expect(await queue.requestCancel(queued!)).toBe("cancelled");
    expect(await queue.requestCancel(running!)).toBe("requested");
    expect((await queue.heartbeat(running!, "w", 0.3)).cancelRequested).toBe(true);
    expect(await queue.release(running!, "w", "thread stopped")).toBe("cancelled");
  });
});
