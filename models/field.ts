import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "./connection";

export class Field extends Model<InferAttributes<Field>, InferCreationAttributes<Field>> {
  declare id: CreationOptional<number>;
  declare organization_id: number;
  declare name: string;
  declare time_zone: CreationOptional<string>;
  declare created_at: CreationOptional<Date>;
  declare updated_at: CreationOptional<Date>;
}

Field.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    organization_id: { type: DataTypes.INTEGER, allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    time_zone: { type: DataTypes.STRING(64), allowNull: false, defaultValue: "UTC" },
    created_at: DataTypes.DATE,
    updated_at: DataTypes.DATE,
  },
  { sequelize, modelName: "Field", tableName: "fields" },
);
