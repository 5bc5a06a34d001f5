import { queryOptions, useQuery } from "@tanstack/react-query";
import { perilProfileRecordSchema, type PerilProfileRecord } from "@plumeline/contracts";
import { z } from "zod";
import { api } from "@/lib/api-client";

export const perilRootKey = ["peril"] as const;

export const getPerilProfiles = (signal?: AbortSignal) =>
  api.get<PerilProfileRecord[]>("/api/peril-profiles", { signal, schema: z.array(perilProfileRecordSchema) });

export const getPerilProfilesQueryOptions = () =>
  queryOptions({ queryKey: [...perilRootKey, "profiles"], queryFn: ({ signal }) => getPerilProfiles(signal) });

export const usePerilProfiles = () => useQuery(getPerilProfilesQueryOptions());
