import { DataTypes } from "sequelize";
import type { MigrationModule } from "../migrate.js";

/** Invited users sign in with a mailed password once, then must choose their own. */
export const up: MigrationModule["up"] = async ({ queryInterface }) => {
  await queryInterface.addColumn("users", "must_change_password", { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });
};

export const down: MigrationModule["down"] = async ({ queryInterface }) => {
  await queryInterface.removeColumn("users", "must_change_password");
};
