import { useMutation } from "@tanstack/react-query";
import { authClient } from "@/lib/auth-client";
import { ApiError } from "@/lib/api-error";
import { authCall } from "./auth-call";

export interface ResetPasswordInput {
  token: string;
  newPassword: string;
}

/** Sets the new password with the mailed one-time token (better-auth's reset-password). */
export async function resetPassword(input: ResetPasswordInput): Promise<void> {
  const { error } = await authCall(() => authClient.resetPassword(input));
  if (error) {
    const status = error.status ?? 500;
    const code = error.code ?? "reset_failed";
    throw new ApiError(
      status,
      code,
      code === "INVALID_TOKEN"
        ? "This reset link has been used or has expired. Ask for a new one."
        : status === 400
          ? (error.message ?? "The password was not accepted.")
          : "The password could not be set. Try again in a moment.",
    );
  }
}

export const useResetPassword = () => useMutation({ mutationFn: resetPassword });
