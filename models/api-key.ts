import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "./connection";

/** An organization API key; only its SHA-256 is stored, the key itself is shown once. */
export class ApiKey extends Model<InferAttributes<ApiKey>, InferCreationAttributes<ApiKey>> {
  declare id: CreationOptional<number>;
  declare organization_id: number;
  declare name: string;
  declare prefix: string;
  declare key_hash: string;
  declare created_by: number | null;
  declare last_used_at: Date | null;
  declare revoked_at: Date | null;
  declare created_at: CreationOptional<Date>;
  declare updated_at: CreationOptional<Date>;
}

ApiKey.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    organization_id: { type: DataTypes.INTEGER, allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    prefix: { type: DataTypes.STRING(16), allowNull: false },
    key_hash: { type: DataTypes.STRING(64), allowNull: false },
    created_by: { type: DataTypes.INTEGER, allowNull: true },
    last_used_at: { type: DataTypes.DATE, allowNull: true },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    created_at: DataTypes.DATE,
    updated_at: DataTypes.DATE,
  },
  { sequelize, modelName: "ApiKey", tableName: "api_keys" },
);
