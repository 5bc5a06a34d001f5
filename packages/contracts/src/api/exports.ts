import { z } from "zod";
import { authorAndDateFilters, pagedQuerySchema, pageSchema, type ListQueryInput } from "./paging.js";

/** Tables a run result can be exported as, one CSV each (docs/API.md). */
export const RESULT_TABLES = [
  "temperature",
  "forcing",
  "imbalance",
  "horizons",
  "exceedance",
  "crossing",
  "sensitivity",
  // peril lens (present when the run carried peril profiles; header only otherwise)
  "peril-multipliers",
  "peril-return-periods",
  "peril-losses",
  "portfolio-totals",
] as const;
export type ResultTable = (typeof RESULT_TABLES)[number];

/**
 * The member-level table of a run, for a validator to recompute any number: one row per member
 * (member, each uncertain input by name, weight, then <pathwayId>@<year> warming in K), as CSV at
 * GET /api/runs/:id/tables/members.csv, recomputed from the stored spec and checked against the
 * stored engine version and result hash before it is served.
 */
export const MEMBER_TABLE = "members";

/**
 * The workbook carries the member table on its own sheet up to this many members; above it,
 * the sheet says it was left out and points to the CSV (no size limit). Why this size: the
 * spreadsheet library builds a sheet in memory, about 70 µs per cell on the shared 2-core machine under load
 * (25,000 members × 20 columns took 34 s and 490 MB; 100,000 took 138 s and 1.5 GB).
 */
export const MEMBER_SHEET_MAX_MEMBERS = 10_000;

export const EXPORT_FORMATS = ["csv", "xlsx", "pdf", "zip"] as const;

export const EXPORT_SORT_KEYS = ["createdAt", "fileName", "format", "byteSize"] as const;
/** GET /api/exports: `q` searches the file name, table and the run's name; `author` who exported it. */
export const listExportsQuerySchema = pagedQuerySchema(EXPORT_SORT_KEYS, "createdAt:desc").extend({
  mine: z.enum(["true", "false"], { error: 'must be "true" or "false"' }).optional(),
  runId: z.string().min(1).optional(),
  format: z.enum(EXPORT_FORMATS, { error: `must be one of ${EXPORT_FORMATS.join(", ")}` }).optional(),
  ...authorAndDateFilters,
});
export type ListExportsQuery = z.infer<typeof listExportsQuerySchema>;
export type ListExportsQueryInput = ListQueryInput<typeof listExportsQuerySchema>;

export const exportRecordSchema = z.object({
  id: z.string(),
  runId: z.string(),
  runName: z.string().nullable(),
  format: z.enum(EXPORT_FORMATS),
  /** Table name for a CSV, "workbook" for an XLSX, "report" for the PDF, "tables" for the zip of every CSV. */
  table: z.string(),
  fileName: z.string(),
  exploratory: z.boolean(),
  resultHash: z.string(),
  /** SHA-256 (hex) of the bytes handed out. */
  checksum: z.string(),
  byteSize: z.number().int(),
  createdBy: z.string(),
  createdByName: z.string().nullable(),
  createdAt: z.string(),
});
export type ExportRecord = z.infer<typeof exportRecordSchema>;
export const exportPageSchema = pageSchema(exportRecordSchema);
export type ExportPage = z.infer<typeof exportPageSchema>;

/**
 * Limitations shown beside results on screens and in every export (README "Cautions" says the
 * same in prose).
 */
export const RESULT_CAUTIONS = [
  "Global mean only: a two-layer energy balance model says nothing by itself about regional climate, extremes or sea level.",
  "Not a catastrophe model: multipliers adjust the firm's own view of risk; they do not replace it.",
  "Scenarios are not forecasts: percentiles describe physical-climate uncertainty given a pathway, not the chance of the pathway.",
  "Per-degree factors apply to warming beyond what the firm's baseline view of risk already contains.",
  "Scaling differs by region, peril and return period; rarer events can change by more in frequency.",
  "Missing: tipping points, compound perils, adaptation, exposure growth.",
  "Inputs can be revised or withdrawn upstream: cite the vintage of every pathway and assumption.",
  "Results support and do not replace licensed actuarial judgement, local regulation and the firm's model-risk policy.",
  "Exploratory results (made with a model version that was not approved) are not for filings.",
] as const;
