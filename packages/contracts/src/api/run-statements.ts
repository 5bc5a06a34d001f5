import { z } from "zod";

/**
 * Reliance and limitation statements an actuary (or analyst) records with a run's results,
 * e.g. "Relies on the firm's 2025 catastrophe-model baseline for AAL" or "Not used for the
 * 1-in-200 capital figure". They are append-only (a correction is a new statement) and are
 * written into the run's workbook (Manifest and Cautions sheets).
 */
export const RUN_STATEMENT_KINDS = ["reliance", "limitation"] as const;
export type RunStatementKind = (typeof RUN_STATEMENT_KINDS)[number];

export const RUN_STATEMENT_MAX_LENGTH = 2000;

export const createRunStatementBodySchema = z
  .object({
    kind: z.enum(RUN_STATEMENT_KINDS, { error: 'must be "reliance" or "limitation"' }),
    text: z
      .string({ error: "write the statement" })
      .trim()
      .min(1, "write the statement")
      .max(RUN_STATEMENT_MAX_LENGTH, `at most ${RUN_STATEMENT_MAX_LENGTH} characters`),
  })
  .strict();
export type CreateRunStatementBody = z.infer<typeof createRunStatementBodySchema>;

export const runStatementSchema = z.object({
  id: z.string(),
  runId: z.string(),
  kind: z.enum(RUN_STATEMENT_KINDS),
  text: z.string(),
  createdBy: z.string(),
  createdByName: z.string().nullable(),
  createdAt: z.string(),
});
export type RunStatement = z.infer<typeof runStatementSchema>;
