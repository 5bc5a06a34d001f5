import { DataTypes } from "sequelize";
import type { MigrationModule } from "../migrate.js";

/**
 * Model versions (uncertainty assumptions + run defaults) and their governance fields.
 * `family_id` groups a version with its ancestors so version numbers count up per family.
 * Approved and retired rows are refused updates to their content by the service and, as a
 * second line, by a trigger (only the retire transition may touch an approved row).
 */
export const up: MigrationModule["up"] = async ({ queryInterface, sequelize }) => {
  await queryInterface.createTable("model_versions", {
    id: { type: DataTypes.STRING, primaryKey: true, allowNull: false },
    family_id: { type: DataTypes.STRING, allowNull: false },
    version_number: { type: DataTypes.INTEGER, allowNull: false },
    name: { type: DataTypes.STRING, allowNull: false },
    status: { type: DataTypes.STRING, allowNull: false, defaultValue: "draft" },
    parent_id: { type: DataTypes.STRING, allowNull: true, references: { model: "model_versions", key: "id" } },
    model: { type: DataTypes.TEXT, allowNull: false },
    defaults: { type: DataTypes.TEXT, allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
    pathway_ids: { type: DataTypes.TEXT, allowNull: false, defaultValue: "[]" },
    peril_profile_ids: { type: DataTypes.TEXT, allowNull: false, defaultValue: "[]" },
    change_class: { type: DataTypes.STRING, allowNull: true },
    submission_note: { type: DataTypes.TEXT, allowNull: true },
    author_id: { type: DataTypes.STRING, allowNull: false, references: { model: "users", key: "id" } },
    submitted_at: { type: DataTypes.DATE, allowNull: true },
    decided_by: { type: DataTypes.STRING, allowNull: true, references: { model: "users", key: "id" } },
    decided_at: { type: DataTypes.DATE, allowNull: true },
    decision_comment: { type: DataTypes.TEXT, allowNull: true },
    retired_by: { type: DataTypes.STRING, allowNull: true, references: { model: "users", key: "id" } },
    retired_at: { type: DataTypes.DATE, allowNull: true },
    retire_comment: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("model_versions", ["status"]);
  await queryInterface.addIndex("model_versions", ["family_id", "version_number"], { unique: true });
  await sequelize.query(`CREATE TRIGGER model_versions_frozen_content BEFORE UPDATE ON model_versions
    WHEN OLD.status IN ('approved', 'retired') AND (
      NEW.model IS NOT OLD.model OR NEW.defaults IS NOT OLD.defaults OR NEW.name IS NOT OLD.name
      OR NEW.notes IS NOT OLD.notes OR NEW.pathway_ids IS NOT OLD.pathway_ids OR NEW.parent_id IS NOT OLD.parent_id
      OR (OLD.status = 'retired' AND NEW.status IS NOT 'retired'))
    BEGIN SELECT RAISE(ABORT, 'approved and retired model versions are immutable'); END`);
};

export const down: MigrationModule["down"] = async ({ queryInterface, sequelize }) => {
  await sequelize.query("DROP TRIGGER IF EXISTS model_versions_frozen_content");
  await queryInterface.dropTable("model_versions");
};
