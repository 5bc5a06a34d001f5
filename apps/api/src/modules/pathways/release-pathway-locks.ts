import { QueryTypes, type Sequelize, type Transaction } from "sequelize";

/** Model version statuses whose pinned pathways must not change (under review, or a record). */
export const PATHWAY_LOCKING_STATUSES = ["in-review", "approved", "retired"] as const;

/**
 * Unlocks those of `ids` that nothing else locks any more: no run used them and no model
 * version other than `releasingVersionId` that is in review, approved or retired pins them.
 * Called when a version under review is rejected, so its pins lose the lock they took at
 * submission. Read from the `pathway_ids` JSON lists (SQLite json_each), inside the caller's
 * transaction.
 */
export async function releasePathwayLocks(sequelize: Sequelize, ids: readonly string[], releasingVersionId: string, transaction: Transaction): Promise<void> {
  if (ids.length === 0) return;
  const options = { replacements: { ids: [...ids], version: releasingVersionId, statuses: [...PATHWAY_LOCKING_STATUSES] }, type: QueryTypes.SELECT, transaction } as const;
  const held = await sequelize.query<{ pathway_id: string }>(
    `SELECT j.value AS pathway_id FROM runs r, json_each(r.pathway_ids) j WHERE j.value IN (:ids)
     UNION
     SELECT j.value FROM model_versions mv, json_each(mv.pathway_ids) j
      WHERE j.value IN (:ids) AND mv.id <> :version AND mv.status IN (:statuses)`,
    options,
  );
  const stillHeld = new Set(held.map((h) => h.pathway_id));
  const free = ids.filter((id) => !stillHeld.has(id));
  if (free.length === 0) return;
  await sequelize.query("UPDATE pathways SET locked = 0 WHERE id IN (:free)", { replacements: { free }, transaction });
}
