import { DataTypes, Model, type Sequelize } from "sequelize";
import type { RunResult } from "@plumeline/contracts";
import { jsonColumn } from "../../db/json-column.js";

/** The engine's full result for a run (one row per run). */
export class RunResultModel extends Model {
  declare runId: string;
  declare engineVersion: string;
  declare inputHash: string;
  declare resultHash: string;
  declare result: RunResult;
  declare createdAt: Date;
}

/** One per-year statistic: (run, pathway, variable, year, statistic) -> value. */
export class RunResultRowModel extends Model {
  declare id: number;
  declare runId: string;
  declare pathwayId: string;
  declare variable: string;
  declare year: number;
  declare statistic: string;
  declare value: number | null;
}

export function initRunResultModel(sequelize: Sequelize): typeof RunResultModel {
  RunResultModel.init(
    {
      runId: { type: DataTypes.STRING, primaryKey: true },
      engineVersion: { type: DataTypes.STRING, allowNull: false },
      inputHash: { type: DataTypes.STRING, allowNull: false },
      resultHash: { type: DataTypes.STRING, allowNull: false },
      result: jsonColumn("result"),
    },
    { sequelize, tableName: "run_results", modelName: "RunResult", underscored: true, updatedAt: false },
  );
  return RunResultModel;
}

export function initRunResultRowModel(sequelize: Sequelize): typeof RunResultRowModel {
  RunResultRowModel.init(
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      runId: { type: DataTypes.STRING, allowNull: false },
      pathwayId: { type: DataTypes.STRING, allowNull: false },
      variable: { type: DataTypes.STRING, allowNull: false },
      year: { type: DataTypes.INTEGER, allowNull: false },
      statistic: { type: DataTypes.STRING, allowNull: false },
      value: { type: DataTypes.FLOAT, allowNull: true },
    },
    { sequelize, tableName: "run_result_rows", modelName: "RunResultRow", underscored: true, timestamps: false },
  );
  return RunResultRowModel;
}
