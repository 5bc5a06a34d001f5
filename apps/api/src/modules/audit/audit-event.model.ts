import { DataTypes, Model, type Sequelize } from "sequelize";

/** One append-only audit row. `data` is stored as JSON text. */
export class AuditEventModel extends Model {
  declare id: number;
  declare actorId: string | null;
  declare actorEmail: string | null;
  declare action: string;
  declare entityType: string;
  declare entityId: string | null;
  declare summary: string;
  declare data: unknown;
  declare createdAt: Date;
}

export class AuditAppendOnlyError extends Error {
  override name = "AuditAppendOnlyError";
  constructor() {
    super("Audit events are append-only: they cannot be updated or deleted.");
  }
}

function refuse(): never {
  throw new AuditAppendOnlyError();
}

export function initAuditEventModel(sequelize: Sequelize): typeof AuditEventModel {
  AuditEventModel.init(
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      actorId: { type: DataTypes.STRING, allowNull: true },
      actorEmail: { type: DataTypes.STRING, allowNull: true },
      action: { type: DataTypes.STRING, allowNull: false },
      entityType: { type: DataTypes.STRING, allowNull: false },
      entityId: { type: DataTypes.STRING, allowNull: true },
      summary: { type: DataTypes.TEXT, allowNull: false },
      data: {
        type: DataTypes.TEXT,
        allowNull: true,
        get(this: AuditEventModel) {
          const raw = this.getDataValue("data") as string | null;
          return raw === null || raw === undefined ? null : (JSON.parse(raw) as unknown);
        },
        set(this: AuditEventModel, value: unknown) {
          this.setDataValue("data", value === undefined || value === null ? null : JSON.stringify(value));
        },
      },
      createdAt: { type: DataTypes.DATE, allowNull: false },
    },
    {
      sequelize,
      tableName: "audit_events",
      modelName: "AuditEvent",
      underscored: true,
      timestamps: true,
      updatedAt: false,
      // Model-level guard; the database triggers from migration 0002 back it up.
      hooks: {
        beforeUpdate: refuse,
        beforeBulkUpdate: refuse,
        beforeDestroy: refuse,
        beforeBulkDestroy: refuse,
        beforeUpsert: refuse,
      },
    },
  );
  return AuditEventModel;
}
