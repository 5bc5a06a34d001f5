import type { ZodError } from "zod";

/**
 * The first message for each top-level field of a form that failed its schema: forms show
 * one message under each field, the first problem found.
 *
 * Example: a sign-in schema failing on an empty password → { password: "Enter your password" }.
 */
export function fieldErrors<Name extends string>(error: ZodError): Partial<Record<Name, string>> {
  const out: Partial<Record<Name, string>> = {};
  for (const issue of error.issues) out[String(issue.path[0]) as Name] ??= issue.message;
  return out;
}
