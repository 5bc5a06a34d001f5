import { DataTypes } from "sequelize";
import type { MigrationModule } from "../migrate.js";

/**
 * Forcing pathways. `agents` holds the engine's series object as JSON; `checksum` is the
 * SHA-256 of its canonical form. `locked` turns on for good once a run or an approved model
 * version uses the pathway (a change then needs a new pathway).
 */
export const up: MigrationModule["up"] = async ({ queryInterface }) => {
  await queryInterface.createTable("pathways", {
    id: { type: DataTypes.STRING, primaryKey: true, allowNull: false },
    name: { type: DataTypes.STRING, allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
    source: { type: DataTypes.TEXT, allowNull: false },
    vintage: { type: DataTypes.STRING, allowNull: false },
    start_year: { type: DataTypes.INTEGER, allowNull: false },
    end_year: { type: DataTypes.INTEGER, allowNull: false },
    agents: { type: DataTypes.TEXT, allowNull: false },
    checksum: { type: DataTypes.STRING(64), allowNull: false },
    locked: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    created_by: { type: DataTypes.STRING, allowNull: false, references: { model: "users", key: "id" } },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("pathways", ["created_at"]);
  await queryInterface.addIndex("pathways", ["checksum"]);
};

export const down: MigrationModule["down"] = async ({ queryInterface }) => {
  await queryInterface.dropTable("pathways");
};
