import { queryOptions, useQuery } from "@tanstack/react-query";
import { modelVersionSchema, type ModelVersion } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { modelVersionsRootKey } from "./get-model-versions";

export const getModelVersion = (id: string, signal?: AbortSignal) =>
  api.get<ModelVersion>(`/api/model-versions/${encodeURIComponent(id)}`, { signal, schema: modelVersionSchema });

export const getModelVersionQueryOptions = (id: string) =>
  queryOptions({ queryKey: [...modelVersionsRootKey, "detail", id], queryFn: ({ signal }) => getModelVersion(id, signal) });

export const useModelVersion = (id: string | undefined) => useQuery({ ...getModelVersionQueryOptions(id ?? ""), enabled: Boolean(id) });
