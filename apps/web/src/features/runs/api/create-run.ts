import { useMutation, useQueryClient } from "@tanstack/react-query";
import { runSummarySchema, type CreateRunBody, type RunSummary } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { runsListKey } from "./get-runs";

export const createRun = (body: CreateRunBody) => api.post<RunSummary>("/api/runs", body, { schema: runSummarySchema });

export function useCreateRun() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRun,
    // Every run list (mine, by status) may now hold the new run.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: runsListKey }),
  });
}
