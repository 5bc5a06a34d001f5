import type { PortfolioRow } from "@plumeline/contracts";
import { DataTypes, Model, type Sequelize } from "sequelize";
import { jsonColumn } from "../../db/json-column.js";

export class PortfolioModel extends Model {
  declare id: string;
  declare name: string;
  declare description: string;
  declare rows: PortfolioRow[];
  declare rowCount: number;
  declare checksum: string;
  declare fileName: string;
  declare createdBy: string;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initPortfolioModel(sequelize: Sequelize): typeof PortfolioModel {
  PortfolioModel.init(
    {
      id: { type: DataTypes.STRING, primaryKey: true },
      name: { type: DataTypes.STRING, allowNull: false },
      description: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
      rows: jsonColumn("rows"),
      rowCount: { type: DataTypes.INTEGER, allowNull: false },
      checksum: { type: DataTypes.STRING(64), allowNull: false },
      fileName: { type: DataTypes.STRING, allowNull: false },
      createdBy: { type: DataTypes.STRING, allowNull: false },
    },
    { sequelize, tableName: "portfolios", modelName: "Portfolio", underscored: true },
  );
  return PortfolioModel;
}
