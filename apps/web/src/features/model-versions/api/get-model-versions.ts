import { queryOptions, useQuery } from "@tanstack/react-query";
import { modelVersionSummarySchema, type ModelVersionStatus, type ModelVersionSummary } from "@plumeline/contracts";
import { z } from "zod";
import { api } from "@/lib/api-client";

/** Every model-version query starts with this key, so a decision can refresh them all at once. */
export const modelVersionsRootKey = ["model-versions"] as const;

export const getModelVersions = (status?: ModelVersionStatus, signal?: AbortSignal) =>
  api.get<ModelVersionSummary[]>("/api/model-versions", { query: { status }, signal, schema: z.array(modelVersionSummarySchema) });

export const getModelVersionsQueryOptions = (status?: ModelVersionStatus) =>
  queryOptions({
    queryKey: [...modelVersionsRootKey, "list", { status: status ?? null }],
    queryFn: ({ signal }) => getModelVersions(status, signal),
  });

export const useModelVersions = (status?: ModelVersionStatus) => useQuery(getModelVersionsQueryOptions(status));
