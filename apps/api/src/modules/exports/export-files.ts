import { createHash } from "node:crypto";
import { RESULT_TABLES, type ResultTable, type RunResult, type RunSpec } from "@plumeline/contracts";
import { loadJsZip } from "../../lazy-modules.js";
import { buildRunReport } from "../reports/run-report.js";
import { tableToCsv } from "./csv-writer.js";
import { resultTable } from "./result-tables.js";
import { memberSheetOf } from "./member-sheet-source.js";
import { buildRunWorkbook, type WorkbookManifest } from "./workbook-builder.js";

export interface ExportFile {
  fileName: string;
  contentType: string;
  bytes: Buffer;
}

/** What can be exported: one CSV table, every table as a zip with a manifest, the workbook, the report. */
export type ExportKind = { format: "csv"; table: ResultTable } | { format: "zip" } | { format: "xlsx" } | { format: "pdf" };

/** The part of a run an export is built from (all of it stored: nothing depends on the request). */
export interface ExportSource {
  runId: string;
  runName: string;
  exploratory: boolean;
  spec: RunSpec;
  result: RunResult;
}

export const sha256 = (bytes: Buffer) => createHash("sha256").update(bytes).digest("hex");

/** Lower-case letters, digits and single hyphens, at most 40 characters: safe in any file system and header. */
function slug(text: string): string {
  return (
    text
      .normalize("NFKD")
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-+|-+$/g, "")
      .slice(0, 40)
      .replace(/-+$/, "") || "run"
  );
}

/**
 * A file name that says which run, engine version and result it holds, and whether it is
 * exploratory: plumeline-<run name>-<run id 8>-engine-<version>-result-<hash 12>[-EXPLORATORY].
 */
export function exportBaseName(source: Pick<ExportSource, "runId" | "runName" | "exploratory" | "result">): string {
  const r = source.result;
  return `plumeline-${slug(source.runName)}-${source.runId.slice(0, 8)}-engine-${r.engineVersion}-result-${r.resultHash.slice(0, 12)}${source.exploratory ? "-EXPLORATORY" : ""}`;
}

/** Tables a run offers: the peril ones only when the run applied the peril lens. */
export function tablesOf(result: RunResult): ResultTable[] {
  return RESULT_TABLES.filter((t) => result.perils || !(t.startsWith("peril") || t === "portfolio-totals"));
}

/**
 * Every table as a plain CSV in one zip, with manifest.json beside them naming the run, the
 * model version and its approval, engine version, hashes, seed, members and each CSV's
 * SHA-256 — the CSVs themselves stay plain and machine-readable. Entry dates are fixed to
 * the export time so the same export rebuilds to the same bytes.
 */
async function tablesZip(source: ExportSource, manifest: WorkbookManifest, base: string): Promise<Buffer> {
  const zip = new (await loadJsZip())();
  const date = new Date(manifest.exportedAt);
  const files: Array<{ file: string; table: ResultTable; sha256: string }> = [];
  for (const table of tablesOf(source.result)) {
    const bytes = Buffer.from(tableToCsv(resultTable(source.result, table)), "utf8");
    const file = `${base}-${table}.csv`;
    files.push({ file, table, sha256: sha256(bytes) });
    zip.file(file, bytes, { date });
  }
  const body = { ...manifest, tables: files };
  zip.file("manifest.json", JSON.stringify(body, null, 2) + "\n", { date });
  return zip.generateAsync({ type: "nodebuffer", compression: "DEFLATE", platform: "UNIX" });
}

/** Builds the file of an export from the stored run, result and the manifest it states. */
export async function buildExportFile(kind: ExportKind, source: ExportSource, manifest: WorkbookManifest): Promise<ExportFile> {
  const base = exportBaseName(source);
  switch (kind.format) {
    case "csv":
      return {
        fileName: `${base}-${kind.table}.csv`,
        contentType: "text/csv; charset=utf-8",
        bytes: Buffer.from(tableToCsv(resultTable(source.result, kind.table)), "utf8"),
      };
    case "zip":
      return { fileName: `${base}-tables.zip`, contentType: "application/zip", bytes: await tablesZip(source, manifest, base) };
    case "xlsx":
      return {
        fileName: `${base}.xlsx`,
        contentType: "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
        bytes: await buildRunWorkbook(manifest, source.result, source.spec.model, await memberSheetOf(source.runId, source.spec, source.result)),
      };
    case "pdf":
      return { fileName: `${base}-report.pdf`, contentType: "application/pdf", bytes: await buildRunReport(manifest, source.result, source.spec) };
  }
}
