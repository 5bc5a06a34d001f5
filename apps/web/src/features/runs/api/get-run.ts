import { queryOptions, useQuery } from "@tanstack/react-query";
import { runSchema, type Run } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { env } from "@/lib/env";
import { isActive, runsRootKey } from "./get-runs";

export const getRun = (id: string, signal?: AbortSignal) => api.get<Run>(`/api/runs/${encodeURIComponent(id)}`, { signal, schema: runSchema });

export const getRunQueryOptions = (id: string) =>
  queryOptions({
    queryKey: [...runsRootKey, "detail", id],
    queryFn: ({ signal }) => getRun(id, signal),
    refetchInterval: (query) => (query.state.data && isActive(query.state.data) ? env.pollMs : false),
  });

export const useRun = (id: string | undefined) => useQuery({ ...getRunQueryOptions(id ?? ""), enabled: Boolean(id) });
