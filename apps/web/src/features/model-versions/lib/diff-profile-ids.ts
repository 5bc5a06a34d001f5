import type { ModelVersionDiff } from "@plumeline/contracts";

/** Every peril-profile id a diff's pinned-profile change names, before and after (none if they did not change). */
export function diffProfileIds(diff: ModelVersionDiff | undefined): string[] {
  const change = diff?.changes.find((c) => c.path === "perilProfileIds");
  if (!change) return [];
  return [change.before, change.after].flatMap((side) => (Array.isArray(side) ? side.map(String) : []));
}
