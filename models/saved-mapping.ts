import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "./connection";

/** A mapping saved under a name (table `mappings`); `definition` is a MappingSchema object. */
export class SavedMapping extends Model<InferAttributes<SavedMapping>, InferCreationAttributes<SavedMapping>> {
  declare id: CreationOptional<number>;
  declare organization_id: number;
  declare name: string;
  declare header_shape: string;
  declare layout: "long" | "wide";
  declare definition: unknown;
  declare created_at: CreationOptional<Date>;
  declare updated_at: CreationOptional<Date>;
}

SavedMapping.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    organization_id: { type: DataTypes.INTEGER, allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    header_shape: { type: DataTypes.STRING(128), allowNull: false },
    layout: { type: DataTypes.ENUM("long", "wide"), allowNull: false },
    definition: { type: DataTypes.JSONB, allowNull: false },
    created_at: DataTypes.DATE,
    updated_at: DataTypes.DATE,
  },
  { sequelize, modelName: "SavedMapping", tableName: "mappings" },
);
