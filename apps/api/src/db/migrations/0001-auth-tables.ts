import { DataTypes } from "sequelize";
import type { MigrationModule } from "../migrate.js";

/**
 * Tables better-auth reads and writes through our Sequelize adapter (user, session, account,
 * verification; the admin plugin adds role/ban columns and session.impersonatedBy).
 * Columns are snake_case; the models map them to better-auth's camelCase fields.
 */
export const up: MigrationModule["up"] = async ({ queryInterface }) => {
  await queryInterface.createTable("users", {
    id: { type: DataTypes.STRING, primaryKey: true, allowNull: false },
    name: { type: DataTypes.STRING, allowNull: false },
    email: { type: DataTypes.STRING, allowNull: false, unique: true },
    email_verified: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    image: { type: DataTypes.STRING, allowNull: true },
    role: { type: DataTypes.STRING, allowNull: false, defaultValue: "analyst" },
    banned: { type: DataTypes.BOOLEAN, allowNull: true, defaultValue: false },
    ban_reason: { type: DataTypes.STRING, allowNull: true },
    ban_expires: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });

  await queryInterface.createTable("sessions", {
    id: { type: DataTypes.STRING, primaryKey: true, allowNull: false },
    user_id: { type: DataTypes.STRING, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
    token: { type: DataTypes.STRING, allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    ip_address: { type: DataTypes.STRING, allowNull: true },
    user_agent: { type: DataTypes.STRING, allowNull: true },
    impersonated_by: { type: DataTypes.STRING, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("sessions", ["user_id"]);

  await queryInterface.createTable("accounts", {
    id: { type: DataTypes.STRING, primaryKey: true, allowNull: false },
    user_id: { type: DataTypes.STRING, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
    account_id: { type: DataTypes.STRING, allowNull: false },
    provider_id: { type: DataTypes.STRING, allowNull: false },
    access_token: { type: DataTypes.TEXT, allowNull: true },
    refresh_token: { type: DataTypes.TEXT, allowNull: true },
    id_token: { type: DataTypes.TEXT, allowNull: true },
    access_token_expires_at: { type: DataTypes.DATE, allowNull: true },
    refresh_token_expires_at: { type: DataTypes.DATE, allowNull: true },
    scope: { type: DataTypes.STRING, allowNull: true },
    password: { type: DataTypes.STRING, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("accounts", ["user_id"]);

  await queryInterface.createTable("verifications", {
    id: { type: DataTypes.STRING, primaryKey: true, allowNull: false },
    identifier: { type: DataTypes.STRING, allowNull: false },
    value: { type: DataTypes.TEXT, allowNull: false },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("verifications", ["identifier"]);
};

export const down: MigrationModule["down"] = async ({ queryInterface }) => {
  await queryInterface.dropTable("verifications");
  await queryInterface.dropTable("accounts");
  await queryInterface.dropTable("sessions");
  await queryInterface.dropTable("users");
};
