import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "./connection";

export class Notification extends Model<InferAttributes<Notification>, InferCreationAttributes<Notification>> {
  declare id: CreationOptional<number>;
  declare organization_id: number;
  declare user_id: number;
  declare kind: string;
  declare title: string;
  declare body: string;
  declare link: string | null;
  declare read_at: CreationOptional<Date | null>;
  declare created_at: CreationOptional<Date>;
}

Notification.init(
  {
    id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
    organization_id: { type: DataTypes.INTEGER, allowNull: false },
    user_id: { type: DataTypes.INTEGER, allowNull: false },
    kind: { type: DataTypes.STRING(40), allowNull: false },
    title: { type: DataTypes.STRING(200), allowNull: false },
    body: { type: DataTypes.TEXT, allowNull: false },
    link: { type: DataTypes.STRING(300), allowNull: true },
    read_at: { type: DataTypes.DATE, allowNull: true },
    created_at: DataTypes.DATE,
  },
  { sequelize, modelName: "Notification", tableName: "notifications", updatedAt: false },
);
