import { queryOptions, useQuery } from "@tanstack/react-query";
import { meSchema, type Me } from "@plumeline/contracts";
import { api } from "@/lib/api-client";

export type { Me };

export const getMe = (signal?: AbortSignal) => api.get<Me>("/api/me", { signal, schema: meSchema });

/** Who is signed in and what they may do; the shell and every guard read this one query. */
export const getMeQueryOptions = () =>
  queryOptions({
    queryKey: ["me"],
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 60_000,
    retry: false,
  });

export const useMe = () => useQuery(getMeQueryOptions());
