import {
  copyPerilProfileBodySchema,
  curveRangeSchema,
  listPerilProfilesQuerySchema,
  perilCurvePreviewBodySchema,
  perilProfileBodySchema,
  updatePerilProfileBodySchema,
} from "@plumeline/contracts";
import { idParams } from "../../http/id-params.js";
import type { ValidationSchemas } from "../../middleware/validate.js";

/** What each peril-profile endpoint accepts: the route validates it, the controller reads it typed. */
export const perilProfilesInputs = {
  list: { query: listPerilProfilesQuerySchema },
  byId: { params: idParams },
  create: { body: perilProfileBodySchema },
  preview: { body: perilCurvePreviewBodySchema },
  curve: { params: idParams, query: curveRangeSchema },
  update: { params: idParams, body: updatePerilProfileBodySchema },
  copy: { params: idParams, body: copyPerilProfileBodySchema.optional() },
} satisfies Record<string, ValidationSchemas>;
