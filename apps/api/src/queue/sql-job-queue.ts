import { randomUUID } from "node:crypto";
import { Op } from "sequelize";
import type { JobModel } from "./job.model.js";
import type { ClaimedJob, JobQueue } from "./job-queue.js";

const DEFAULT_MAX_ATTEMPTS = 3;

/**
 * The durable queue as a table. Claims are a guarded update: the row
 * changes from 'queued' to 'running' only if it is still 'queued', so of two workers racing
 * for one row exactly one sees "1 row updated"; the other moves on to the next candidate.
 * Every later write is guarded by `locked_by`, so a worker whose job was re-queued under it
 * cannot overwrite the new owner's state.
 */
export function createSqlJobQueue(Job: typeof JobModel): JobQueue {
  const queue: JobQueue = {
    async enqueue(type, payload, transaction, options = {}) {
      const id = randomUUID();
      await Job.create(
        { id, type, payload, status: "queued", maxAttempts: options.maxAttempts ?? DEFAULT_MAX_ATTEMPTS },
        { transaction },
      );
      return id;
    },

    async claimNext(workerId, types) {
      // A few candidates, oldest first; losing a race on one just tries the next.
      for (;;) {
        const candidates = await Job.findAll({
          where: { status: "queued", type: { [Op.in]: [...types] } },
          order: [["createdAt", "ASC"], ["id", "ASC"]],
          limit: 5,
          attributes: ["id"],
        });
        if (candidates.length === 0) return null;
        for (const { id } of candidates) {
          const claimed = await queue.claim(id, workerId);
          if (claimed) return claimed;
        }
      }
    },

    async claim(jobId, workerId) {
      const now = new Date();
      const [claimed] = await Job.update(
        {
          status: "running",
          lockedBy: workerId,
          lockedAt: now,
          heartbeatAt: now,
          startedAt: now,
          attempts: Job.sequelize!.literal("attempts + 1"),
        },
        { where: { id: jobId, status: "queued" } },
      );
      if (claimed !== 1) return null;
      const row = await Job.findByPk(jobId);
      if (!row || row.lockedBy !== workerId) return null;
      return { id: jobId, type: row.type, payload: row.payload, attempts: row.attempts, maxAttempts: row.maxAttempts, lockedBy: workerId } satisfies ClaimedJob;
    },

    async heartbeat(jobId, workerId, progress) {
      const [updated] = await Job.update(
        { progress, heartbeatAt: new Date() },
        { where: { id: jobId, lockedBy: workerId, status: "running" } },
      );
      const row = await Job.findByPk(jobId, { attributes: ["cancelRequested", "status", "lockedBy"] });
      return { cancelRequested: Boolean(row?.cancelRequested), stillOwned: updated === 1 };
    },

    async finish(jobId, workerId, status, transaction, error) {
      const [updated] = await Job.update(
        { status, finishedAt: new Date(), lockedBy: null, lastError: error ?? null, ...(status === "succeeded" ? { progress: 1 } : {}) },
        { where: { id: jobId, lockedBy: workerId, status: "running" }, transaction },
      );
      return updated === 1;
    },

    async release(jobId, workerId, reason, options = {}) {
      const row = await Job.findByPk(jobId);
      if (!row || row.lockedBy !== workerId || row.status !== "running") return null;
      // A shutdown is not the job's fault: it gets its attempt back.
      const attempts = options.refundAttempt ? Math.max(0, row.attempts - 1) : row.attempts;
      const status = row.cancelRequested ? "cancelled" : attempts >= row.maxAttempts ? "failed" : "queued";
      const [updated] = await Job.update(
        {
          status,
          attempts,
          lockedBy: null,
          lockedAt: null,
          lastError: reason,
          finishedAt: status === "queued" ? null : new Date(),
          // Queued again: QUEUE=bullmq must publish it again (its earlier delivery is used up).
          dispatchedAt: null,
        },
        { where: { id: jobId, lockedBy: workerId, status: "running" } },
      );
      if (updated !== 1) return null;
      return status;
    },

    async requestCancel(jobId, transaction) {
      const opts = transaction ? { transaction } : {};
      const [cancelledQueued] = await Job.update(
        { status: "cancelled", cancelRequested: true, finishedAt: new Date() },
        { where: { id: jobId, status: "queued" }, ...opts },
      );
      if (cancelledQueued === 1) return "cancelled";
      // Guarded on the flag too, so of two cancels racing exactly one sees "requested".
      const [flagged] = await Job.update({ cancelRequested: true }, { where: { id: jobId, status: "running", cancelRequested: false }, ...opts });
      if (flagged === 1) return "requested";
      const row = await Job.findByPk(jobId, { attributes: ["status", "cancelRequested"], ...opts });
      return row && (row.status === "cancelled" || (row.status === "running" && row.cancelRequested)) ? "already" : "finished";
    },

    async requeueAbandoned(filter) {
      const running = await Job.findAll({ where: { status: "running" } });
      const rows = filter
        ? running.filter(
            (row) =>
              (filter.heartbeatBefore && (row.heartbeatAt ?? row.lockedAt ?? new Date(0)) < filter.heartbeatBefore) ||
              (filter.lockedByDeadProcess && row.lockedBy && filter.lockedByDeadProcess(row.lockedBy)),
          )
        : running;
      const out: Array<{ id: string; status: "queued" | "failed" }> = [];
      for (const row of rows) {
        const status = row.attempts >= row.maxAttempts ? "failed" : "queued";
        const [updated] = await Job.update(
          {
            status,
            lockedBy: null,
            lockedAt: null,
            lastError: `worker ${row.lockedBy ?? "?"} stopped while running the job (attempt ${row.attempts} of ${row.maxAttempts})`,
            finishedAt: status === "failed" ? new Date() : null,
            dispatchedAt: null,
          },
          { where: { id: row.id, status: "running", lockedBy: row.lockedBy } },
        );
        if (updated === 1) out.push({ id: row.id, status });
      }
      return out;
    },
  };
  return queue;
}
