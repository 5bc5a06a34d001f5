import { z } from "zod";
import { roleSchema } from "./users.js";

/** GET /api/me — who is signed in and what they may do. */
export const meSchema = z.object({
  user: z.object({ id: z.string(), email: z.string(), name: z.string(), role: roleSchema }),
  permissions: z.array(z.string()),
  /**
   * True for an invitation not yet accepted. Invitations now mail a link to set a password, so
   * only accounts invited earlier with a mailed one-time password can sign in this way: every other endpoint
   * answers 403 `password_change_required` until they call better-auth's change-password
   * (`POST /api/auth/change-password { currentPassword, newPassword }`).
   */
  mustChangePassword: z.boolean(),
});
export type Me = z.infer<typeof meSchema>;
