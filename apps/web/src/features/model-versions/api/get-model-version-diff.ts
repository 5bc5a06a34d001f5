import { queryOptions, useQuery } from "@tanstack/react-query";
import { modelVersionDiffSchema, type ModelVersionDiff } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { modelVersionsRootKey } from "./get-model-versions";

export const getModelVersionDiff = (id: string, against?: string, signal?: AbortSignal) =>
  api.get<ModelVersionDiff>(`/api/model-versions/${encodeURIComponent(id)}/diff`, { query: { against }, signal, schema: modelVersionDiffSchema });

export const getModelVersionDiffQueryOptions = (id: string, against?: string) =>
  queryOptions({
    queryKey: [...modelVersionsRootKey, "diff", id, against ?? "parent"],
    queryFn: ({ signal }) => getModelVersionDiff(id, against, signal),
  });

export const useModelVersionDiff = (id: string | undefined, against?: string) =>
  useQuery({ ...getModelVersionDiffQueryOptions(id ?? "", against), enabled: Boolean(id) });
