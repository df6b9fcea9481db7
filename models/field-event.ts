import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "./connection";

export class FieldEvent extends Model<InferAttributes<FieldEvent>, InferCreationAttributes<FieldEvent>> {
  declare id: CreationOptional<number>;
  declare organization_id: number;
  declare pad_id: number;
  declare kind: string;
  declare started_at: Date;
  declare ended_at: Date | null;
  declare well_count: number;
  declare summary: string;
  declare created_at: CreationOptional<Date>;
  declare updated_at: CreationOptional<Date>;
}

FieldEvent.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    organization_id: { type: DataTypes.INTEGER, allowNull: false },
    pad_id: { type: DataTypes.INTEGER, allowNull: false },
    kind: { type: DataTypes.STRING(40), allowNull: false },
    started_at: { type: DataTypes.DATE, allowNull: false },
    ended_at: { type: DataTypes.DATE, allowNull: true },
    well_count: { type: DataTypes.INTEGER, allowNull: false },
    summary: { type: DataTypes.TEXT, allowNull: false },
    created_at: DataTypes.DATE,
    updated_at: DataTypes.DATE,
  },
  { sequelize, modelName: "FieldEvent", tableName: "field_events" },
);
