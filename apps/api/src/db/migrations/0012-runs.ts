import { DataTypes } from "sequelize";
import type { MigrationModule } from "../migrate.js";

/**
 * Runs: the validated engine spec as queued, its input hash, and the status the worker
 * reports. `exploratory` is fixed at creation (model version not approved then) and never
 * changes afterwards.
 */
export const up: MigrationModule["up"] = async ({ queryInterface }) => {
  await queryInterface.createTable("runs", {
    id: { type: DataTypes.STRING, primaryKey: true, allowNull: false },
    name: { type: DataTypes.STRING, allowNull: false },
    model_version_id: { type: DataTypes.STRING, allowNull: false, references: { model: "model_versions", key: "id" } },
    pathway_ids: { type: DataTypes.TEXT, allowNull: false },
    members: { type: DataTypes.INTEGER, allowNull: false },
    seed: { type: DataTypes.STRING, allowNull: false },
    sampling: { type: DataTypes.STRING, allowNull: false },
    spec: { type: DataTypes.TEXT, allowNull: false },
    input_hash: { type: DataTypes.STRING(64), allowNull: false },
    job_id: { type: DataTypes.STRING, allowNull: true },
    exploratory: { type: DataTypes.BOOLEAN, allowNull: false },
    status: { type: DataTypes.STRING, allowNull: false, defaultValue: "queued" },
    progress: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 0 },
    engine_version: { type: DataTypes.STRING, allowNull: true },
    result_hash: { type: DataTypes.STRING, allowNull: true },
    error: { type: DataTypes.TEXT, allowNull: true },
    peril_profile_ids: { type: DataTypes.TEXT, allowNull: false, defaultValue: "[]" },
    portfolio_id: { type: DataTypes.STRING, allowNull: true },
    created_by: { type: DataTypes.STRING, allowNull: false, references: { model: "users", key: "id" } },
    started_at: { type: DataTypes.DATE, allowNull: true },
    finished_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("runs", ["created_at"]);
  await queryInterface.addIndex("runs", ["status"]);
  await queryInterface.addIndex("runs", ["created_by"]);
  await queryInterface.addIndex("runs", ["model_version_id"]);
};

export const down: MigrationModule["down"] = async ({ queryInterface }) => {
  await queryInterface.dropTable("runs");
};
