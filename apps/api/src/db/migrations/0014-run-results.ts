import { DataTypes } from "sequelize";
import type { MigrationModule } from "../migrate.js";

/**
 * Results: the engine's full RunResult JSON (one row per run) plus the per-year statistics in
 * long form, one row per (run, pathway, variable, year, statistic), so tables can be queried
 * by run, pathway, variable and year without parsing the JSON. Variables: temperature,
 * forcing, imbalance (statistics p5…, mean) and exceedance (statistic = threshold in K).
 */
export const up: MigrationModule["up"] = async ({ queryInterface }) => {
  await queryInterface.createTable("run_results", {
    run_id: { type: DataTypes.STRING, primaryKey: true, allowNull: false, references: { model: "runs", key: "id" }, onDelete: "CASCADE" },
    engine_version: { type: DataTypes.STRING, allowNull: false },
    input_hash: { type: DataTypes.STRING, allowNull: false },
    result_hash: { type: DataTypes.STRING, allowNull: false },
    result: { type: DataTypes.TEXT, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.createTable("run_result_rows", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    run_id: { type: DataTypes.STRING, allowNull: false, references: { model: "runs", key: "id" }, onDelete: "CASCADE" },
    pathway_id: { type: DataTypes.STRING, allowNull: false },
    variable: { type: DataTypes.STRING, allowNull: false },
    year: { type: DataTypes.INTEGER, allowNull: false },
    statistic: { type: DataTypes.STRING, allowNull: false },
    value: { type: DataTypes.FLOAT, allowNull: true },
  });
  await queryInterface.addIndex("run_result_rows", ["run_id", "pathway_id", "variable", "year"]);
};

export const down: MigrationModule["down"] = async ({ queryInterface }) => {
  await queryInterface.dropTable("run_result_rows");
  await queryInterface.dropTable("run_results");
};
