import { auditQuerySchema } from "@plumeline/contracts";
import type { ValidationSchemas } from "../../middleware/validate.js";

/** What each audit endpoint accepts: the route validates it, the controller reads it typed. */
export const auditInputs = {
  list: { query: auditQuerySchema },
} satisfies Record<string, ValidationSchemas>;
