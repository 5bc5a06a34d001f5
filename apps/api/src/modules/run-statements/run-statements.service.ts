import { randomUUID } from "node:crypto";
import type { CreateRunStatementBody, RunStatement } from "@plumeline/contracts";
import { Op } from "sequelize";
import type { AppContext } from "../../context.js";
import { conflict, notFound } from "../../errors/app-error.js";
import type { RequestUser } from "../../middleware/request-context.js";
import { recordAudit } from "../audit/audit.service.js";
import type { RunStatementModel } from "./run-statement.model.js";

type Ctx = Pick<AppContext, "models" | "sequelize">;

async function present(ctx: Pick<Ctx, "models">, rows: RunStatementModel[]): Promise<RunStatement[]> {
  const users = await ctx.models.User.findAll({ where: { id: { [Op.in]: [...new Set(rows.map((r) => r.createdBy))] } }, attributes: ["id", "name"] });
  const nameOf = new Map(users.map((u) => [u.id, u.name]));
  return rows.map((r) => ({
    id: r.id,
    runId: r.runId,
    kind: r.kind,
    text: r.text,
    createdBy: r.createdBy,
    createdByName: nameOf.get(r.createdBy) ?? null,
    createdAt: r.createdAt.toISOString(),
  }));
}

/** The run's statements, oldest first (the order they were recorded in). */
export async function listRunStatements(ctx: Pick<Ctx, "models">, runId: string): Promise<RunStatement[]> {
  if (!(await ctx.models.Run.findByPk(runId, { attributes: ["id"] }))) throw notFound("run", runId);
  const rows = await ctx.models.RunStatement.findAll({ where: { runId }, order: [["createdAt", "ASC"], ["id", "ASC"]] });
  return present(ctx, rows);
}

/**
 * Records a statement with a finished run's results, and its audit row, in one transaction.
 * There is no edit or delete: what was relied on when a workbook went out stays on record.
 */
export async function recordRunStatement(ctx: Ctx, user: RequestUser, runId: string, body: CreateRunStatementBody): Promise<RunStatement> {
  const run = await ctx.models.Run.findByPk(runId, { attributes: ["id", "name", "status"] });
  if (!run) throw notFound("run", runId);
  if (run.status !== "succeeded") throw conflict(`Statements go with results: run "${run.name}" is ${run.status}.`, "run_not_finished");
  const row = await ctx.sequelize.transaction(async (transaction) => {
    const created = await ctx.models.RunStatement.create({ id: randomUUID(), runId, kind: body.kind, text: body.text, createdBy: user.id }, { transaction });
    await recordAudit(
      ctx,
      {
        actorId: user.id,
        action: "run.statement-recorded",
        entityType: "run",
        entityId: runId,
        summary: `Recorded a ${body.kind} statement with run "${run.name}".`,
        data: { statementId: created.id, kind: body.kind, text: body.text },
      },
      transaction,
    );
    return created;
  });
  return (await present(ctx, [row]))[0]!;
}
