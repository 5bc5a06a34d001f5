import { DataTypes } from "sequelize";
import type { MigrationModule } from "../migrate.js";

/**
 * The durable queue as a table: one row per job. A worker claims a row with a
 * guarded update (status 'queued' -> 'running' only if still queued), beats a heartbeat
 * while it works, and finishes the row in the same transaction as the job's results.
 */
export const up: MigrationModule["up"] = async ({ queryInterface }) => {
  await queryInterface.createTable("jobs", {
    id: { type: DataTypes.STRING, primaryKey: true, allowNull: false },
    type: { type: DataTypes.STRING, allowNull: false },
    payload: { type: DataTypes.TEXT, allowNull: false },
    status: { type: DataTypes.STRING, allowNull: false, defaultValue: "queued" },
    attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    max_attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 3 },
    cancel_requested: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    progress: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 0 },
    locked_by: { type: DataTypes.STRING, allowNull: true },
    locked_at: { type: DataTypes.DATE, allowNull: true },
    heartbeat_at: { type: DataTypes.DATE, allowNull: true },
    last_error: { type: DataTypes.TEXT, allowNull: true },
    started_at: { type: DataTypes.DATE, allowNull: true },
    finished_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("jobs", ["status", "created_at"]);
};

export const down: MigrationModule["down"] = async ({ queryInterface }) => {
  await queryInterface.dropTable("jobs");
};
