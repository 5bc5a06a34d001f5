import { DataTypes, Model, type Sequelize } from "sequelize";
import { jsonColumn } from "../../db/json-column.js";
import type { WorkbookManifest } from "./workbook-builder.js";

/** One file handed out. Rows are only ever inserted. */
export class ExportRecordModel extends Model {
  declare id: string;
  declare runId: string;
  declare format: "csv" | "xlsx" | "pdf" | "zip";
  declare resultTable: string;
  declare fileName: string;
  declare exploratory: boolean;
  declare resultHash: string;
  declare checksum: string;
  declare byteSize: number;
  declare createdBy: string;
  /** The manifest the file was built with; null for exports recorded before it was kept. */
  declare manifest: WorkbookManifest | null;
  declare createdAt: Date;
}

export function initExportRecordModel(sequelize: Sequelize): typeof ExportRecordModel {
  ExportRecordModel.init(
    {
      id: { type: DataTypes.STRING, primaryKey: true },
      runId: { type: DataTypes.STRING, allowNull: false },
      format: { type: DataTypes.STRING, allowNull: false },
      resultTable: { type: DataTypes.STRING, allowNull: false, field: "table_name" },
      fileName: { type: DataTypes.STRING, allowNull: false },
      exploratory: { type: DataTypes.BOOLEAN, allowNull: false },
      resultHash: { type: DataTypes.STRING, allowNull: false },
      checksum: { type: DataTypes.STRING(64), allowNull: false },
      byteSize: { type: DataTypes.INTEGER, allowNull: false },
      createdBy: { type: DataTypes.STRING, allowNull: false },
      manifest: jsonColumn("manifest", { allowNull: true }),
    },
    { sequelize, tableName: "exports", modelName: "ExportRecord", underscored: true, updatedAt: false },
  );
  return ExportRecordModel;
}
