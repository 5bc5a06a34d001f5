import { updateMaterialityBodySchema } from "@plumeline/contracts";
import type { ValidationSchemas } from "../../middleware/validate.js";

/** What each settings endpoint accepts: the route validates it, the controller reads it typed. */
export const settingsInputs = {
  updateMateriality: { body: updateMaterialityBodySchema },
} satisfies Record<string, ValidationSchemas>;
