import { outboxIdParamsSchema } from "@plumeline/contracts";
import type { ValidationSchemas } from "../../middleware/validate.js";

/** What each outbox endpoint accepts: the route validates it, the controller reads it typed. */
export const outboxInputs = {
  show: { params: outboxIdParamsSchema },
} satisfies Record<string, ValidationSchemas>;
