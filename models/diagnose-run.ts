import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "./connection";

export class DiagnoseRun extends Model<InferAttributes<DiagnoseRun>, InferCreationAttributes<DiagnoseRun>> {
  declare id: CreationOptional<number>;
  declare organization_id: number;
  declare requested_by: number | null;
  declare reason: string;
  declare scope: Record<string, unknown>;
  declare status: CreationOptional<"queued" | "running" | "done" | "failed">;
  declare wells_total: CreationOptional<number>;
  declare wells_done: CreationOptional<number>;
  declare issues_opened: CreationOptional<number>;
  declare issues_updated: CreationOptional<number>;
  declare error: CreationOptional<string | null>;
  declare started_at: CreationOptional<Date | null>;
  declare finished_at: CreationOptional<Date | null>;
  declare created_at: CreationOptional<Date>;
  declare updated_at: CreationOptional<Date>;
}

DiagnoseRun.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    organization_id: { type: DataTypes.INTEGER, allowNull: false },
    requested_by: { type: DataTypes.INTEGER, allowNull: true },
    reason: { type: DataTypes.STRING(20), allowNull: false },
    scope: { type: DataTypes.JSONB, allowNull: false },
    status: { type: DataTypes.ENUM("queued", "running", "done", "failed"), allowNull: false, defaultValue: "queued" },
    wells_total: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    wells_done: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    issues_opened: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    issues_updated: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    error: { type: DataTypes.TEXT, allowNull: true },
    started_at: { type: DataTypes.DATE, allowNull: true },
    finished_at: { type: DataTypes.DATE, allowNull: true },
    created_at: DataTypes.DATE,
    updated_at: DataTypes.DATE,
  },
  { sequelize, modelName: "DiagnoseRun", tableName: "diagnose_runs" },
);
