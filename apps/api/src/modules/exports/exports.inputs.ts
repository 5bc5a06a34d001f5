import { listExportsQuerySchema, RESULT_TABLES } from "@plumeline/contracts";
import { z } from "zod";
import { idParams } from "../../http/id-params.js";
import type { ValidationSchemas } from "../../middleware/validate.js";

/** What each export endpoint accepts: the route validates it, the controller reads it typed. */
export const exportsInputs = {
  byRun: { params: idParams },
  table: {
    params: idParams.extend({ table: z.enum(RESULT_TABLES, { error: `must be one of ${RESULT_TABLES.join(", ")}` }) }),
  },
  list: { query: listExportsQuerySchema },
  again: { params: z.object({ exportId: z.string().min(1) }) },
} satisfies Record<string, ValidationSchemas>;
