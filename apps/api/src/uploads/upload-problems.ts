import { issueDetails, type ErrorDetail } from "@plumeline/contracts";
import type { z } from "zod";
import { badRequest } from "../errors/app-error.js";

/** What a file reader gives back: what it read, or every problem it found. */
export type ReadOutcome<Read> = ({ ok: true } & Read) | { ok: false; errors: readonly ErrorDetail[] };

/**
 * The one check every upload ends with: a preview needs only a readable file; a save needs its
 * form fields too (`fields`, parsed with `schema`). Problems in the file and in the fields come
 * back together in ONE 400, so a person fixes everything in one go, and nothing is saved.
 * Returns what the file held and the checked fields (null for a preview).
 *
 * Example: a portfolio file with a bad cell and an empty name → one 400 naming both.
 */
export function checkUpload<Read, Fields>(
  outcome: ReadOutcome<Read>,
  preview: boolean,
  schema: z.ZodType<Fields>,
  fields: Record<string, string | undefined>,
): { read: Read; fields: Fields | null } {
  const errors: ErrorDetail[] = outcome.ok ? [] : [...outcome.errors];
  let checked: Fields | null = null;
  if (!preview) {
    // A field left out reads as left empty, so the schema names it ("must not be empty").
    const parsed = schema.safeParse(Object.fromEntries(Object.entries(fields).map(([k, v]) => [k, v ?? ""])));
    if (parsed.success) checked = parsed.data;
    else errors.push(...issueDetails(parsed.error));
  }
  if (!outcome.ok || errors.length > 0)
    throw badRequest(errors, `The upload has ${errors.length} problem${errors.length === 1 ? "" : "s"}; nothing was saved.`);
  return { read: outcome, fields: checked };
}
