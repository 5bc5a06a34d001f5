import { runJobPayloadSchema } from "@plumeline/contracts";
import { Op } from "sequelize";
import { recordAudit } from "../modules/audit/audit.service.js";
import type { JobQueue } from "../queue/job-queue.js";
import type { JobModel } from "../queue/job.model.js";
import { BULLMQ_HOLDER, type EngineJobKindHandler } from "./engine-job-kind.js";
import { recordRunOutcome } from "./process-run-job.js";
import { OutcomeDiscarded, type WorkerContext } from "./worker-step.js";

/** Ensemble runs through BullMQ: the run row mirrors its job (engine-job-kind.ts). */
export function runJobKind(ctx: WorkerContext, queue: JobQueue): EngineJobKindHandler {
  const runIdOf = (row: JobModel) => runJobPayloadSchema.parse(row.payload).runId;
  return {
    kind: "run",
    async specOf(row) {
      const run = await ctx.models.Run.findByPk(runIdOf(row), { attributes: ["id", "spec"] });
      if (!run) throw new Error(`run ${runIdOf(row)} no longer exists`);
      return run.spec;
    },
    async started(row) {
      await ctx.models.Run.update(
        { status: "running", startedAt: new Date(), progress: 0, error: null },
        { where: { id: runIdOf(row), status: { [Op.in]: ["queued", "running"] } } },
      );
    },
    async progressed(row, fraction) {
      await ctx.models.Run.update({ progress: fraction }, { where: { id: runIdOf(row), status: "running" } });
    },
    async requeued(row, reason) {
      const run = await ctx.models.Run.findByPk(runIdOf(row));
      if (!run) return;
      await run.update({ status: "queued", progress: 0 });
      await recordAudit(ctx, {
        actorId: null,
        action: "run.requeued",
        entityType: "run",
        entityId: run.id,
        summary: `Run "${run.name}" went back to the queue: ${reason}.`,
        data: { jobId: row.id, attempt: row.attempts, reason },
      });
    },
    async finished(row, outcome, compressed) {
      const run = await ctx.models.Run.findByPk(runIdOf(row));
      if (!run) throw new OutcomeDiscarded(`run ${runIdOf(row)} no longer exists`);
      await recordRunOutcome(ctx, queue, { id: row.id, lockedBy: BULLMQ_HOLDER, attempts: row.attempts }, run, outcome, compressed);
    },
  };
}
