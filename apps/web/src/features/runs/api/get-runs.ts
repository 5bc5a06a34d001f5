import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { runPageSchema, type ListRunsQueryInput, type RunPage, type RunSummary } from "@plumeline/contracts";
import type { PickerSource } from "@/components/search-picker/picker-source";
import { api } from "@/lib/api-client";
import { env } from "@/lib/env";
import { compactQuery } from "@/lib/list-query";

export const runsRootKey = ["runs"] as const;
/** Prefix of every run list (any search, filter or page): invalidating it refreshes them all. */
export const runsListKey = [...runsRootKey, "list"] as const;

/** The query string of GET /api/runs; `mine` is sent as "true" when set. */
export type RunsQuery = Omit<ListRunsQueryInput, "mine"> & { mine?: boolean };

export const isActive = (r: Pick<RunSummary, "status">) => r.status === "queued" || r.status === "running";

const toQuery = (query: RunsQuery) => compactQuery({ ...query, mine: query.mine ? "true" : undefined });

export const getRuns = (query: RunsQuery = {}, signal?: AbortSignal) =>
  api.get<RunPage>("/api/runs", { query: toQuery(query), signal, schema: runPageSchema });

/**
 * Polls while any listed run is queued or running, so progress bars move on their own; the
 * previous page stays on screen while the next one loads (no flash when paging).
 */
export const getRunsQueryOptions = (query: RunsQuery = {}) =>
  queryOptions({
    queryKey: [...runsListKey, toQuery(query)],
    queryFn: ({ signal }) => getRuns(query, signal),
    placeholderData: keepPreviousData,
    refetchInterval: (q) => (q.state.data?.items.some(isActive) ? env.pollMs : false),
  });

export const useRuns = (query: RunsQuery = {}) => useQuery(getRunsQueryOptions(query));

/**
 * Where a run picker searches: the typed text as `q` (the run's name), newest first, within the
 * given filters (finished runs only, say). Cached under the run lists' key.
 */
export const runPickerSource = (filters: Omit<RunsQuery, "q" | "limit" | "offset">): PickerSource<RunSummary> => ({
  queryKey: [...runsListKey, toQuery(filters)],
  fetchMatches: ({ q, limit }, signal) => getRuns({ ...filters, q, limit }, signal),
});
