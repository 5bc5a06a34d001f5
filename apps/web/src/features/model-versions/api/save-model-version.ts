import { useMutation, useQueryClient } from "@tanstack/react-query";
import { modelVersionSchema, type CreateModelVersionBody, type ModelVersion, type UpdateModelVersionBody } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { modelVersionsRootKey } from "./get-model-versions";

export const createModelVersion = (body: CreateModelVersionBody) =>
  api.post<ModelVersion>("/api/model-versions", body, { schema: modelVersionSchema });

export const updateModelVersion = ({ id, body }: { id: string; body: UpdateModelVersionBody }) =>
  api.patch<ModelVersion>(`/api/model-versions/${encodeURIComponent(id)}`, body, { schema: modelVersionSchema });

/** Creating a draft adds to the lists; editing changes a detail, its diff and the lists. */
export function useCreateModelVersion() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createModelVersion, onSuccess: () => queryClient.invalidateQueries({ queryKey: modelVersionsRootKey }) });
}

export function useUpdateModelVersion() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateModelVersion, onSuccess: () => queryClient.invalidateQueries({ queryKey: modelVersionsRootKey }) });
}
