import { DataTypes, Model, type Sequelize } from "sequelize";
import type { RunStatementKind } from "@plumeline/contracts";

/** A reliance or limitation statement recorded with a run. Rows are only ever inserted. */
export class RunStatementModel extends Model {
  declare id: string;
  declare runId: string;
  declare kind: RunStatementKind;
  declare text: string;
  declare createdBy: string;
  declare createdAt: Date;
}

export function initRunStatementModel(sequelize: Sequelize): typeof RunStatementModel {
  RunStatementModel.init(
    {
      id: { type: DataTypes.STRING, primaryKey: true },
      runId: { type: DataTypes.STRING, allowNull: false },
      kind: { type: DataTypes.STRING, allowNull: false },
      text: { type: DataTypes.TEXT, allowNull: false },
      createdBy: { type: DataTypes.STRING, allowNull: false },
    },
    { sequelize, tableName: "run_statements", modelName: "RunStatement", underscored: true, updatedAt: false },
  );
  return RunStatementModel;
}
