import { z } from "zod";

/** The four Plumeline roles; the permissions each grants are fixed in ./permissions.ts. */
export const roles = ["analyst", "actuary", "manager", "admin"] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

export const userSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  createdAt: z.string(),
  /** Deactivated by an admin: cannot sign in; their runs, versions and audit rows stay theirs. */
  deactivated: z.boolean(),
});
export type User = z.infer<typeof userSchema>;

/** POST /api/users — invite: the server creates the user and mails a one-time link to set a password. */
export const inviteUserBodySchema = z.object({
  email: z.email().max(254),
  name: z.string().trim().min(1).max(120),
  role: roleSchema,
});
export type InviteUserBody = z.infer<typeof inviteUserBodySchema>;

/**
 * PATCH /api/users/:id — change the role. The reason is required and kept in the audit row,
 * so every change of who may do what can be traced to why it was made.
 */
export const updateUserBodySchema = z.object({
  role: roleSchema,
  reason: z.string({ error: "A reason for the role change is required." }).trim().min(3, "Give a reason of at least 3 characters.").max(500),
});
export type UpdateUserBody = z.infer<typeof updateUserBodySchema>;

export const userIdParamsSchema = z.object({ id: z.string().min(1) });

/**
 * What a deactivated person is told when they try to sign in. The API hands it to better-auth
 * (its banned-user message) and the web shows it for the BANNED_USER code, so both say the same.
 */
export const ACCOUNT_DEACTIVATED_MESSAGE = "This account is deactivated; ask an administrator.";
