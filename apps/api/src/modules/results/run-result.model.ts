import { DataTypes, Model, type Sequelize } from "sequelize";

/** The engine's full result for a run, as one compressed document (result-document.ts); one row per run. */
export class RunResultModel extends Model {
  declare runId: string;
  declare engineVersion: string;
  declare inputHash: string;
  declare resultHash: string;
  declare encoding: string;
  declare jsonBytes: number;
  declare document: Buffer;
  declare createdAt: Date;
}

export function initRunResultModel(sequelize: Sequelize): typeof RunResultModel {
  RunResultModel.init(
    {
      runId: { type: DataTypes.STRING, primaryKey: true },
      engineVersion: { type: DataTypes.STRING, allowNull: false },
      inputHash: { type: DataTypes.STRING, allowNull: false },
      resultHash: { type: DataTypes.STRING, allowNull: false },
      encoding: { type: DataTypes.STRING, allowNull: false },
      jsonBytes: { type: DataTypes.INTEGER, allowNull: false },
      document: { type: DataTypes.BLOB, allowNull: false },
    },
    { sequelize, tableName: "run_result_documents", modelName: "RunResult", underscored: true, updatedAt: false },
  );
  return RunResultModel;
}
