import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { replaySchema, type Replay } from "@plumeline/contracts";
import { z } from "zod";
import { api } from "@/lib/api-client";
import { env } from "@/lib/env";
import { runsRootKey } from "./get-runs";

/** Queues a replay (same queue and worker limit as runs; one at a time per person). */
export const replayRun = (id: string) => api.post<Replay>(`/api/runs/${encodeURIComponent(id)}/replay`, {}, { schema: replaySchema });

export const getReplays = (runId: string, signal?: AbortSignal) =>
  api.get<Replay[]>(`/api/runs/${encodeURIComponent(runId)}/replays`, { signal, schema: z.array(replaySchema) });

const replayActive = (r: Replay | undefined) => r?.status === "queued" || r?.status === "running";

/** The run's replays, newest first; polled while the newest is waiting or running, like a run's progress. */
export const getReplaysQueryOptions = (runId: string) =>
  queryOptions({
    queryKey: [...runsRootKey, "replays", runId],
    queryFn: ({ signal }) => getReplays(runId, signal),
    refetchInterval: (query) => (replayActive(query.state.data?.[0]) ? env.pollMs : false),
  });

export const useReplays = (runId: string) => useQuery(getReplaysQueryOptions(runId));

export function useReplayRun(runId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => replayRun(runId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getReplaysQueryOptions(runId).queryKey }),
  });
}
