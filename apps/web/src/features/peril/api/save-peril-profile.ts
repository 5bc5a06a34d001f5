import { useMutation, useQueryClient } from "@tanstack/react-query";
import { perilProfileRecordSchema, type PerilProfileBody, type PerilProfileRecord } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { perilRootKey } from "./get-peril-profiles";

export const createPerilProfile = (body: PerilProfileBody) =>
  api.post<PerilProfileRecord>("/api/peril-profiles", body, { schema: perilProfileRecordSchema });

export const updatePerilProfile = ({ id, body }: { id: string; body: Partial<PerilProfileBody> }) =>
  api.patch<PerilProfileRecord>(`/api/peril-profiles/${encodeURIComponent(id)}`, body, { schema: perilProfileRecordSchema });

export const copyPerilProfile = ({ id, name }: { id: string; name?: string }) =>
  api.post<PerilProfileRecord>(`/api/peril-profiles/${encodeURIComponent(id)}/copy`, name ? { name } : {}, { schema: perilProfileRecordSchema });

export const deletePerilProfile = (id: string) => api.delete<null>(`/api/peril-profiles/${encodeURIComponent(id)}`);

/** Every change invalidates the whole peril cache: lists, the profile and its curve. */
function usePerilMutation<I, O>(fn: (input: I) => Promise<O>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => queryClient.invalidateQueries({ queryKey: perilRootKey }) });
}

export const useCreatePerilProfile = () => usePerilMutation(createPerilProfile);
export const useUpdatePerilProfile = () => usePerilMutation(updatePerilProfile);
export const useCopyPerilProfile = () => usePerilMutation(copyPerilProfile);
export const useDeletePerilProfile = () => usePerilMutation(deletePerilProfile);
