import { z } from "zod";

/**
 * A new password, checked as the API checks it (better-auth's minPasswordLength 10 and
 * maxPasswordLength 128 in apps/api/src/auth/create-auth.ts), so the form says it first.
 */
export const newPasswordSchema = z.string().min(10, "Use at least 10 characters").max(128, "Use at most 128 characters");

export const NEW_PASSWORD_HINT = "At least 10 characters.";
