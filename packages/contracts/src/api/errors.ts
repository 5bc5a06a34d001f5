import { z } from "zod";
import { formatPath } from "../engine/format-issues.js";

/** One problem with one field of a request: `{ path: "members", message: "must be ≥ 1" }`. */
export const errorDetailSchema = z.object({
  path: z.string(),
  message: z.string(),
  /** Machine-readable facts behind the message, when a client may act on them (e.g. which materiality threshold fired). */
  data: z.record(z.string(), z.union([z.string(), z.number(), z.null()])).optional(),
});
export type ErrorDetail = z.infer<typeof errorDetailSchema>;

/** The one error shape every API failure uses (docs/API.md). */
export const apiErrorSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    details: z.array(errorDetailSchema).optional(),
  }),
});
export type ApiError = z.infer<typeof apiErrorSchema>;

/**
 * The one mapping from a failed zod parse to error details: one detail per issue, its path
 * written as users write it (`pathways[1].agents.co2.ppm`) after `prefix`, or `fallback` when the
 * issue concerns the whole value (empty path).
 *
 * Example: issueDetails(error, { prefix: "spec." }) → [{ path: "spec.members", message: "must be at least 1" }].
 */
export function issueDetails(error: z.ZodError, options: { prefix?: string; fallback?: string } = {}): ErrorDetail[] {
  return error.issues.map((issue) => {
    const path = formatPath(issue.path);
    return { path: path ? `${options.prefix ?? ""}${path}` : (options.fallback ?? ""), message: issue.message };
  });
}
