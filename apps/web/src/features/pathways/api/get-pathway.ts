import { queryOptions, useQueries, useQuery } from "@tanstack/react-query";
import { pathwaySchema, type Pathway } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { pathwaysRootKey } from "./get-pathways";

export const getPathway = (id: string, signal?: AbortSignal) =>
  api.get<Pathway>(`/api/pathways/${encodeURIComponent(id)}`, { signal, schema: pathwaySchema });

export const getPathwayQueryOptions = (id: string) =>
  queryOptions({ queryKey: [...pathwaysRootKey, "detail", id], queryFn: ({ signal }) => getPathway(id, signal), staleTime: 5 * 60_000 });

export const usePathway = (id: string | undefined) => useQuery({ ...getPathwayQueryOptions(id ?? ""), enabled: Boolean(id) });

/** Several pathways in full at once (the composer's splice sources and blend partners), each cached like usePathway. */
export const usePathwaysByIds = (ids: readonly string[]) => useQueries({ queries: ids.map((id) => getPathwayQueryOptions(id)) });
