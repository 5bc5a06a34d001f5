import { useMutation, useQueryClient } from "@tanstack/react-query";
import { modelVersionSchema, type ChangeClass, type ModelVersion } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { modelVersionsRootKey } from "./get-model-versions";

/** The governance steps: submit (author), approve / reject / retire (a manager who is not the author). */
export type Transition =
  | { action: "submit"; id: string; changeClass: ChangeClass; note?: string }
  | { action: "approve"; id: string; comment: string }
  | { action: "reject"; id: string; comment: string }
  | { action: "retire"; id: string; comment?: string };

export function transitionModelVersion(t: Transition): Promise<ModelVersion> {
  const { action, id, ...body } = t;
  return api.post<ModelVersion>(`/api/model-versions/${encodeURIComponent(id)}/${action}`, body, { schema: modelVersionSchema });
}

/** Every step changes status, so every model-version query (lists, details, review queue) is refreshed. */
export function useTransitionModelVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: transitionModelVersion,
    onSuccess: (version) => {
      queryClient.setQueryData([...modelVersionsRootKey, "detail", version.id], version);
      return queryClient.invalidateQueries({ queryKey: modelVersionsRootKey });
    },
  });
}
