import { DataTypes, Model, type Sequelize } from "sequelize";
import type { ChangeClass, ModelSpec, ModelVersionDefaults, ModelVersionStatus } from "@plumeline/contracts";
import { jsonColumn } from "../../db/json-column.js";

export class ModelVersionModel extends Model {
  declare id: string;
  declare familyId: string;
  declare versionNumber: number;
  declare name: string;
  declare status: ModelVersionStatus;
  declare parentId: string | null;
  declare model: ModelSpec;
  declare defaults: ModelVersionDefaults;
  declare notes: string;
  declare pathwayIds: string[];
  declare perilProfileIds: string[];
  declare changeClass: ChangeClass | null;
  declare submissionNote: string | null;
  declare authorId: string;
  declare submittedAt: Date | null;
  declare decidedBy: string | null;
  declare decidedAt: Date | null;
  declare decisionComment: string | null;
  declare retiredBy: string | null;
  declare retiredAt: Date | null;
  declare retireComment: string | null;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initModelVersionModel(sequelize: Sequelize): typeof ModelVersionModel {
  ModelVersionModel.init(
    {
      id: { type: DataTypes.STRING, primaryKey: true },
      familyId: { type: DataTypes.STRING, allowNull: false },
      versionNumber: { type: DataTypes.INTEGER, allowNull: false },
      name: { type: DataTypes.STRING, allowNull: false },
      status: { type: DataTypes.STRING, allowNull: false, defaultValue: "draft" },
      parentId: { type: DataTypes.STRING, allowNull: true },
      model: jsonColumn("model"),
      defaults: jsonColumn("defaults"),
      notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
      pathwayIds: jsonColumn("pathwayIds"),
      perilProfileIds: jsonColumn("perilProfileIds"),
      changeClass: { type: DataTypes.STRING, allowNull: true },
      submissionNote: { type: DataTypes.TEXT, allowNull: true },
      authorId: { type: DataTypes.STRING, allowNull: false },
      submittedAt: { type: DataTypes.DATE, allowNull: true },
      decidedBy: { type: DataTypes.STRING, allowNull: true },
      decidedAt: { type: DataTypes.DATE, allowNull: true },
      decisionComment: { type: DataTypes.TEXT, allowNull: true },
      retiredBy: { type: DataTypes.STRING, allowNull: true },
      retiredAt: { type: DataTypes.DATE, allowNull: true },
      retireComment: { type: DataTypes.TEXT, allowNull: true },
    },
    { sequelize, tableName: "model_versions", modelName: "ModelVersion", underscored: true },
  );
  return ModelVersionModel;
}
