import { useMutation, useQueryClient } from "@tanstack/react-query";
import { userSchema, type User } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { getUsersQueryOptions } from "./get-users";

/** Deactivated users cannot sign in and lose their open sessions; their work stays theirs. */
export const deactivateUser = (id: string) => api.post<User>(`/api/users/${encodeURIComponent(id)}/deactivate`, undefined, { schema: userSchema });
export const reactivateUser = (id: string) => api.post<User>(`/api/users/${encodeURIComponent(id)}/reactivate`, undefined, { schema: userSchema });

/** One mutation for both directions, so the table can tell which row is saving. */
export function useSetUserStatus() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, deactivated }: { id: string; deactivated: boolean }) => (deactivated ? deactivateUser(id) : reactivateUser(id)),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getUsersQueryOptions().queryKey }),
  });
}
