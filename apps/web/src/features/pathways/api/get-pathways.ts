import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { MAX_PAGE_LIMIT, pathwayPageSchema, type ListPathwaysQueryInput, type PathwayPage } from "@plumeline/contracts";
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

/** The pathways a picker offers, as a plain array: the newest 200 (the API's largest page). */
export const usePathwayChoices = () => useQuery({ ...getPathwaysQueryOptions({ limit: MAX_PAGE_LIMIT }), select: (page) => page.items });
