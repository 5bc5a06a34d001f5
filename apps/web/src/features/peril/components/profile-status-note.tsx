import type { PerilProfileRecord } from "@plumeline/contracts";
import { PERMISSION_HOLDERS } from "@/config/permissions";

function lockReason(p: PerilProfileRecord): string {
  const versions = p.lockedBy.modelVersions.map((v) => `${v.status} model version “${v.name}” v${v.versionNumber}`);
  const runs = p.lockedBy.runIds.length ? [`${p.lockedBy.runIds.length} run${p.lockedBy.runIds.length === 1 ? "" : "s"}`] : [];
  return [...versions, ...runs].join(" and ");
}

/**
 * Why the profile form is read-only, when it is: locked by the records that use it, made by
 * someone else, or the viewer's role may only read. Without it a greyed-out form with no save
 * button would look broken. One reason is given, the one the user can least change first.
 */
export function ProfileStatusNote({ record, canWrite, owner }: { record: PerilProfileRecord | undefined; canWrite: boolean; owner: boolean }) {
  if (record?.locked)
    return (
      <p role="status" className="mb-4 rounded-md border border-line-strong bg-surface-2 px-4 py-2 text-sm">
        Locked: used by {lockReason(record)}. It stays as it is so those records can be reproduced; copy it to make changes.
      </p>
    );
  if (!canWrite)
    return (
      <p role="status" className="mb-4 rounded-md border border-line bg-surface-2 px-4 py-2 text-sm">
        Read only: your role can view peril profiles; only {PERMISSION_HOLDERS["perils:write"]} can write or change them.
      </p>
    );
  if (record && !owner)
    return (
      <p role="status" className="mb-4 rounded-md border border-line bg-surface-2 px-4 py-2 text-sm">
        Made by {record.createdByName ?? "someone else"}: only they can edit it. Copy it to make your own.
      </p>
    );
  return null;
}
