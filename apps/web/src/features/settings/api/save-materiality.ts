import { useMutation, useQueryClient } from "@tanstack/react-query";
import { materialitySettingsSchema, type MaterialitySettings, type UpdateMaterialityBody } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { getMaterialityQueryOptions } from "./get-materiality";

export const saveMateriality = (body: UpdateMaterialityBody) => api.put<MaterialitySettings>("/api/settings/materiality", body, { schema: materialitySettingsSchema });

/** Saves the policy; previews already on screen keep the policy they were made with until they are asked again. */
export function useSaveMateriality() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: saveMateriality, onSuccess: (saved) => queryClient.setQueryData(getMaterialityQueryOptions().queryKey, saved) });
}
