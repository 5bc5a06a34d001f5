import { DataTypes, Model, type Sequelize } from "sequelize";
import type { PathwaySeries } from "./pathway-table.js";
import { jsonColumn } from "../../db/json-column.js";

export class PathwayModel extends Model {
  declare id: string;
  declare name: string;
  declare description: string;
  declare source: string;
  declare vintage: string;
  declare startYear: number;
  declare endYear: number;
  declare agents: PathwaySeries;
  declare checksum: string;
  declare locked: boolean;
  declare createdBy: string;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initPathwayModel(sequelize: Sequelize): typeof PathwayModel {
  PathwayModel.init(
    {
      id: { type: DataTypes.STRING, primaryKey: true },
      name: { type: DataTypes.STRING, allowNull: false },
      description: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
      source: { type: DataTypes.TEXT, allowNull: false },
      vintage: { type: DataTypes.STRING, allowNull: false },
      startYear: { type: DataTypes.INTEGER, allowNull: false },
      endYear: { type: DataTypes.INTEGER, allowNull: false },
      agents: jsonColumn("agents"),
      checksum: { type: DataTypes.STRING(64), allowNull: false },
      locked: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      createdBy: { type: DataTypes.STRING, allowNull: false },
    },
    { sequelize, tableName: "pathways", modelName: "Pathway", underscored: true },
  );
  return PathwayModel;
}
