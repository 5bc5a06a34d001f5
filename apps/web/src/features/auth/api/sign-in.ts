import { useMutation, useQueryClient } from "@tanstack/react-query";
import { ACCOUNT_DEACTIVATED_MESSAGE } from "@plumeline/contracts";
import { authClient } from "@/lib/auth-client";
import { ApiError } from "@/lib/api-error";
import { getMeQueryOptions } from "./get-me";

export interface SignInInput {
  email: string;
  password: string;
}

export async function signIn({ email, password }: SignInInput): Promise<void> {
  const { error } = await authClient.signIn.email({ email, password });
  if (error) {
    const status = error.status ?? 401;
    throw new ApiError(
      status,
      error.code ?? "sign_in_failed",
      // better-auth's code for its admin-plugin ban, which Plumeline calls deactivation.
      error.code === "BANNED_USER"
        ? ACCOUNT_DEACTIVATED_MESSAGE
        : status === 401 || status === 400
          ? "Email or password is not right."
          : status === 429
            ? "Too many sign-in attempts. Wait a minute, then try again."
            : (error.message ?? "Sign-in failed"),
    );
  }
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getMeQueryOptions().queryKey }),
  });
}

/** Signs out and forgets every cached answer, so the next user sees nothing of the last. */
export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async () => {
      await authClient.signOut();
    },
    onSettled: () => queryClient.clear(),
  });
}
