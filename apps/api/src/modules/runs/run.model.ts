import { DataTypes, Model, type Sequelize } from "sequelize";
import type { RunSpec, RunStatus } from "@plumeline/contracts";
import { jsonColumn } from "../../db/json-column.js";

export class RunModel extends Model {
  declare id: string;
  declare name: string;
  declare modelVersionId: string;
  declare pathwayIds: string[];
  declare members: number;
  declare seed: string;
  declare sampling: "latin-hypercube" | "monte-carlo";
  declare spec: RunSpec;
  declare inputHash: string;
  declare jobId: string | null;
  declare exploratory: boolean;
  declare status: RunStatus;
  declare progress: number;
  declare engineVersion: string | null;
  declare resultHash: string | null;
  declare error: string | null;
  declare perilProfileIds: string[];
  declare portfolioId: string | null;
  declare createdBy: string;
  declare startedAt: Date | null;
  declare finishedAt: Date | null;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initRunModel(sequelize: Sequelize): typeof RunModel {
  RunModel.init(
    {
      id: { type: DataTypes.STRING, primaryKey: true },
      name: { type: DataTypes.STRING, allowNull: false },
      modelVersionId: { type: DataTypes.STRING, allowNull: false },
      pathwayIds: jsonColumn("pathwayIds"),
      members: { type: DataTypes.INTEGER, allowNull: false },
      seed: { type: DataTypes.STRING, allowNull: false },
      sampling: { type: DataTypes.STRING, allowNull: false },
      spec: jsonColumn("spec"),
      inputHash: { type: DataTypes.STRING(64), allowNull: false },
      jobId: { type: DataTypes.STRING, allowNull: true },
      exploratory: { type: DataTypes.BOOLEAN, allowNull: false },
      status: { type: DataTypes.STRING, allowNull: false, defaultValue: "queued" },
      progress: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 0 },
      engineVersion: { type: DataTypes.STRING, allowNull: true },
      resultHash: { type: DataTypes.STRING, allowNull: true },
      error: { type: DataTypes.TEXT, allowNull: true },
      perilProfileIds: jsonColumn("perilProfileIds"),
      portfolioId: { type: DataTypes.STRING, allowNull: true },
      createdBy: { type: DataTypes.STRING, allowNull: false },
      startedAt: { type: DataTypes.DATE, allowNull: true },
      finishedAt: { type: DataTypes.DATE, allowNull: true },
    },
    { sequelize, tableName: "runs", modelName: "Run", underscored: true },
  );
  return RunModel;
}
