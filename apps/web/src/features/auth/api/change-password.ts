import { useMutation, useQueryClient } from "@tanstack/react-query";
import { authClient } from "@/lib/auth-client";
import { ApiError } from "@/lib/api-error";
import { getMeQueryOptions } from "./get-me";

export interface ChangePasswordInput {
  currentPassword: string;
  newPassword: string;
}

/** better-auth's change-password; the API then lifts the one-time-password restriction. */
export async function changePassword(input: ChangePasswordInput): Promise<void> {
  const { error } = await authClient.changePassword({ ...input, revokeOtherSessions: true });
  if (error) {
    const status = error.status ?? 400;
    throw new ApiError(status, error.code ?? "change_password_failed", status === 400 || status === 401 ? (error.message ?? "The current password is not right.") : "The password could not be changed.");
  }
}

export function useChangePassword() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: changePassword, onSuccess: () => queryClient.invalidateQueries({ queryKey: getMeQueryOptions().queryKey }) });
}
