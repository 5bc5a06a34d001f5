import { randomUUID } from "node:crypto";
import { MEMBER_TABLE, type EXPORT_SORT_KEYS, type ExportRecord, type ListExportsQuery, type Page, type ResultTable } from "@plumeline/contracts";
import { Op, type WhereOptions } from "sequelize";
import type { Literal } from "sequelize/lib/utils";
import { createdBetween } from "../../db/paging/date-range.js";
import { findPage, type SortColumns } from "../../db/paging/find-page.js";
import { anyContains, idNamed, personMatches } from "../../db/paging/like-pattern.js";
import type { AppContext } from "../../context.js";
import { conflict, notFound } from "../../errors/app-error.js";
import type { RequestUser } from "../../middleware/request-context.js";
import { recordAudit } from "../audit/audit.service.js";
import { getRunWithResult } from "../results/results.service.js";
import type { RunModel } from "../runs/run.model.js";
import type { RunResult } from "@plumeline/contracts";
import { buildExportFile, exportBaseName, sha256, type ExportFile, type ExportKind, type ExportSource } from "./export-files.js";
import { MEMBER_CSV_CHUNK_MEMBERS, openMemberTable, type OpenMemberTable } from "./member-table-client.js";
import type { ExportRecordModel } from "./export-record.model.js";
import { gatherRunManifest } from "./run-manifest.js";
import type { WorkbookManifest } from "./workbook-builder.js";

export type { ExportFile } from "./export-files.js";

type Ctx = Pick<AppContext, "models" | "sequelize">;

function sourceOf(run: RunModel, result: RunResult): ExportSource {
  return { runId: run.id, runName: run.name, exploratory: run.exploratory, spec: run.spec, result };
}

const tableName = (kind: ExportKind) => (kind.format === "csv" ? kind.table : kind.format === "xlsx" ? "workbook" : kind.format === "pdf" ? "report" : "tables");

/** What the register keeps of a file handed out: its name, SHA-256 (hex) and size. */
interface ExportedBytes {
  fileName: string;
  checksum: string;
  byteSize: number;
}

const describeBytes = (file: ExportFile): ExportedBytes => ({ fileName: file.fileName, checksum: sha256(file.bytes), byteSize: file.bytes.length });

/** Records the file in the exports table (with the manifest it was built from) and the audit trail, in one transaction. */
async function recordExport(ctx: Ctx, user: RequestUser, run: RunModel, kind: ExportKind, file: ExportedBytes, manifest: WorkbookManifest) {
  const { checksum } = file;
  const table = tableName(kind);
  await ctx.sequelize.transaction(async (transaction) => {
    const row = await ctx.models.ExportRecord.create(
      {
        id: randomUUID(),
        runId: run.id,
        format: kind.format,
        resultTable: table,
        fileName: file.fileName,
        exploratory: run.exploratory,
        resultHash: run.resultHash ?? "",
        checksum,
        byteSize: file.byteSize,
        createdBy: user.id,
        manifest,
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
        summary: `Exported ${file.fileName} (${kind.format.toUpperCase()}${run.exploratory ? ", EXPLORATORY" : ""}) from run "${run.name}".`,
        data: { exportId: row.id, format: kind.format, table, checksum, resultHash: run.resultHash },
      },
      transaction,
    );
  });
}

/** Builds a new export of a run for the user, records it, and returns the file. */
async function exportRun(ctx: Ctx, user: RequestUser, runId: string, kind: ExportKind): Promise<ExportFile> {
  const { run, result } = await getRunWithResult(ctx, runId);
  const now = new Date();
  const manifest = await gatherRunManifest(ctx, run, result, user, now);
  const file = await buildExportFile(kind, sourceOf(run, result), manifest);
  await recordExport(ctx, user, run, kind, describeBytes(file), manifest);
  return file;
}

export const exportTableCsv = (ctx: Ctx, user: RequestUser, runId: string, table: ResultTable) => exportRun(ctx, user, runId, { format: "csv", table });
export const exportTablesZip = (ctx: Ctx, user: RequestUser, runId: string) => exportRun(ctx, user, runId, { format: "zip" });
export const exportWorkbook = (ctx: Ctx, user: RequestUser, runId: string) => exportRun(ctx, user, runId, { format: "xlsx" });
export const exportReport = (ctx: Ctx, user: RequestUser, runId: string) => exportRun(ctx, user, runId, { format: "pdf" });

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
 * the engine version or result hash does not come back) and hands it out as CSV, chunk by chunk.
 */
