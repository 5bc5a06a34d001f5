import { queryOptions, useQuery } from "@tanstack/react-query";
import { perilProfileRecordSchema, type PerilProfileRecord } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { perilRootKey } from "./get-peril-profiles";

export const getPerilProfile = (id: string, signal?: AbortSignal) =>
  api.get<PerilProfileRecord>(`/api/peril-profiles/${encodeURIComponent(id)}`, { signal, schema: perilProfileRecordSchema });

export const getPerilProfileQueryOptions = (id: string) =>
  queryOptions({ queryKey: [...perilRootKey, "profile", id], queryFn: ({ signal }) => getPerilProfile(id, signal) });

export const usePerilProfile = (id: string | undefined) => useQuery({ ...getPerilProfileQueryOptions(id ?? ""), enabled: Boolean(id) });
