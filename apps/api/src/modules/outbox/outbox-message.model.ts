import { DataTypes, Model, type Sequelize } from "sequelize";

/** A mail the embedded SMTP server received. `to` is stored as JSON text. */
export class OutboxMessageModel extends Model {
  declare id: number;
  declare messageId: string | null;
  declare from: string;
  declare to: string[];
  declare subject: string;
  declare text: string;
  declare html: string | null;
  declare receivedAt: Date;
}

export function initOutboxMessageModel(sequelize: Sequelize): typeof OutboxMessageModel {
  OutboxMessageModel.init(
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      messageId: { type: DataTypes.STRING, allowNull: true },
      from: { type: DataTypes.STRING, allowNull: false, field: "from_address" },
      to: {
        type: DataTypes.TEXT,
        allowNull: false,
        field: "to_addresses",
        get(this: OutboxMessageModel) {
          return JSON.parse(this.getDataValue("to") as string) as string[];
        },
        set(this: OutboxMessageModel, value: string[]) {
          this.setDataValue("to", JSON.stringify(value));
        },
      },
      subject: { type: DataTypes.STRING, allowNull: false },
      text: { type: DataTypes.TEXT, allowNull: false },
      html: { type: DataTypes.TEXT, allowNull: true },
      receivedAt: { type: DataTypes.DATE, allowNull: false },
    },
    { sequelize, tableName: "outbox_messages", modelName: "OutboxMessage", underscored: true, timestamps: false },
  );
  return OutboxMessageModel;
}
