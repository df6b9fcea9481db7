import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "./connection";
import type { Role } from "@/lib/auth/roles";

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare organization_id: number;
  declare email: string;
  declare name: string;
  declare password_hash: string | null;
  declare role: Role;
  declare active: CreationOptional<boolean>;
  declare unit_system: CreationOptional<"oilfield" | "metric">;
  declare preferences: CreationOptional<Record<string, unknown>>;
  declare created_at: CreationOptional<Date>;
  declare updated_at: CreationOptional<Date>;
}

User.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    organization_id: { type: DataTypes.INTEGER, allowNull: false },
    email: { type: DataTypes.STRING(254), allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: true },
    role: { type: DataTypes.ENUM("admin", "analyst", "engineer", "operator"), allowNull: false },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    unit_system: { type: DataTypes.ENUM("oilfield", "metric"), allowNull: false, defaultValue: "oilfield" },
    preferences: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    created_at: DataTypes.DATE,
    updated_at: DataTypes.DATE,
  },
  { sequelize, modelName: "User", tableName: "users" },
);
