import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "./connection";

export const ISSUE_STATUSES = ["new", "acknowledged", "assigned", "resolved", "verified", "recurred", "dismissed", "shelved"] as const;
export type IssueStatus = (typeof ISSUE_STATUSES)[number];
/** Statuses in which the diagnostics still extend the issue instead of opening a new one. */
export const LIVE_STATUSES: IssueStatus[] = ["new", "acknowledged", "assigned", "recurred", "shelved"];

export class Issue extends Model<InferAttributes<Issue>, InferCreationAttributes<Issue>> {
  declare id: CreationOptional<number>;
  declare organization_id: number;
  declare well_id: number;
  declare rule: string;
  declare status: CreationOptional<IssueStatus>;
  declare severity: number;
  declare confidence: number;
  declare started_at: Date;
  declare last_seen_at: Date;
  declare ended_at: Date | null;
  declare production_at_risk: CreationOptional<number>;
  declare production_at_risk_unit: CreationOptional<string>;
  declare production_at_risk_method: string | null;
  declare summary: string;
  declare evidence: CreationOptional<unknown>;
  declare annotations: CreationOptional<unknown>;
  declare assignee_id: CreationOptional<number | null>;
  declare priority: CreationOptional<"low" | "normal" | "high" | "urgent" | null>;
  declare due_on: CreationOptional<string | null>;
  declare resolved_action: CreationOptional<string | null>;
  declare resolved_note: CreationOptional<string | null>;
  declare resolved_at: CreationOptional<Date | null>;
  declare resolved_by: CreationOptional<number | null>;
  declare dismiss_reason: CreationOptional<"false_alarm" | "known_accepted" | "data_problem" | null>;
  declare shelved_until: CreationOptional<Date | null>;
  declare recurrence_count: CreationOptional<number>;
  declare created_at: CreationOptional<Date>;
  declare updated_at: CreationOptional<Date>;
}

Issue.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    organization_id: { type: DataTypes.INTEGER, allowNull: false },
    well_id: { type: DataTypes.INTEGER, allowNull: false },
    rule: { type: DataTypes.STRING(40), allowNull: false },
    status: { type: DataTypes.ENUM(...ISSUE_STATUSES), allowNull: false, defaultValue: "new" },
    severity: { type: DataTypes.INTEGER, allowNull: false },
    confidence: { type: DataTypes.DOUBLE, allowNull: false },
    started_at: { type: DataTypes.DATE, allowNull: false },
    last_seen_at: { type: DataTypes.DATE, allowNull: false },
    ended_at: { type: DataTypes.DATE, allowNull: true },
    production_at_risk: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
    production_at_risk_unit: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "bbl/d" },
    production_at_risk_method: { type: DataTypes.TEXT, allowNull: true },
    summary: { type: DataTypes.TEXT, allowNull: false },
    evidence: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    annotations: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    assignee_id: { type: DataTypes.INTEGER, allowNull: true },
    priority: { type: DataTypes.ENUM("low", "normal", "high", "urgent"), allowNull: true },
    due_on: { type: DataTypes.DATEONLY, allowNull: true },
    resolved_action: { type: DataTypes.STRING(80), allowNull: true },
    resolved_note: { type: DataTypes.TEXT, allowNull: true },
    resolved_at: { type: DataTypes.DATE, allowNull: true },
    resolved_by: { type: DataTypes.INTEGER, allowNull: true },
    dismiss_reason: { type: DataTypes.ENUM("false_alarm", "known_accepted", "data_problem"), allowNull: true },
    shelved_until: { type: DataTypes.DATE, allowNull: true },
    recurrence_count: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    created_at: DataTypes.DATE,
    updated_at: DataTypes.DATE,
  },
  { sequelize, modelName: "Issue", tableName: "issues" },
);
