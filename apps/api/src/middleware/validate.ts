import type { RequestHandler } from "express";
import type { ErrorDetail } from "@plumeline/contracts";
import { issueDetails } from "@plumeline/contracts";
import type { z } from "zod";
import { badRequest } from "../errors/app-error.js";

export interface ValidationSchemas {
  body?: z.ZodType;
  query?: z.ZodType;
  params?: z.ZodType;
}

/**
 * Parses body, query and params with contracts schemas. All problems from all three are
 * collected, so one 400 lists every bad field. Parsed (coerced, defaulted) values replace
 * the raw ones, so controllers read `req.body` / `req.query` / `req.params` as typed data.
 */
export function validate(schemas: ValidationSchemas): RequestHandler {
  return (req, _res, next) => {
    const details: ErrorDetail[] = [];
    const parsed: Partial<Record<keyof ValidationSchemas, unknown>> = {};
    for (const part of ["params", "query", "body"] as const) {
      const schema = schemas[part];
      if (!schema) continue;
      const result = schema.safeParse(req[part] ?? (part === "body" ? undefined : {}));
      if (result.success) parsed[part] = result.data;
      else details.push(...issueDetails(result.error, { fallback: part }));
    }
    if (details.length > 0) throw badRequest(details);
    if ("body" in parsed) req.body = parsed.body;
    // Express 5 exposes query (and params) through getters; shadow them with the parsed values.
    if ("query" in parsed) Object.defineProperty(req, "query", { value: parsed.query, writable: true, configurable: true, enumerable: true });
    if ("params" in parsed) Object.defineProperty(req, "params", { value: parsed.params, writable: true, configurable: true, enumerable: true });
    next();
  };
}
