import type { PerilProfileLock } from "@plumeline/contracts";
import { QueryTypes, type Sequelize, type Transaction } from "sequelize";

/**
 * Which records depend on each peril profile, read from the `peril_profile_ids` JSON lists of
 * model versions and runs (SQLite json_each). A profile is locked when a model version in
 * review, approved or retired pins it, or any run used it: a reviewer must see the numbers they
 * sign off on, and records must stay reproducible. A rejected version locks nothing, so its
 * profiles unlock unless something else holds them. `drafts` lists the draft versions that
 * name it (they block deletion, not edits).
 */
export interface ProfileDependants {
  lock: PerilProfileLock;
  drafts: Array<{ id: string; name: string; versionNumber: number; status: string }>;
}

const LOCKING_STATUSES = new Set(["in-review", "approved", "retired"]);

export function isLocked(lock: PerilProfileLock): boolean {
  return lock.modelVersions.length > 0 || lock.runIds.length > 0;
}

export async function profileDependants(
  sequelize: Sequelize,
  ids: readonly string[],
  transaction?: Transaction,
): Promise<Map<string, ProfileDependants>> {
  const out = new Map<string, ProfileDependants>(ids.map((id) => [id, { lock: { modelVersions: [], runIds: [] }, drafts: [] }]));
  if (ids.length === 0) return out;
  const options = { replacements: { ids: [...ids] }, type: QueryTypes.SELECT, ...(transaction ? { transaction } : {}) } as const;
  const versions = await sequelize.query<{ id: string; name: string; version_number: number; status: string; profile_id: string }>(
    `SELECT mv.id, mv.name, mv.version_number, mv.status, j.value AS profile_id
       FROM model_versions mv, json_each(mv.peril_profile_ids) j
      WHERE j.value IN (:ids)
      ORDER BY mv.version_number`,
    options,
  );
  for (const v of versions) {
    const entry = out.get(v.profile_id);
    if (!entry) continue;
    const version = { id: v.id, name: v.name, versionNumber: v.version_number, status: v.status };
    if (LOCKING_STATUSES.has(v.status)) entry.lock.modelVersions.push(version);
    else if (v.status !== "rejected") entry.drafts.push(version);
  }
  const runs = await sequelize.query<{ id: string; profile_id: string }>(
    `SELECT r.id, j.value AS profile_id FROM runs r, json_each(r.peril_profile_ids) j WHERE j.value IN (:ids) ORDER BY r.created_at`,
    options,
  );
  for (const r of runs) out.get(r.profile_id)?.lock.runIds.push(r.id);
  return out;
}
