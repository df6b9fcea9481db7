import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "./connection";
import type { ValveKind } from "@/lib/gaslift/types";

export class Mandrel extends Model<InferAttributes<Mandrel>, InferCreationAttributes<Mandrel>> {
  declare id: CreationOptional<number>;
  declare organization_id: number;
  declare well_id: number;
  declare position: number;
  declare md_ft: number;
  declare tvd_ft: number;
  declare kind: ValveKind;
  declare port_in: number | null;
  declare valve_od_in: number | null;
  declare r_ratio: number | null;
  declare tro_psig: number | null;
  declare installed_on: string | null;
  declare created_at: CreationOptional<Date>;
  declare updated_at: CreationOptional<Date>;
}

Mandrel.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    organization_id: { type: DataTypes.INTEGER, allowNull: false },
    well_id: { type: DataTypes.INTEGER, allowNull: false },
    position: { type: DataTypes.INTEGER, allowNull: false },
    md_ft: { type: DataTypes.DOUBLE, allowNull: false },
    tvd_ft: { type: DataTypes.DOUBLE, allowNull: false },
    kind: { type: DataTypes.ENUM("ipo", "orifice", "dummy"), allowNull: false },
    port_in: { type: DataTypes.DOUBLE, allowNull: true },
    valve_od_in: { type: DataTypes.DOUBLE, allowNull: true },
    r_ratio: { type: DataTypes.DOUBLE, allowNull: true },
    tro_psig: { type: DataTypes.DOUBLE, allowNull: true },
    installed_on: { type: DataTypes.DATEONLY, allowNull: true },
    created_at: DataTypes.DATE,
    updated_at: DataTypes.DATE,
  },
  { sequelize, modelName: "Mandrel", tableName: "mandrels" },
);
