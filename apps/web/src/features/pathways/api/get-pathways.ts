import { queryOptions, useQuery } from "@tanstack/react-query";
import { pathwaySummarySchema, type PathwaySummary } from "@plumeline/contracts";
import { z } from "zod";
import { api } from "@/lib/api-client";

export const pathwaysRootKey = ["pathways"] as const;

export const getPathways = (signal?: AbortSignal) =>
  api.get<PathwaySummary[]>("/api/pathways", { signal, schema: z.array(pathwaySummarySchema) });

export const getPathwaysQueryOptions = () =>
  queryOptions({ queryKey: [...pathwaysRootKey, "list"], queryFn: ({ signal }) => getPathways(signal) });

export const usePathways = () => useQuery(getPathwaysQueryOptions());
