import { createHash, randomUUID } from "node:crypto";
import type { ExportRecord, ResultTable } from "@plumeline/contracts";
import { Op } from "sequelize";
import type { AppContext } from "../../context.js";
import type { RequestUser } from "../../middleware/request-context.js";
import { recordAudit } from "../audit/audit.service.js";
import { getRunWithResult } from "../results/results.service.js";
import type { RunModel } from "../runs/run.model.js";
import { tableToCsv } from "./csv-writer.js";
import type { ExportRecordModel } from "./export-record.model.js";
import { resultTable } from "./result-tables.js";
import { buildRunWorkbook, type WorkbookManifest } from "./workbook-builder.js";

type Ctx = Pick<AppContext, "models" | "sequelize">;

export interface ExportFile {
  fileName: string;
  contentType: string;
  bytes: Buffer;
}

function baseName(run: RunModel): string {
  return `plumeline-run-${run.id.slice(0, 8)}${run.exploratory ? "-EXPLORATORY" : ""}`;
}

/** Records the file in the exports table and the audit trail, in one transaction. */
async function recordExport(ctx: Ctx, user: RequestUser, run: RunModel, format: "csv" | "xlsx", table: string, file: ExportFile) {
  const checksum = createHash("sha256").update(file.bytes).digest("hex");
  await ctx.sequelize.transaction(async (transaction) => {
    const row = await ctx.models.ExportRecord.create(
      {
        id: randomUUID(),
        runId: run.id,
        format,
        resultTable: table,
        fileName: file.fileName,
        exploratory: run.exploratory,
        resultHash: run.resultHash ?? "",
        checksum,
        byteSize: file.bytes.length,
        createdBy: user.id,
      },
      { transaction },
    );
    await recordAudit(
      ctx,
      {
        actorId: user.id,
        action: "export.created",
        entityType: "run",
        entityId: run.id,
        summary: `Exported ${file.fileName} (${format.toUpperCase()}${run.exploratory ? ", EXPLORATORY" : ""}) from run "${run.name}".`,
        data: { exportId: row.id, format, table, checksum, resultHash: run.resultHash },
      },
      transaction,
    );
  });
}

export async function exportTableCsv(ctx: Ctx, user: RequestUser, runId: string, table: ResultTable): Promise<ExportFile> {
  const { run, result } = await getRunWithResult(ctx, runId);
  const file: ExportFile = {
    fileName: `${baseName(run)}-${table}.csv`,
    contentType: "text/csv; charset=utf-8",
    bytes: Buffer.from(tableToCsv(resultTable(result, table)), "utf8"),
  };
  await recordExport(ctx, user, run, "csv", table, file);
  return file;
}

export async function exportWorkbook(ctx: Ctx, user: RequestUser, runId: string): Promise<ExportFile> {
  const { run, result } = await getRunWithResult(ctx, runId);
  const version = await ctx.models.ModelVersion.findByPk(run.modelVersionId);
  const pathways = await ctx.models.Pathway.findAll({ where: { id: { [Op.in]: run.pathwayIds } } });
  const statements = await ctx.models.RunStatement.findAll({ where: { runId: run.id }, order: [["createdAt", "ASC"], ["id", "ASC"]] });
  const userIds = [run.createdBy, version?.decidedBy, ...statements.map((s) => s.createdBy)].filter((x): x is string => !!x);
  const users = await ctx.models.User.findAll({ where: { id: { [Op.in]: userIds } }, attributes: ["id", "name", "email"] });
  const who = (id: string | null | undefined) => {
    const u = users.find((x) => x.id === id);
    return u ? `${u.name} <${u.email}>` : null;
  };
  const byId = new Map(pathways.map((p) => [p.id, p]));
  const manifest: WorkbookManifest = {
    runId: run.id,
    runName: run.name,
    exploratory: run.exploratory,
    createdBy: who(run.createdBy) ?? run.createdBy,
    createdAt: run.createdAt.toISOString(),
    finishedAt: run.finishedAt?.toISOString() ?? null,
    modelVersion: {
      id: run.modelVersionId,
      name: version?.name ?? "?",
      versionNumber: version?.versionNumber ?? 0,
      status: version?.status ?? "?",
      changeClass: version?.changeClass ?? null,
      decidedBy: who(version?.decidedBy),
      decidedAt: version?.decidedAt?.toISOString() ?? null,
    },
    pathways: run.pathwayIds.map((id) => {
      const p = byId.get(id);
      return { id, name: p?.name ?? "?", source: p?.source ?? "", vintage: p?.vintage ?? "", startYear: p?.startYear ?? 0, endYear: p?.endYear ?? 0, checksum: p?.checksum ?? "" };
    }),
    seed: run.seed,
    members: run.members,
    sampling: run.sampling,
    baseline: run.spec.baseline,
    percentiles: run.spec.percentiles,
    thresholds: run.spec.thresholds,
    horizons: run.spec.horizons,
    engineVersion: result.engineVersion,
    inputHash: result.inputHash,
    resultHash: result.resultHash,
    exportedBy: `${user.name} <${user.email}>`,
    exportedAt: new Date().toISOString(),
    statements: statements.map((s) => ({ kind: s.kind, text: s.text, by: who(s.createdBy) ?? s.createdBy, at: s.createdAt.toISOString() })),
  };
  const file: ExportFile = {
    fileName: `${baseName(run)}.xlsx`,
    contentType: "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
    bytes: await buildRunWorkbook(manifest, result, run.spec.model),
  };
  await recordExport(ctx, user, run, "xlsx", "workbook", file);
  return file;
}

export async function listExports(ctx: Ctx, user: RequestUser, query: { mine?: "true" | "false"; runId?: string }): Promise<ExportRecord[]> {
  const where: Record<string, unknown> = {};
  if (query.mine === "true") where.createdBy = user.id;
  if (query.runId) where.runId = query.runId;
  const rows: ExportRecordModel[] = await ctx.models.ExportRecord.findAll({ where, order: [["createdAt", "DESC"]], limit: 500 });
  const runs = await ctx.models.Run.findAll({ where: { id: { [Op.in]: [...new Set(rows.map((r) => r.runId))] } }, attributes: ["id", "name"] });
  const users = await ctx.models.User.findAll({ where: { id: { [Op.in]: [...new Set(rows.map((r) => r.createdBy))] } }, attributes: ["id", "name"] });
  const runName = new Map(runs.map((r) => [r.id, r.name]));
  const userName = new Map(users.map((u) => [u.id, u.name]));
  return rows.map((r) => ({
    id: r.id,
    runId: r.runId,
    runName: runName.get(r.runId) ?? null,
    format: r.format,
    table: r.resultTable,
    fileName: r.fileName,
    exploratory: r.exploratory,
    resultHash: r.resultHash,
    checksum: r.checksum,
    byteSize: r.byteSize,
    createdBy: r.createdBy,
    createdByName: userName.get(r.createdBy) ?? null,
    createdAt: r.createdAt.toISOString(),
  }));
}