export async function openMemberTableCsv(ctx: Ctx, user: RequestUser, runId: string): Promise<MemberTableDownload> {
  const { run, result } = await getRunWithResult(ctx, runId);
  const table = await openMemberTable({
    spec: run.spec,
    expected: { engineVersion: result.engineVersion, resultHash: result.resultHash },
    columnsUpTo: 0,
    chunkMembers: MEMBER_CSV_CHUNK_MEMBERS,
  });
  const fileName = `${exportBaseName(sourceOf(run, result))}-${MEMBER_TABLE}.csv`;
  return {
    fileName,
    contentType: "text/csv; charset=utf-8",
    table,
    record: async (checksum, byteSize) =>
      recordExport(ctx, user, run, { format: "csv", table: MEMBER_TABLE as ResultTable }, { fileName, checksum, byteSize }, await gatherRunManifest(ctx, run, result, user, new Date())),
  };
}

function kindOf(record: ExportRecordModel): ExportKind {
  if (record.format === "csv") return { format: "csv", table: record.resultTable as ResultTable };
  return { format: record.format };
}

/**
 * A past export, rebuilt from the stored result and the manifest it was first built with, and
 * handed out only if its SHA-256 equals the recorded checksum. Anything else — the run's
 * result changed, an export recorded before manifests were kept, a builder that now writes
 * different bytes — is a 409 that says so; a different file is never handed out in its place.
 * Each download again is written to the audit trail.
 */
export async function downloadExportAgain(ctx: Ctx, user: RequestUser, exportId: string): Promise<ExportFile> {
  const record = await ctx.models.ExportRecord.findByPk(exportId);
  if (!record) throw notFound("Export", exportId);
  if (record.format === "csv" && record.resultTable === MEMBER_TABLE)
    throw conflict(
      `Export ${record.fileName} is a member table: it is recomputed from the stored spec on each request and checked against the run's result hash. Export it again (GET /api/runs/${record.runId}/tables/${MEMBER_TABLE}.csv) for the same rows.`,
      "export_not_rebuildable",
    );
  const { run, result } = await getRunWithResult(ctx, record.runId);
  if (result.resultHash !== record.resultHash)
    throw conflict(
      `Export ${record.fileName} was made from result ${record.resultHash.slice(0, 12)}…, but run "${run.name}" now holds result ${result.resultHash.slice(0, 12)}…; it cannot be rebuilt.`,
      "export_result_changed",
    );
  if (!record.manifest && record.format !== "csv")
    throw conflict(`Export ${record.fileName} was recorded before Plumeline kept the manifest of each export, so it cannot be rebuilt byte for byte.`, "export_not_rebuildable");
  const manifest = record.manifest ?? (await gatherRunManifest(ctx, run, result, user, record.createdAt));
  const file = await buildExportFile(kindOf(record), { runId: run.id, runName: run.name, exploratory: run.exploratory, spec: run.spec, result }, manifest);
  const checksum = sha256(file.bytes);
  if (checksum !== record.checksum)
    throw conflict(
      `Rebuilt ${record.fileName} has SHA-256 ${checksum.slice(0, 12)}…, not the recorded ${record.checksum.slice(0, 12)}…; the file is not handed out. Export the run again for a new file.`,
      "export_checksum_mismatch",
    );
  await recordAudit(ctx, {
    actorId: user.id,
    action: "export.downloaded-again",
    entityType: "run",
    entityId: run.id,
    summary: `Downloaded ${record.fileName} again (checksum verified) from run "${run.name}".`,
    data: { exportId: record.id, checksum },
  });
  return { ...file, fileName: record.fileName };
}

const EXPORT_SORT_COLUMNS: SortColumns<(typeof EXPORT_SORT_KEYS)[number]> = {
  createdAt: ["createdAt"],
  fileName: ["fileName"],
  format: ["format"],
  byteSize: ["byteSize"],
};

/**
 * One page of the export register: `q` in the file name, the table or the run's name;
 * `author` in the exporter's name or email; mine, run, format, created from/to.
 */
export async function listExports(ctx: Ctx, user: RequestUser, query: ListExportsQuery): Promise<Page<ExportRecord>> {
  const conditions: Array<WhereOptions | Literal> = [...createdBetween(query)];
  if (query.mine === "true") conditions.push({ createdBy: user.id });
  if (query.runId) conditions.push({ runId: query.runId });
  if (query.format) conditions.push({ format: query.format });
  if (query.author) conditions.push(personMatches(ctx.sequelize, "created_by", query.author));
  // The run's name is searched too ("the workbook of the coastal run"), through a sub-select.
  if (query.q) conditions.push(anyContains(ctx.sequelize, ["file_name", "table_name"], query.q, [idNamed(ctx.sequelize, "run_id", "runs", ["name"], query.q)]));
  const { rows, total } = await findPage(ctx.models.ExportRecord, { conditions, page: query, sortColumns: EXPORT_SORT_COLUMNS });
  return { items: await presentExports(ctx, rows), total };
}

async function presentExports(ctx: Ctx, rows: ExportRecordModel[]): Promise<ExportRecord[]> {
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
