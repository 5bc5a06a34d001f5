import { DataTypes } from "sequelize";
import type { MigrationModule } from "../migrate.js";

/** Mail received by the embedded SMTP server, readable by admins in the app. */
export const up: MigrationModule["up"] = async ({ queryInterface }) => {
  await queryInterface.createTable("outbox_messages", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    message_id: { type: DataTypes.STRING, allowNull: true },
    from_address: { type: DataTypes.STRING, allowNull: false },
    to_addresses: { type: DataTypes.TEXT, allowNull: false },
    subject: { type: DataTypes.STRING, allowNull: false },
    text: { type: DataTypes.TEXT, allowNull: false },
    html: { type: DataTypes.TEXT, allowNull: true },
    received_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("outbox_messages", ["received_at"]);
};

export const down: MigrationModule["down"] = async ({ queryInterface }) => {
  await queryInterface.dropTable("outbox_messages");
};
