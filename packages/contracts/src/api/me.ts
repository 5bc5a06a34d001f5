import { z } from "zod";
import { roleSchema } from "./users.js";

/** GET /api/me — who is signed in and what they may do. */
export const meSchema = z.object({
  user: z.object({ id: z.string(), email: z.string(), name: z.string(), role: roleSchema }),
  permissions: z.array(z.string()),
});
export type Me = z.infer<typeof meSchema>;
