import { createPathwayBodySchema, listPathwaysQuerySchema, updatePathwayBodySchema, uploadPathwayFieldsSchema } from "@plumeline/contracts";
import { idParams } from "../../http/id-params.js";
import type { ValidationSchemas } from "../../middleware/validate.js";

/** What each pathway endpoint accepts: the route validates it, the controller reads it typed. */
export const pathwaysInputs = {
  list: { query: listPathwaysQuerySchema },
  byId: { params: idParams },
  create: { body: createPathwayBodySchema },
  update: { params: idParams, body: updatePathwayBodySchema },
  // The form fields beside the file; a request with no fields at all reads as an empty form.
  upload: { body: uploadPathwayFieldsSchema.prefault({}) },
} satisfies Record<string, ValidationSchemas>;
