import { useQueries } from "@tanstack/react-query";
import type { PerilProfileRecord } from "@plumeline/contracts";
import { getPerilProfileQueryOptions } from "@/features/peril/api/get-peril-profile";

/**
 * The peril profiles behind some ids (a version's pins, the two sides of a diff), so the
 * model-version screens can name them however many profiles exist. One GET per id (a version pins
 * a handful), shared with the peril pages' cache. Lives in the app layer because it joins the
 * peril and model-versions features. A profile that cannot be read is left out: the screens then
 * show its id, so nothing is hidden.
 */
export function usePerilProfilesByIds(ids: readonly string[]): PerilProfileRecord[] {
  const unique = [...new Set(ids)];
  const results = useQueries({ queries: unique.map((id) => getPerilProfileQueryOptions(id)) });
  return results.flatMap((r) => (r.data ? [r.data] : []));
}
