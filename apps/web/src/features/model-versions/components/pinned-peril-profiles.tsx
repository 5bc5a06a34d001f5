import type { PerilProfileRecord } from "@plumeline/contracts";

/** What the model-version screens need to know about a peril profile (the app layer passes the list in). */
export type PinnableProfile = Pick<PerilProfileRecord, "id" | "name" | "peril" | "region">;

/** Profile id -> "name (peril, region)", for showing pinned ids in words. */
export function profileNames(profiles: readonly PinnableProfile[] | undefined): Map<string, string> {
  return new Map((profiles ?? []).map((p) => [p.id, `${p.name} (${p.peril}, ${p.region})`]));
}

/**
 * Multi-select of the peril profiles a version pins: runs of the version that name no profiles
 * use these, and reviewers see them in the diff. Ids pinned earlier but missing from the list
 * stay visible (and removable) so nothing disappears silently.
 */
export function PinnedPerilProfilesPicker({
  profiles,
  value,
  onChange,
}: {
  profiles: readonly PinnableProfile[];
  value: readonly string[];
  onChange: (next: string[]) => void;
}) {
  const known = new Set(profiles.map((p) => p.id));
  const unknown = value.filter((id) => !known.has(id));
  const toggle = (id: string) => onChange(value.includes(id) ? value.filter((x) => x !== id) : [...value, id]);
  if (profiles.length === 0 && unknown.length === 0) return <p className="text-sm text-muted">No peril profiles exist yet; an actuary or analyst creates them in the peril lens.</p>;
  return (
    <div role="group" aria-label="Pinned peril profiles" className="flex flex-col gap-1">
      {profiles.map((p) => (
        <label key={p.id} className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={value.includes(p.id)} onChange={() => toggle(p.id)} />
          <span className="font-medium">{p.name}</span>
          <span className="text-xs text-muted">
            {p.peril} · {p.region}
          </span>
        </label>
      ))}
      {unknown.map((id) => (
        <label key={id} className="flex items-center gap-2 text-sm text-danger">
          <input type="checkbox" checked onChange={() => toggle(id)} />
          <code className="text-xs">{id}</code> <span className="text-xs">(not found — untick to remove)</span>
        </label>
      ))}
    </div>
  );
}

/** The pinned profiles of a version, in words. */
export function PinnedPerilProfilesList({ ids, profiles }: { ids: readonly string[]; profiles: readonly PinnableProfile[] | undefined }) {
  if (ids.length === 0) return <p className="text-sm text-muted">No peril profiles pinned: runs use the profiles they name themselves.</p>;
  const names = profileNames(profiles);
  return (
    <ul aria-label="Pinned peril profiles" className="flex flex-col gap-1 text-sm">
      {ids.map((id) => (
        <li key={id}>{names.get(id) ?? <code className="text-xs">{id}</code>}</li>
      ))}
    </ul>
  );
}
