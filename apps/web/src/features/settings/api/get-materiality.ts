import { queryOptions, useQuery } from "@tanstack/react-query";
import { materialitySettingsSchema, type MaterialitySettings } from "@plumeline/contracts";
import { api } from "@/lib/api-client";

export const materialityKey = ["settings", "materiality"] as const;

export const getMateriality = (signal?: AbortSignal) => api.get<MaterialitySettings>("/api/settings/materiality", { signal, schema: materialitySettingsSchema });

export const getMaterialityQueryOptions = () => queryOptions({ queryKey: materialityKey, queryFn: ({ signal }) => getMateriality(signal) });

export const useMateriality = () => useQuery(getMaterialityQueryOptions());
