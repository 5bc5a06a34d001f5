import { inviteUserBodySchema, updateUserBodySchema, userIdParamsSchema } from "@plumeline/contracts";
import type { ValidationSchemas } from "../../middleware/validate.js";

/** What each user-management endpoint accepts: the route validates it, the controller reads it typed. */
export const usersInputs = {
  invite: { body: inviteUserBodySchema },
  update: { params: userIdParamsSchema, body: updateUserBodySchema },
  byId: { params: userIdParamsSchema },
} satisfies Record<string, ValidationSchemas>;
