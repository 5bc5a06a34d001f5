import { DataTypes } from "sequelize";
import type { MigrationModule } from "../migrate.js";

/**
 * Append-only audit trail. No foreign key on actor_id: deleting a user must never rewrite
 * history. Triggers refuse UPDATE and DELETE in the database itself, so no code path (raw
 * SQL included) can alter a row once written.
 */
export const up: MigrationModule["up"] = async ({ queryInterface, sequelize }) => {
  await queryInterface.createTable("audit_events", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    actor_id: { type: DataTypes.STRING, allowNull: true },
    actor_email: { type: DataTypes.STRING, allowNull: true },
    action: { type: DataTypes.STRING, allowNull: false },
    entity_type: { type: DataTypes.STRING, allowNull: false },
    entity_id: { type: DataTypes.STRING, allowNull: true },
    summary: { type: DataTypes.TEXT, allowNull: false },
    data: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("audit_events", ["created_at"]);
  await queryInterface.addIndex("audit_events", ["action"]);
  await queryInterface.addIndex("audit_events", ["entity_type", "entity_id"]);
  await queryInterface.addIndex("audit_events", ["actor_id"]);
  await sequelize.query(
    "CREATE TRIGGER audit_events_no_update BEFORE UPDATE ON audit_events BEGIN SELECT RAISE(ABORT, 'audit_events is append-only'); END",
  );
  await sequelize.query(
    "CREATE TRIGGER audit_events_no_delete BEFORE DELETE ON audit_events BEGIN SELECT RAISE(ABORT, 'audit_events is append-only'); END",
  );
};

export const down: MigrationModule["down"] = async ({ queryInterface, sequelize }) => {
  await sequelize.query("DROP TRIGGER IF EXISTS audit_events_no_delete");
  await sequelize.query("DROP TRIGGER IF EXISTS audit_events_no_update");
  await queryInterface.dropTable("audit_events");
};
