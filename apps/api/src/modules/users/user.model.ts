import { DataTypes, Model, type Sequelize } from "sequelize";
import type { Role } from "@plumeline/contracts";

/** A person who signs in. Written by better-auth (through the adapter) and by the users service. */
export class UserModel extends Model {
  declare id: string;
  declare name: string;
  declare email: string;
  declare emailVerified: boolean;
  declare image: string | null;
  declare role: Role;
  declare banned: boolean | null;
  declare banReason: string | null;
  declare banExpires: Date | null;
  /** Set on invitation: the mailed password opens only GET /api/me and the password change. */
  declare mustChangePassword: boolean;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initUserModel(sequelize: Sequelize): typeof UserModel {
  UserModel.init(
    {
      id: { type: DataTypes.STRING, primaryKey: true },
      name: { type: DataTypes.STRING, allowNull: false },
      email: { type: DataTypes.STRING, allowNull: false, unique: true },
      emailVerified: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      image: { type: DataTypes.STRING, allowNull: true },
      role: { type: DataTypes.STRING, allowNull: false, defaultValue: "analyst" },
      banned: { type: DataTypes.BOOLEAN, allowNull: true, defaultValue: false },
      banReason: { type: DataTypes.STRING, allowNull: true },
      banExpires: { type: DataTypes.DATE, allowNull: true },
      mustChangePassword: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      createdAt: { type: DataTypes.DATE, allowNull: false },
      updatedAt: { type: DataTypes.DATE, allowNull: false },
    },
    // better-auth sets createdAt/updatedAt itself, so Sequelize must not manage them.
    { sequelize, tableName: "users", modelName: "User", underscored: true, timestamps: false },
  );
  return UserModel;
}
