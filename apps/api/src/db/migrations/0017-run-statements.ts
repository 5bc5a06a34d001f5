import { DataTypes } from "sequelize";
import type { MigrationModule } from "../migrate.js";

/** Reliance and limitation statements recorded with a run's results. Rows are only ever inserted. */
export const up: MigrationModule["up"] = async ({ queryInterface }) => {
  await queryInterface.createTable("run_statements", {
    id: { type: DataTypes.STRING, primaryKey: true, allowNull: false },
    run_id: { type: DataTypes.STRING, allowNull: false, references: { model: "runs", key: "id" } },
    kind: { type: DataTypes.STRING, allowNull: false },
    text: { type: DataTypes.TEXT, allowNull: false },
    created_by: { type: DataTypes.STRING, allowNull: false, references: { model: "users", key: "id" } },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("run_statements", ["run_id", "created_at"]);
};

export const down: MigrationModule["down"] = async ({ queryInterface }) => {
  await queryInterface.dropTable("run_statements");
};
