import { queryOptions, useQuery } from "@tanstack/react-query";
import { runResultSchema, type RunResult } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { runsRootKey } from "./get-runs";

/** Performance mark set when a result's JSON has been parsed; the result page measures from it to charts drawn. */
export const RESULT_ARRIVED_MARK = "plumeline:result-arrived";

export async function getRunResult(id: string, signal?: AbortSignal): Promise<RunResult> {
  const result = await api.get<RunResult>(`/api/runs/${encodeURIComponent(id)}/result`, { signal, schema: runResultSchema });
  performance.mark(RESULT_ARRIVED_MARK, { detail: { runId: id } });
  return result;
}

/** A finished result never changes (same inputs, same hash), so it is cached for the session. */
export const getRunResultQueryOptions = (id: string) =>
  queryOptions({
    queryKey: [...runsRootKey, "result", id],
    queryFn: ({ signal }) => getRunResult(id, signal),
    staleTime: Infinity,
    gcTime: 10 * 60_000,
  });

export const useRunResult = (id: string | undefined, enabled = true) =>
  useQuery({ ...getRunResultQueryOptions(id ?? ""), enabled: Boolean(id) && enabled });
