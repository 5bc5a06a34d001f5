import { DataTypes, Model, type Sequelize } from "sequelize";
import { jsonColumn } from "../../db/json-column.js";

/** One firm-wide setting (key -> JSON value), with who changed it last. */
export class SettingModel extends Model {
  declare key: string;
  declare value: unknown;
  declare updatedBy: string | null;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initSettingModel(sequelize: Sequelize): typeof SettingModel {
  SettingModel.init(
    {
      key: { type: DataTypes.STRING, primaryKey: true },
      value: jsonColumn("value"),
      updatedBy: { type: DataTypes.STRING, allowNull: true },
    },
    { sequelize, tableName: "settings", modelName: "Setting", underscored: true },
  );
  return SettingModel;
}
