import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { runStatementSchema, type CreateRunStatementBody, type RunStatement } from "@plumeline/contracts";
import { z } from "zod";
import { api } from "@/lib/api-client";
import { runsRootKey } from "./get-runs";

const statementsPath = (runId: string) => `/api/runs/${encodeURIComponent(runId)}/statements`;

export const getRunStatements = (runId: string, signal?: AbortSignal) =>
  api.get<RunStatement[]>(statementsPath(runId), { signal, schema: z.array(runStatementSchema) });

/** Keyed under the run's detail key, so refreshing a run refreshes its statements too. */
export const getRunStatementsQueryOptions = (runId: string) =>
  queryOptions({ queryKey: [...runsRootKey, "detail", runId, "statements"], queryFn: ({ signal }) => getRunStatements(runId, signal) });

export const useRunStatements = (runId: string) => useQuery(getRunStatementsQueryOptions(runId));

export const recordRunStatement = ({ runId, ...body }: CreateRunStatementBody & { runId: string }) =>
  api.post<RunStatement>(statementsPath(runId), body, { schema: runStatementSchema });

export function useRecordRunStatement() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: recordRunStatement,
    onSuccess: (statement) => queryClient.invalidateQueries({ queryKey: getRunStatementsQueryOptions(statement.runId).queryKey }),
  });
}
