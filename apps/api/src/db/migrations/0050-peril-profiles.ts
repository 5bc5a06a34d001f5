import { DataTypes } from "sequelize";
import type { MigrationModule } from "../migrate.js";

/**
 * Peril profiles (peril lens). `scaling` holds the engine's scaling object as JSON. Whether a
 * profile is locked is not stored: it is read from the model versions and runs that name it
 * (their `peril_profile_ids`), so it can never drift from the records that depend on it.
 */
export const up: MigrationModule["up"] = async ({ queryInterface }) => {
  await queryInterface.createTable("peril_profiles", {
    id: { type: DataTypes.STRING, primaryKey: true, allowNull: false },
    name: { type: DataTypes.STRING, allowNull: false },
    peril: { type: DataTypes.STRING, allowNull: false },
    region: { type: DataTypes.STRING, allowNull: false },
    metric: { type: DataTypes.STRING, allowNull: false },
    baseline_warming: { type: DataTypes.FLOAT, allowNull: false },
    scaling: { type: DataTypes.TEXT, allowNull: false },
    source: { type: DataTypes.TEXT, allowNull: true },
    copied_from: { type: DataTypes.STRING, allowNull: true },
    created_by: { type: DataTypes.STRING, allowNull: false, references: { model: "users", key: "id" } },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("peril_profiles", ["peril", "region"]);
};

export const down: MigrationModule["down"] = async ({ queryInterface }) => {
  await queryInterface.dropTable("peril_profiles");
};
