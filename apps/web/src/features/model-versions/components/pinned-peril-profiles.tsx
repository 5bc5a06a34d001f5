import type { PerilProfileRecord } from "@plumeline/contracts";
import type { PickerSource } from "@/components/search-picker/picker-source";
import { SearchMultiPicker } from "@/components/search-picker/search-multi-picker";

/** What the model-version screens need to know about a peril profile (the app layer passes the list in). */
export type PinnableProfile = Pick<PerilProfileRecord, "id" | "name" | "peril" | "region">;

/** Profile id -> "name (peril, region)", for showing pinned ids in words. */
export function profileNames(profiles: readonly PinnableProfile[] | undefined): Map<string, string> {
  return new Map((profiles ?? []).map((p) => [p.id, `${p.name} (${p.peril}, ${p.region})`]));
}

/**
 * Searchable multi-select of the peril profiles a version pins: runs of the version that name no
 * profiles use these, and reviewers see them in the diff. Any profile can be found by typing part
 * of its name, peril or region; ids pinned earlier whose profile is unknown stay listed (and
 * removable) so nothing disappears silently.
 */
export function PinnedPerilProfilesPicker({
  source,
  known,
  value,
  onChange,
}: {
  /** Where to search (the peril feature's list, given by the app layer). */
  source: PickerSource<PinnableProfile>;
  /** The profiles already pinned, for their names. */
  known: readonly PinnableProfile[];
  value: readonly string[];
  onChange: (next: string[]) => void;
}) {
  return (
    <SearchMultiPicker<PinnableProfile>
      label="Pinned peril profiles"
      source={source}
      itemLabel={(p) => p.name}
      itemDetail={(p) => `${p.peril} · ${p.region}`}
      value={value}
      known={known}
      onChange={onChange}
      placeholder="Type part of a profile's name, peril or region…"
      noneChosen="None pinned: runs of this version use the profiles they name themselves."
    />
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
