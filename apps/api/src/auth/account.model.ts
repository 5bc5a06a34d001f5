import { DataTypes, Model, type Sequelize } from "sequelize";

/** A credential of a user (better-auth's `account` model); holds the password hash for email sign-in. */
export class AccountModel extends Model {
  declare id: string;
  declare userId: string;
  declare accountId: string;
  declare providerId: string;
  declare password: string | null;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initAccountModel(sequelize: Sequelize): typeof AccountModel {
  AccountModel.init(
    {
      id: { type: DataTypes.STRING, primaryKey: true },
      userId: { type: DataTypes.STRING, allowNull: false },
      accountId: { type: DataTypes.STRING, allowNull: false },
      providerId: { type: DataTypes.STRING, allowNull: false },
      accessToken: { type: DataTypes.TEXT, allowNull: true },
      refreshToken: { type: DataTypes.TEXT, allowNull: true },
      idToken: { type: DataTypes.TEXT, allowNull: true },
      accessTokenExpiresAt: { type: DataTypes.DATE, allowNull: true },
      refreshTokenExpiresAt: { type: DataTypes.DATE, allowNull: true },
      scope: { type: DataTypes.STRING, allowNull: true },
      password: { type: DataTypes.STRING, allowNull: true },
      createdAt: { type: DataTypes.DATE, allowNull: false },
      updatedAt: { type: DataTypes.DATE, allowNull: false },
    },
    { sequelize, tableName: "accounts", modelName: "Account", underscored: true, timestamps: false },
  );
  return AccountModel;
}
