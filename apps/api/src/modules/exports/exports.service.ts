import { createHash, randomUUID } from "node:crypto";
import { MEMBER_SHEET_MAX_MEMBERS, MEMBER_TABLE, type ExportRecord, type ResultTable } from "@plumeline/contracts";
import { Op } from "sequelize";
import type { AppContext } from "../../context.js";
import type { RequestUser } from "../../middleware/request-context.js";
import { recordAudit } from "../audit/audit.service.js";
import { getRunWithResult } from "../results/results.service.js";
import type { RunModel } from "../runs/run.model.js";
import { tableToCsv } from "./csv-writer.js";
import type { ExportRecordModel } from "./export-record.model.js";
import { resultTable } from "./result-tables.js";
import { AppError } from "../../errors/app-error.js";
import { openMemberTable, type OpenMemberTable } from "./member-table-client.js";
import type { MemberSheet } from "./member-sheet.js";
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

/** What the register keeps of a file handed out: its name, SHA-256 (hex) and size. */
interface ExportedBytes {
  fileName: string;
  checksum: string;
  byteSize: number;
}

const describeBytes = (file: ExportFile): ExportedBytes => ({
  fileName: file.fileName,
  checksum: createHash("sha256").update(file.bytes).digest("hex"),
  byteSize: file.bytes.length,
});

/** Records the file in the exports table and the audit trail, in one transaction. */
async function recordExport(ctx: Ctx, user: RequestUser, run: RunModel, format: "csv" | "xlsx", table: string, file: ExportedBytes) {
  const { checksum } = file;
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
        byteSize: file.byteSize,
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
  await recordExport(ctx, user, run, "csv", table, describeBytes(file));
  return file;
}

/** Members per CSV chunk (about 2 MB at 20 columns): the file streams out at the client's pace. */
const CSV_CHUNK_MEMBERS = 5_000;

/** A member-table CSV being produced: the caller writes the chunks, then records the export. */
export interface MemberTableDownload {
  fileName: string;
  contentType: string;
  table: OpenMemberTable;
  /** Records the export (register + audit) once every byte went out. */
  record(checksum: string, byteSize: number): Promise<void>;
}

/**
 * Recomputes the run's member table from its stored spec (in a thread; refused with 409 when
 * the engine version or result hash does not come back) and hands it out as CSV.
 */
export async function openMemberTableCsv(ctx: Ctx, user: RequestUser, runId: string): Promise<MemberTableDownload> {
  const { run, result } = await getRunWithResult(ctx, runId);
  const table = await openMemberTable({
    spec: run.spec,
    expected: { engineVersion: result.engineVersion, resultHash: result.resultHash },
    columnsUpTo: 0,
    chunkMembers: CSV_CHUNK_MEMBERS,
  });
  const fileName = `${baseName(run)}-${MEMBER_TABLE}.csv`;
  return {
    fileName,
    contentType: "text/csv; charset=utf-8",
    table,
    record: (checksum, byteSize) => recordExport(ctx, user, run, "csv", MEMBER_TABLE, { fileName, checksum, byteSize }),
  };
}

/**
 * The workbook's Members sheet: the table when the run has at most MEMBER_SHEET_MAX_MEMBERS
 * members and recomputes to its stored hash; otherwise why it was left out and where it is.
 */
async function memberSheetOf(run: RunModel, result: { engineVersion: string; resultHash: string }): Promise<MemberSheet> {
  const csv = `the CSV export (GET /api/runs/${run.id}/tables/${MEMBER_TABLE}.csv, also on the run's Export panel)`;
  if (run.members > MEMBER_SHEET_MAX_MEMBERS)
    return {
      kind: "omitted",
      reason: `This run has ${run.members.toLocaleString("en-GB")} members, more than the ${MEMBER_SHEET_MAX_MEMBERS.toLocaleString("en-GB")} this workbook holds on a sheet: the member table is in ${csv}.`,
    };
  let table: OpenMemberTable | null = null;
  try {
    table = await openMemberTable({ spec: run.spec, expected: result, columnsUpTo: MEMBER_SHEET_MAX_MEMBERS, chunkMembers: CSV_CHUNK_MEMBERS });
    return { kind: "table", columns: table.columns, values: table.values! };
  } catch (error) {
    if (error instanceof AppError) return { kind: "omitted", reason: `No member table: ${error.message}` };
    throw error;
  } finally {
    await table?.close();
  }
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
    bytes: await buildRunWorkbook(manifest, result, run.spec.model, await memberSheetOf(run, result)),
  };
  await recordExport(ctx, user, run, "xlsx", "workbook", describeBytes(file));
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
