import { useMutation } from "@tanstack/react-query";
import { replayResponseSchema, type ReplayResponse } from "@plumeline/contracts";
import { api } from "@/lib/api-client";

/** Re-runs the stored spec and reports whether the result hash matched (nothing is cached: each replay is a fresh proof). */
export const replayRun = (id: string) =>
  api.post<ReplayResponse>(`/api/runs/${encodeURIComponent(id)}/replay`, {}, { schema: replayResponseSchema });

export const useReplayRun = () => useMutation({ mutationFn: replayRun });
