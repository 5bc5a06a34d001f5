import { useMutation, useQueryClient } from "@tanstack/react-query";
import { runSummarySchema, type RunSummary } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { getRunQueryOptions } from "./get-run";
import { runsListKey } from "./get-runs";

export const cancelRun = (id: string) => api.post<RunSummary>(`/api/runs/${encodeURIComponent(id)}/cancel`, {}, { schema: runSummarySchema });

export function useCancelRun() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: cancelRun,
    onSuccess: (run) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: getRunQueryOptions(run.id).queryKey }),
        queryClient.invalidateQueries({ queryKey: runsListKey }),
      ]),
  });
}
