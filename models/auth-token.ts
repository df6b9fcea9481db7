import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "./connection";

export class AuthToken extends Model<InferAttributes<AuthToken>, InferCreationAttributes<AuthToken>> {
  declare id: CreationOptional<number>;
  declare organization_id: number;
  declare user_id: number;
  declare purpose: "invite" | "reset";
  declare token_hash: string;
  declare expires_at: Date;
  declare used_at: Date | null;
  declare created_at: CreationOptional<Date>;
}

AuthToken.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    organization_id: { type: DataTypes.INTEGER, allowNull: false },
    user_id: { type: DataTypes.INTEGER, allowNull: false },
    purpose: { type: DataTypes.ENUM("invite", "reset"), allowNull: false },
    token_hash: { type: DataTypes.STRING(64), allowNull: false },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: DataTypes.DATE,
  },
  { sequelize, modelName: "AuthToken", tableName: "auth_tokens", updatedAt: false },
);
