import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import {
  MAX_PAGE_LIMIT,
  modelVersionPageSchema,
  type ListModelVersionsQueryInput,
  type ModelVersionPage,
  type ModelVersionSummary,
} from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { compactQuery } from "@/lib/list-query";
import type { PickerSource } from "@/components/search-picker/picker-source";

/** Every model-version query starts with this key, so a decision can refresh them all at once. */
export const modelVersionsRootKey = ["model-versions"] as const;

export type ModelVersionsQuery = ListModelVersionsQueryInput;

export const getModelVersions = (query: ModelVersionsQuery = {}, signal?: AbortSignal) =>
  api.get<ModelVersionPage>("/api/model-versions", { query: compactQuery(query), signal, schema: modelVersionPageSchema });

export const getModelVersionsQueryOptions = (query: ModelVersionsQuery = {}) =>
  queryOptions({
    queryKey: [...modelVersionsRootKey, "list", compactQuery(query)],
    queryFn: ({ signal }) => getModelVersions(query, signal),
    placeholderData: keepPreviousData,
  });

export const useModelVersions = (query: ModelVersionsQuery = {}) => useQuery(getModelVersionsQueryOptions(query));

/** Model versions for the desk's queues, as a plain array: the 200 most recently changed (the API's largest page). Pickers use `modelVersionPickerSource`. */
export const useModelVersionChoices = (query: Omit<ModelVersionsQuery, "limit" | "offset"> = {}) =>
  useQuery({ ...getModelVersionsQueryOptions({ ...query, limit: MAX_PAGE_LIMIT }), select: (page) => page.items });

/**
 * Where a model-version picker searches: the typed text as `q` (name and notes), most recently
 * changed first. Cached under the model-version key, so a decision refreshes pickers too.
 */
export const modelVersionPickerSource: PickerSource<ModelVersionSummary> = {
  queryKey: [...modelVersionsRootKey, "list"],
  fetchMatches: ({ q, limit }, signal) => getModelVersions({ q, limit }, signal),
};
