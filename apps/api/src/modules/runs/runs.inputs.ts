import { createRunBodySchema, listRunsQuerySchema } from "@plumeline/contracts";
import { z } from "zod";
import { idParams } from "../../http/id-params.js";
import type { ValidationSchemas } from "../../middleware/validate.js";

/** What each run endpoint accepts: the route validates it, the controller reads it typed. */
export const runsInputs = {
  list: { query: listRunsQuerySchema },
  create: { body: createRunBodySchema },
  byId: { params: idParams },
  replayOne: { params: idParams.extend({ replayId: z.string().min(1) }) },
} satisfies Record<string, ValidationSchemas>;
