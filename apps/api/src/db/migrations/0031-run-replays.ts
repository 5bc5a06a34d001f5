import { DataTypes } from "sequelize";
import type { MigrationModule } from "../migrate.js";

/**
 * Replays become queued jobs (the same queue and WORKERS limit as runs) with a record of their
 * own, so the run page can show a replay's progress like a run's and a person has at most one
 * replay waiting or running at a time.
 */
export const up: MigrationModule["up"] = async ({ queryInterface }) => {
  await queryInterface.createTable("run_replays", {
    id: { type: DataTypes.STRING, primaryKey: true, allowNull: false },
    run_id: { type: DataTypes.STRING, allowNull: false, references: { model: "runs", key: "id" }, onDelete: "CASCADE" },
    job_id: { type: DataTypes.STRING, allowNull: true },
    requested_by: { type: DataTypes.STRING, allowNull: false },
    status: { type: DataTypes.STRING, allowNull: false },
    progress: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 0 },
    result_hash: { type: DataTypes.STRING, allowNull: true },
    replay_hash: { type: DataTypes.STRING, allowNull: true },
    matched: { type: DataTypes.BOOLEAN, allowNull: true },
    engine_version: { type: DataTypes.STRING, allowNull: true },
    error: { type: DataTypes.TEXT, allowNull: true },
    started_at: { type: DataTypes.DATE, allowNull: true },
    finished_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("run_replays", ["run_id", "created_at"]);
  await queryInterface.addIndex("run_replays", ["requested_by", "status"]);
};

export const down: MigrationModule["down"] = async ({ queryInterface }) => {
  await queryInterface.dropTable("run_replays");
};
