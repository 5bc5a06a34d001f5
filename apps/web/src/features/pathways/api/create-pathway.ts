import { useMutation, useQueryClient } from "@tanstack/react-query";
import { pathwaySchema, type CreatePathwayBody, type Pathway } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { pathwaysListKey } from "./get-pathways";

export const createPathway = (body: CreatePathwayBody) => api.post<Pathway>("/api/pathways", body, { schema: pathwaySchema });

export function useCreatePathway() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPathway,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: pathwaysListKey }),
  });
}
