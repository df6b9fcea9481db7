import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "./connection";

export class IssueAttachment extends Model<InferAttributes<IssueAttachment>, InferCreationAttributes<IssueAttachment>> {
  declare id: CreationOptional<number>;
  declare organization_id: number;
  declare issue_id: number;
  declare user_id: number | null;
  declare file_name: string;
  declare content_type: string;
  declare byte_size: number;
  declare storage_key: string;
  declare created_at: CreationOptional<Date>;
}

IssueAttachment.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    organization_id: { type: DataTypes.INTEGER, allowNull: false },
    issue_id: { type: DataTypes.INTEGER, allowNull: false },
    user_id: { type: DataTypes.INTEGER, allowNull: true },
    file_name: { type: DataTypes.STRING(200), allowNull: false },
    content_type: { type: DataTypes.STRING(60), allowNull: false },
    byte_size: { type: DataTypes.INTEGER, allowNull: false },
    storage_key: { type: DataTypes.STRING(300), allowNull: false },
    created_at: DataTypes.DATE,
  },
  { sequelize, modelName: "IssueAttachment", tableName: "issue_attachments", updatedAt: false },
);
