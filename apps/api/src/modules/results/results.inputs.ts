import { idParams } from "../../http/id-params.js";
import type { ValidationSchemas } from "../../middleware/validate.js";

/** What each result endpoint accepts: the route validates it, the controller reads it typed. */
export const resultsInputs = {
  byRun: { params: idParams },
} satisfies Record<string, ValidationSchemas>;
