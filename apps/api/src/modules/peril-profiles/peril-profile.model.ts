import type { PerilMetric, PerilScaling } from "@plumeline/contracts";
import { DataTypes, Model, type Sequelize } from "sequelize";
import { jsonColumn } from "../../db/json-column.js";

export class PerilProfileModel extends Model {
  declare id: string;
  declare name: string;
  declare peril: string;
  declare region: string;
  declare metric: PerilMetric;
  declare baselineWarming: number;
  declare scaling: PerilScaling;
  declare source: string | null;
  declare copiedFrom: string | null;
  declare createdBy: string;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initPerilProfileModel(sequelize: Sequelize): typeof PerilProfileModel {
  PerilProfileModel.init(
    {
      id: { type: DataTypes.STRING, primaryKey: true },
      name: { type: DataTypes.STRING, allowNull: false },
      peril: { type: DataTypes.STRING, allowNull: false },
      region: { type: DataTypes.STRING, allowNull: false },
      metric: { type: DataTypes.STRING, allowNull: false },
      baselineWarming: { type: DataTypes.FLOAT, allowNull: false },
      scaling: jsonColumn("scaling"),
      source: { type: DataTypes.TEXT, allowNull: true },
      copiedFrom: { type: DataTypes.STRING, allowNull: true },
      createdBy: { type: DataTypes.STRING, allowNull: false },
    },
    { sequelize, tableName: "peril_profiles", modelName: "PerilProfile", underscored: true },
  );
  return PerilProfileModel;
}
