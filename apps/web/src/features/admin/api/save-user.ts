import { useMutation, useQueryClient } from "@tanstack/react-query";
import { userSchema, type InviteUserBody, type Role, type User } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { getUsersQueryOptions } from "./get-users";

export const inviteUser = (body: InviteUserBody) => api.post<User>("/api/users", body, { schema: userSchema });
export const changeUserRole = ({ id, role, reason }: { id: string; role: Role; reason: string }) =>
  api.patch<User>(`/api/users/${encodeURIComponent(id)}`, { role, reason }, { schema: userSchema });

export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: inviteUser, onSuccess: () => queryClient.invalidateQueries({ queryKey: getUsersQueryOptions().queryKey }) });
}

export function useChangeUserRole() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: changeUserRole, onSuccess: () => queryClient.invalidateQueries({ queryKey: getUsersQueryOptions().queryKey }) });
}
