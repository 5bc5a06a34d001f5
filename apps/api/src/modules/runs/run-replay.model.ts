import { DataTypes, Model, type Sequelize } from "sequelize";
import type { RunStatus } from "@plumeline/contracts";

/** One replay of a run (queued like a run; see replays.service.ts). */
export class RunReplayModel extends Model {
  declare id: string;
  declare runId: string;
  declare jobId: string | null;
  declare requestedBy: string;
  declare status: RunStatus;
  declare progress: number;
  declare resultHash: string | null;
  declare replayHash: string | null;
  declare matched: boolean | null;
  declare engineVersion: string | null;
  declare error: string | null;
  declare startedAt: Date | null;
  declare finishedAt: Date | null;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initRunReplayModel(sequelize: Sequelize): typeof RunReplayModel {
  RunReplayModel.init(
    {
      id: { type: DataTypes.STRING, primaryKey: true },
      runId: { type: DataTypes.STRING, allowNull: false },
      jobId: { type: DataTypes.STRING, allowNull: true },
      requestedBy: { type: DataTypes.STRING, allowNull: false },
      status: { type: DataTypes.STRING, allowNull: false },
      progress: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 0 },
      resultHash: { type: DataTypes.STRING, allowNull: true },
      replayHash: { type: DataTypes.STRING, allowNull: true },
      matched: { type: DataTypes.BOOLEAN, allowNull: true },
      engineVersion: { type: DataTypes.STRING, allowNull: true },
      error: { type: DataTypes.TEXT, allowNull: true },
      startedAt: { type: DataTypes.DATE, allowNull: true },
      finishedAt: { type: DataTypes.DATE, allowNull: true },
    },
    { sequelize, tableName: "run_replays", modelName: "RunReplay", underscored: true },
  );
  return RunReplayModel;
}
