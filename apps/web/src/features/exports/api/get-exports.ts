import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { exportPageSchema, type ExportPage, type ListExportsQueryInput } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { compactQuery } from "@/lib/list-query";

export const exportsRootKey = ["exports"] as const;

/** The query string of GET /api/exports; `mine` is sent as "true" when set. */
export type ExportsQuery = Omit<ListExportsQueryInput, "mine"> & { mine?: boolean };

const toQuery = (query: ExportsQuery) => compactQuery({ ...query, mine: query.mine ? "true" : undefined });

export const getExports = (query: ExportsQuery = {}, signal?: AbortSignal) =>
  api.get<ExportPage>("/api/exports", { query: toQuery(query), signal, schema: exportPageSchema });

export const getExportsQueryOptions = (query: ExportsQuery = {}) =>
  queryOptions({
    queryKey: [...exportsRootKey, "list", toQuery(query)],
    queryFn: ({ signal }) => getExports(query, signal),
    placeholderData: keepPreviousData,
  });

export const useExports = (query: ExportsQuery = {}) => useQuery(getExportsQueryOptions(query));
