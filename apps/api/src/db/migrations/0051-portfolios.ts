import { DataTypes } from "sequelize";
import type { MigrationModule } from "../migrate.js";

/**
 * Portfolio baselines (peril lens): the rows of one upload as JSON, with the SHA-256 of their
 * canonical form. Portfolios are never edited (a new figure set is a new upload), so a run
 * that copied a portfolio's rows can always be traced back by checksum.
 */
export const up: MigrationModule["up"] = async ({ queryInterface }) => {
  await queryInterface.createTable("portfolios", {
    id: { type: DataTypes.STRING, primaryKey: true, allowNull: false },
    name: { type: DataTypes.STRING, allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
    rows: { type: DataTypes.TEXT, allowNull: false },
    row_count: { type: DataTypes.INTEGER, allowNull: false },
    checksum: { type: DataTypes.STRING(64), allowNull: false },
    file_name: { type: DataTypes.STRING, allowNull: false },
    created_by: { type: DataTypes.STRING, allowNull: false, references: { model: "users", key: "id" } },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("portfolios", ["created_at"]);
  await queryInterface.addIndex("portfolios", ["checksum"]);
};

export const down: MigrationModule["down"] = async ({ queryInterface }) => {
  await queryInterface.dropTable("portfolios");
};
