import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import {
  perilProfilePageSchema,
  type ListPerilProfilesQueryInput,
  type PerilProfilePage,
  type PerilProfileRecord,
} from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { compactQuery } from "@/lib/list-query";
import type { PickerSource } from "@/components/search-picker/picker-source";

export const perilRootKey = ["peril"] as const;

export type PerilProfilesQuery = ListPerilProfilesQueryInput;

export const getPerilProfiles = (query: PerilProfilesQuery = {}, signal?: AbortSignal) =>
  api.get<PerilProfilePage>("/api/peril-profiles", { query: compactQuery(query), signal, schema: perilProfilePageSchema });

export const getPerilProfilesQueryOptions = (query: PerilProfilesQuery = {}) =>
  queryOptions({
    queryKey: [...perilRootKey, "profiles", compactQuery(query)],
    queryFn: ({ signal }) => getPerilProfiles(query, signal),
    placeholderData: keepPreviousData,
  });

export const usePerilProfiles = (query: PerilProfilesQuery = {}) => useQuery(getPerilProfilesQueryOptions(query));

/**
 * Where a peril-profile picker searches: the typed text as `q` (name, peril, region, source), in
 * the list's own order. Cached under the profile lists' key, so a saved profile shows up in pickers.
 */
export const perilProfilePickerSource: PickerSource<PerilProfileRecord> = {
  queryKey: [...perilRootKey, "profiles"],
  fetchMatches: ({ q, limit }, signal) => getPerilProfiles({ q, limit }, signal),
};
