import { DataTypes } from "sequelize";
import type { MigrationModule } from "../migrate.js";

/**
 * Firm-wide settings an admin changes at run time, one row per key (first: "materiality", the
 * thresholds a minor change must stay under). No row means the documented defaults apply, so
 * `down` loses only what admins chose, never a value the code needs.
 */
export const up: MigrationModule["up"] = async ({ queryInterface }) => {
  await queryInterface.createTable("settings", {
    key: { type: DataTypes.STRING, primaryKey: true, allowNull: false },
    value: { type: DataTypes.TEXT, allowNull: false },
    updated_by: { type: DataTypes.STRING, allowNull: true, references: { model: "users", key: "id" } },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
};

export const down: MigrationModule["down"] = async ({ queryInterface }) => {
  await queryInterface.dropTable("settings");
};
