import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "./connection";

export class SavedFilter extends Model<InferAttributes<SavedFilter>, InferCreationAttributes<SavedFilter>> {
  declare id: CreationOptional<number>;
  declare organization_id: number;
  declare user_id: number;
  declare name: string;
  declare query: string;
  declare created_at: CreationOptional<Date>;
  declare updated_at: CreationOptional<Date>;
}

SavedFilter.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    organization_id: { type: DataTypes.INTEGER, allowNull: false },
    user_id: { type: DataTypes.INTEGER, allowNull: false },
    name: { type: DataTypes.STRING(80), allowNull: false },
    query: { type: DataTypes.STRING(1000), allowNull: false },
    created_at: DataTypes.DATE,
    updated_at: DataTypes.DATE,
  },
  { sequelize, modelName: "SavedFilter", tableName: "saved_filters" },
);
