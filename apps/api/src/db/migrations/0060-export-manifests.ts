import { DataTypes } from "sequelize";
import type { MigrationModule } from "../migrate.js";

/**
 * What a file said about its run when it was handed out (model version status, statements,
 * exporter, time), so a past export can be rebuilt byte for byte from the stored result and
 * checked against its checksum. Null for exports recorded before this column existed.
 */
export const up: MigrationModule["up"] = async ({ queryInterface }) => {
  await queryInterface.addColumn("exports", "manifest", { type: DataTypes.TEXT, allowNull: true });
};

export const down: MigrationModule["down"] = async ({ queryInterface }) => {
  await queryInterface.removeColumn("exports", "manifest");
};
