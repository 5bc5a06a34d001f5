import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { pathwayPageSchema, type ListPathwaysQueryInput, type PathwayPage, type PathwaySummary } from "@plumeline/contracts";
import type { PickerSource } from "@/components/search-picker/picker-source";
import { api } from "@/lib/api-client";
import { compactQuery } from "@/lib/list-query";

export const pathwaysRootKey = ["pathways"] as const;
/** Prefix of every pathway list: a new or changed pathway refreshes them all. */
export const pathwaysListKey = [...pathwaysRootKey, "list"] as const;

export type PathwaysQuery = ListPathwaysQueryInput;

export const getPathways = (query: PathwaysQuery = {}, signal?: AbortSignal) =>
  api.get<PathwayPage>("/api/pathways", { query: compactQuery(query), signal, schema: pathwayPageSchema });

export const getPathwaysQueryOptions = (query: PathwaysQuery = {}) =>
  queryOptions({
    queryKey: [...pathwaysListKey, compactQuery(query)],
    queryFn: ({ signal }) => getPathways(query, signal),
    placeholderData: keepPreviousData,
  });

export const usePathways = (query: PathwaysQuery = {}) => useQuery(getPathwaysQueryOptions(query));

/**
 * Where a pathway picker searches: the typed text as `q` (name, description, source, vintage),
 * newest first. Cached under the pathway lists' key, so a saved pathway shows up in pickers too.
 */
export const pathwayPickerSource: PickerSource<PathwaySummary> = {
  queryKey: pathwaysListKey,
  fetchMatches: ({ q, limit }, signal) => getPathways({ q, limit }, signal),
};
