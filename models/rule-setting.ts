import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "./connection";

export class RuleSetting extends Model<InferAttributes<RuleSetting>, InferCreationAttributes<RuleSetting>> {
  declare id: CreationOptional<number>;
  declare organization_id: number;
  declare field_id: number | null;
  declare well_id: number | null;
  declare settings: Record<string, unknown>;
  declare updated_by: number | null;
  declare created_at: CreationOptional<Date>;
  declare updated_at: CreationOptional<Date>;
}

RuleSetting.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    organization_id: { type: DataTypes.INTEGER, allowNull: false },
    field_id: { type: DataTypes.INTEGER, allowNull: true },
    well_id: { type: DataTypes.INTEGER, allowNull: true },
    settings: { type: DataTypes.JSONB, allowNull: false },
    updated_by: { type: DataTypes.INTEGER, allowNull: true },
    created_at: DataTypes.DATE,
    updated_at: DataTypes.DATE,
  },
  { sequelize, modelName: "RuleSetting", tableName: "rule_settings" },
);
