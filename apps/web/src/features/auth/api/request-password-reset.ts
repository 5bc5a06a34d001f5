import { useMutation } from "@tanstack/react-query";
import { authClient } from "@/lib/auth-client";
import { ApiError } from "@/lib/api-error";
import { authCall } from "./auth-call";

/**
 * Asks better-auth to mail a one-time reset link. The server answers alike for known and
 * unknown addresses, so success says nothing about whether the account exists.
 */
export async function requestPasswordReset(email: string): Promise<void> {
  const { error } = await authCall(() => authClient.requestPasswordReset({ email }));
  if (error) {
    const status = error.status ?? 500;
    throw new ApiError(
      status,
      error.code ?? "reset_request_failed",
      status === 429 ? "Too many requests. Wait a minute, then try again." : "The request could not be sent. Try again in a moment.",
    );
  }
}

export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset });
