import { useQueries } from "@tanstack/react-query";
import { getPathwayQueryOptions } from "@/features/pathways/api/get-pathway";

/**
 * The names of a model version's pinned pathways, in pinned order, for the impact preview's
 * pathway picker. One GET per pinned id (a version pins a handful), shared with the pathway
 * pages' cache. Lives in the app layer because it joins the pathways and model-versions features.
 * Returns null until every name is known, so the picker never starts from a partial list.
 */
export function usePinnedPathways(ids: string[]): Array<{ id: string; name: string }> | null {
  const results = useQueries({ queries: ids.map((id) => getPathwayQueryOptions(id)) });
  if (results.some((r) => r.isPending)) return null;
  // A pathway that cannot be read (deleted, no permission) is left out; the server skips it too.
  return results.flatMap((r) => (r.data ? [{ id: r.data.id, name: r.data.name }] : []));
}
