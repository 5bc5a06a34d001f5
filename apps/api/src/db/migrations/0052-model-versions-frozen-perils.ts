import type { Sequelize } from "sequelize";
import type { MigrationModule } from "../migrate.js";

/**
 * The frozen-content trigger from 0011 predates pinned peril profiles, so a raw UPDATE could
 * re-pin the profiles of an approved version behind the service's back and change what a filing
 * run inherits. SQLite cannot alter a trigger, so it is dropped and recreated with
 * `peril_profile_ids` in the list; `down` restores 0011's exact text. Drop and create share one
 * transaction so a failure never leaves the table with no trigger at all.
 */
const frozenColumnsWithoutPerils = `NEW.model IS NOT OLD.model OR NEW.defaults IS NOT OLD.defaults OR NEW.name IS NOT OLD.name
      OR NEW.notes IS NOT OLD.notes OR NEW.pathway_ids IS NOT OLD.pathway_ids OR NEW.parent_id IS NOT OLD.parent_id`;

function frozenContentTrigger(frozenColumns: string): string {
  return `CREATE TRIGGER model_versions_frozen_content BEFORE UPDATE ON model_versions
    WHEN OLD.status IN ('approved', 'retired') AND (
      ${frozenColumns}
      OR (OLD.status = 'retired' AND NEW.status IS NOT 'retired'))
    BEGIN SELECT RAISE(ABORT, 'approved and retired model versions are immutable'); END`;
}

async function replaceFrozenContentTrigger(sequelize: Sequelize, frozenColumns: string): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await sequelize.query("DROP TRIGGER IF EXISTS model_versions_frozen_content", { transaction });
    await sequelize.query(frozenContentTrigger(frozenColumns), { transaction });
  });
}

export const up: MigrationModule["up"] = async ({ sequelize }) =>
  replaceFrozenContentTrigger(sequelize, `${frozenColumnsWithoutPerils}\n      OR NEW.peril_profile_ids IS NOT OLD.peril_profile_ids`);

export const down: MigrationModule["down"] = async ({ sequelize }) => replaceFrozenContentTrigger(sequelize, frozenColumnsWithoutPerils);
