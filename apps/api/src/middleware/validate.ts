import type { RequestHandler, Response } from "express";
import type { ErrorDetail } from "@plumeline/contracts";
import { issueDetails } from "@plumeline/contracts";
import type { z } from "zod";
import { badRequest } from "../errors/app-error.js";

type RequestPart = "params" | "query" | "body";

/** The zod schemas one route checks its request against, by part. */
export type ValidationSchemas = Partial<Record<RequestPart, z.ZodType>>;

/** What those schemas let through: each part's parsed (coerced, defaulted) output type. */
export type ValidInput<S extends ValidationSchemas> = { [K in keyof S]: S[K] extends z.ZodType ? z.output<S[K]> : never };

/** Kept in `res.locals.valid` for the controller; `schemas` proves which check produced `values`. */
interface CheckedInput {
  schemas: ValidationSchemas;
  values: Partial<Record<RequestPart, unknown>>;
}

/**
 * Parses body, query and params with contracts schemas. All problems from all three are
 * collected, so one 400 lists every bad field. The parsed values go to `res.locals.valid`
 * (the raw request is left as it came); a controller reads them, typed, with `validated`.
 */
export function validate(schemas: ValidationSchemas): RequestHandler {
  return (req, res, next) => {
    const details: ErrorDetail[] = [];
    const values: CheckedInput["values"] = {};
    for (const part of ["params", "query", "body"] as const) {
      const schema = schemas[part];
      if (!schema) continue;
      const result = schema.safeParse(req[part] ?? (part === "body" ? undefined : {}));
      if (result.success) values[part] = result.data;
      else details.push(...issueDetails(result.error, { fallback: part }));
    }
    if (details.length > 0) throw badRequest(details);
    const checked: CheckedInput = { schemas, values };
    res.locals.valid = checked;
    next();
  };
}

/**
 * The request's checked input, typed from the same schemas object the route gave `validate`.
 * The types come from the schemas, so controllers need no casts; the identity check makes a
 * route that forgot `validate` (or passed other schemas) fail loudly instead of handing the
 * controller unchecked data under a checked type.
 *
 * Example: `const { params, body } = validated(res, runInputs.create);`
 */
export function validated<S extends ValidationSchemas>(res: Response, schemas: S): ValidInput<S> {
  const checked = res.locals.valid as CheckedInput | undefined;
  if (checked?.schemas !== schemas)
    throw new Error("validated(): this route has no validate() with the same schemas before its controller");
  // Safe: `validate` parsed every part named in `schemas` with exactly these schemas.
  return checked.values as ValidInput<S>;
}
