import { queryOptions, useQuery } from "@tanstack/react-query";
import { runSummarySchema, type RunStatus, type RunSummary } from "@plumeline/contracts";
import { z } from "zod";
import { api } from "@/lib/api-client";
import { env } from "@/lib/env";

export const runsRootKey = ["runs"] as const;
/** Prefix of every run list (mine, by status): invalidating it refreshes them all. */
export const runsListKey = [...runsRootKey, "list"] as const;

export interface RunsFilter {
  mine?: boolean;
  status?: RunStatus;
}

export const isActive = (r: Pick<RunSummary, "status">) => r.status === "queued" || r.status === "running";

export const getRuns = (filter: RunsFilter = {}, signal?: AbortSignal) =>
  api.get<RunSummary[]>("/api/runs", {
    query: { mine: filter.mine ? "true" : undefined, status: filter.status },
    signal,
    schema: z.array(runSummarySchema),
  });

/** Polls while any listed run is queued or running, so progress bars move on their own. */
export const getRunsQueryOptions = (filter: RunsFilter = {}) =>
  queryOptions({
    queryKey: [...runsListKey, { mine: filter.mine ?? false, status: filter.status ?? null }],
    queryFn: ({ signal }) => getRuns(filter, signal),
    refetchInterval: (query) => (query.state.data?.some(isActive) ? env.pollMs : false),
  });

export const useRuns = (filter: RunsFilter = {}) => useQuery(getRunsQueryOptions(filter));
