import { createRunStatementBodySchema } from "@plumeline/contracts";
import { idParams } from "../../http/id-params.js";
import type { ValidationSchemas } from "../../middleware/validate.js";

/** What each run-statement endpoint accepts: the route validates it, the controller reads it typed. */
export const runStatementsInputs = {
  list: { params: idParams },
  create: { params: idParams, body: createRunStatementBodySchema },
} satisfies Record<string, ValidationSchemas>;
