import { DataTypes, Model, type Sequelize } from "sequelize";
import { jsonColumn } from "../db/json-column.js";

export const JOB_STATUSES = ["queued", "running", "succeeded", "failed", "cancelled"] as const;
export type JobStatus = (typeof JOB_STATUSES)[number];

export class JobModel extends Model {
  declare id: string;
  declare type: string;
  declare payload: unknown;
  declare status: JobStatus;
  declare attempts: number;
  declare maxAttempts: number;
  declare cancelRequested: boolean;
  declare progress: number;
  declare lockedBy: string | null;
  declare lockedAt: Date | null;
  declare heartbeatAt: Date | null;
  declare lastError: string | null;
  declare startedAt: Date | null;
  declare finishedAt: Date | null;
  /** QUEUE=bullmq only: when the row was published to BullMQ; null = still to publish (outbox). */
  declare dispatchedAt: Date | null;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initJobModel(sequelize: Sequelize): typeof JobModel {
  JobModel.init(
    {
      id: { type: DataTypes.STRING, primaryKey: true },
      type: { type: DataTypes.STRING, allowNull: false },
      payload: jsonColumn("payload"),
      status: { type: DataTypes.STRING, allowNull: false, defaultValue: "queued" },
      attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      maxAttempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 3 },
      cancelRequested: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      progress: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 0 },
      lockedBy: { type: DataTypes.STRING, allowNull: true },
      lockedAt: { type: DataTypes.DATE, allowNull: true },
      heartbeatAt: { type: DataTypes.DATE, allowNull: true },
      lastError: { type: DataTypes.TEXT, allowNull: true },
      startedAt: { type: DataTypes.DATE, allowNull: true },
      finishedAt: { type: DataTypes.DATE, allowNull: true },
      dispatchedAt: { type: DataTypes.DATE, allowNull: true },
    },
    { sequelize, tableName: "jobs", modelName: "Job", underscored: true },
  );
  return JobModel;
}
