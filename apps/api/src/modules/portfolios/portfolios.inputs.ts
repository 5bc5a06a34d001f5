import { uploadPortfolioFieldsSchema } from "@plumeline/contracts";
import { idParams } from "../../http/id-params.js";
import type { ValidationSchemas } from "../../middleware/validate.js";

/** What each portfolio endpoint accepts: the route validates it, the controller reads it typed. */
export const portfoliosInputs = {
  byId: { params: idParams },
  // The form fields beside the file; a request with no fields at all reads as an empty form.
  upload: { body: uploadPortfolioFieldsSchema.prefault({}) },
} satisfies Record<string, ValidationSchemas>;
