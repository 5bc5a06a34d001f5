import { z } from "zod";

/** Tables a run result can be exported as, one CSV each (docs/API.md). */
export const RESULT_TABLES = [
  "temperature",
  "forcing",
  "imbalance",
  "horizons",
  "exceedance",
  "crossing",
  "sensitivity",
] as const;
export type ResultTable = (typeof RESULT_TABLES)[number];

export const EXPORT_FORMATS = ["csv", "xlsx"] as const;

export const listExportsQuerySchema = z.object({
  mine: z.enum(["true", "false"], { error: 'must be "true" or "false"' }).optional(),
  runId: z.string().min(1).optional(),
});

export const exportRecordSchema = z.object({
  id: z.string(),
  runId: z.string(),
  runName: z.string().nullable(),
  format: z.enum(EXPORT_FORMATS),
  /** Table name for a CSV, "workbook" for an XLSX. */
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
