import { queryOptions, useQuery } from "@tanstack/react-query";
import { modelVersionImpactSchema, type ModelVersionImpact, type ModelVersionImpactBody } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { modelVersionsRootKey } from "./get-model-versions";

/**
 * The effect of a version on key outputs. A POST (the server runs two preview ensembles) that
 * reads nothing and changes nothing, so it is cached like a query: same version, comparison,
 * pathway set and members, same answer (the server caches by input hashes too). Editing a draft
 * invalidates everything under the model-versions key, this included.
 */
export const getModelVersionImpact = (id: string, body: ModelVersionImpactBody = {}, signal?: AbortSignal) =>
  api.post<ModelVersionImpact>(`/api/model-versions/${encodeURIComponent(id)}/impact`, body, { signal, schema: modelVersionImpactSchema });

export const getModelVersionImpactQueryOptions = (id: string, body: ModelVersionImpactBody = {}) =>
  queryOptions({
    queryKey: [...modelVersionsRootKey, "impact", id, { againstId: body.againstId ?? null, pathwayIds: body.pathwayIds ?? null, members: body.members ?? null }],
    queryFn: ({ signal }) => getModelVersionImpact(id, body, signal),
    // A few seconds of server CPU per answer, and deterministic: never refetch on focus or remount.
    staleTime: Number.POSITIVE_INFINITY,
    refetchOnWindowFocus: false,
    retry: false,
  });

export const useModelVersionImpact = (id: string | undefined, body: ModelVersionImpactBody = {}, options: { enabled?: boolean } = {}) =>
  useQuery({ ...getModelVersionImpactQueryOptions(id ?? "", body), enabled: Boolean(id) && (options.enabled ?? true) });
