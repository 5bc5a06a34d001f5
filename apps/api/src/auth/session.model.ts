import { DataTypes, Model, type Sequelize } from "sequelize";

/** A signed-in browser session (better-auth's `session` model). */
export class SessionModel extends Model {
  declare id: string;
  declare userId: string;
  declare token: string;
  declare expiresAt: Date;
  declare ipAddress: string | null;
  declare userAgent: string | null;
  declare impersonatedBy: string | null;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initSessionModel(sequelize: Sequelize): typeof SessionModel {
  SessionModel.init(
    {
      id: { type: DataTypes.STRING, primaryKey: true },
      userId: { type: DataTypes.STRING, allowNull: false },
      token: { type: DataTypes.STRING, allowNull: false, unique: true },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      ipAddress: { type: DataTypes.STRING, allowNull: true },
      userAgent: { type: DataTypes.STRING, allowNull: true },
      impersonatedBy: { type: DataTypes.STRING, allowNull: true },
      createdAt: { type: DataTypes.DATE, allowNull: false },
      updatedAt: { type: DataTypes.DATE, allowNull: false },
    },
    { sequelize, tableName: "sessions", modelName: "Session", underscored: true, timestamps: false },
  );
  return SessionModel;
}
