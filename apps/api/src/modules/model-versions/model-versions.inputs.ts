import {
  createModelVersionBodySchema,
  decideModelVersionBodySchema,
  diffModelVersionQuerySchema,
  listModelVersionsQuerySchema,
  modelVersionImpactBodySchema,
  retireModelVersionBodySchema,
  submitModelVersionBodySchema,
  updateModelVersionBodySchema,
} from "@plumeline/contracts";
import { idParams } from "../../http/id-params.js";
import type { ValidationSchemas } from "../../middleware/validate.js";

/** What each model-version endpoint accepts: the route validates it, the controller reads it typed. */
export const modelVersionsInputs = {
  list: { query: listModelVersionsQuerySchema },
  byId: { params: idParams },
  diff: { params: idParams, query: diffModelVersionQuerySchema },
  impact: { params: idParams, body: modelVersionImpactBodySchema },
  create: { body: createModelVersionBodySchema },
  update: { params: idParams, body: updateModelVersionBodySchema },
  submit: { params: idParams, body: submitModelVersionBodySchema },
  decide: { params: idParams, body: decideModelVersionBodySchema },
  retire: { params: idParams, body: retireModelVersionBodySchema },
} satisfies Record<string, ValidationSchemas>;
