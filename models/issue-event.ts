import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "./connection";

export class IssueEvent extends Model<InferAttributes<IssueEvent>, InferCreationAttributes<IssueEvent>> {
  declare id: CreationOptional<number>;
  declare organization_id: number;
  declare issue_id: number;
  declare user_id: number | null;
  declare kind: string;
  declare from_status: string | null;
  declare to_status: string | null;
  declare data: CreationOptional<Record<string, unknown>>;
  declare created_at: CreationOptional<Date>;
}

IssueEvent.init(
  {
    id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
    organization_id: { type: DataTypes.INTEGER, allowNull: false },
    issue_id: { type: DataTypes.INTEGER, allowNull: false },
    user_id: { type: DataTypes.INTEGER, allowNull: true },
    kind: { type: DataTypes.STRING(40), allowNull: false },
    from_status: { type: DataTypes.STRING(20), allowNull: true },
    to_status: { type: DataTypes.STRING(20), allowNull: true },
    data: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    created_at: DataTypes.DATE,
  },
  { sequelize, modelName: "IssueEvent", tableName: "issue_events", updatedAt: false },
);
