import { DataTypes, Model, type Sequelize } from "sequelize";

/** A short-lived token better-auth keeps (e.g. password reset); better-auth's `verification` model. */
export class VerificationModel extends Model {
  declare id: string;
  declare identifier: string;
  declare value: string;
  declare expiresAt: Date;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initVerificationModel(sequelize: Sequelize): typeof VerificationModel {
  VerificationModel.init(
    {
      id: { type: DataTypes.STRING, primaryKey: true },
      identifier: { type: DataTypes.STRING, allowNull: false },
      value: { type: DataTypes.TEXT, allowNull: false },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      createdAt: { type: DataTypes.DATE, allowNull: false },
      updatedAt: { type: DataTypes.DATE, allowNull: false },
    },
    { sequelize, tableName: "verifications", modelName: "Verification", underscored: true, timestamps: false },
  );
  return VerificationModel;
}
