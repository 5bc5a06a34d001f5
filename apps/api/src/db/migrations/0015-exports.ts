import { DataTypes } from "sequelize";
import type { MigrationModule } from "../migrate.js";

/** Every file handed out (CSV table or XLSX workbook): who, when, which run, and its checksum. */
export const up: MigrationModule["up"] = async ({ queryInterface }) => {
  await queryInterface.createTable("exports", {
    id: { type: DataTypes.STRING, primaryKey: true, allowNull: false },
    run_id: { type: DataTypes.STRING, allowNull: false, references: { model: "runs", key: "id" } },
    format: { type: DataTypes.STRING, allowNull: false },
    table_name: { type: DataTypes.STRING, allowNull: false },
    file_name: { type: DataTypes.STRING, allowNull: false },
    exploratory: { type: DataTypes.BOOLEAN, allowNull: false },
    result_hash: { type: DataTypes.STRING, allowNull: false },
    checksum: { type: DataTypes.STRING(64), allowNull: false },
    byte_size: { type: DataTypes.INTEGER, allowNull: false },
    created_by: { type: DataTypes.STRING, allowNull: false, references: { model: "users", key: "id" } },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("exports", ["created_at"]);
  await queryInterface.addIndex("exports", ["run_id"]);
  await queryInterface.addIndex("exports", ["created_by"]);
};

export const down: MigrationModule["down"] = async ({ queryInterface }) => {
  await queryInterface.dropTable("exports");
};
