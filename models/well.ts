import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "./connection";

export type WellStatus = "producing" | "kicking_off" | "shut_in" | "suspended";

export class Well extends Model<InferAttributes<Well>, InferCreationAttributes<Well>> {
  declare id: CreationOptional<number>;
  declare organization_id: number;
  declare pad_id: number;
  declare name: string;
  declare uwi: string;
  declare status: CreationOptional<WellStatus>;
  declare time_zone: CreationOptional<string>;
  declare tubing_id_in: number;
  declare tubing_depth_ft: number;
  declare perf_depth_ft: number;
  declare surface_temp_f: number;
  declare bottomhole_temp_f: number;
  declare gas_sg: number;
  declare liquid_type: "oil" | "water" | "condensate";
  declare liquid_gravity: number;
  declare water_cut: number;
  declare reservoir_pressure_psig: number;
  declare injection_pressure_psig: number;
  declare created_at: CreationOptional<Date>;
  declare updated_at: CreationOptional<Date>;
}

// A fresh object per column: Sequelize writes into attribute definitions.
const num = () => ({ type: DataTypes.DOUBLE, allowNull: false });

Well.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    organization_id: { type: DataTypes.INTEGER, allowNull: false },
    pad_id: { type: DataTypes.INTEGER, allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    uwi: { type: DataTypes.STRING(40), allowNull: false },
    status: { type: DataTypes.ENUM("producing", "kicking_off", "shut_in", "suspended"), allowNull: false, defaultValue: "producing" },
    time_zone: { type: DataTypes.STRING(64), allowNull: false, defaultValue: "UTC" },
    tubing_id_in: num(),
    tubing_depth_ft: num(),
    perf_depth_ft: num(),
    surface_temp_f: num(),
    bottomhole_temp_f: num(),
    gas_sg: num(),
    liquid_type: { type: DataTypes.ENUM("oil", "water", "condensate"), allowNull: false },
    liquid_gravity: num(),
    water_cut: num(),
    reservoir_pressure_psig: num(),
    injection_pressure_psig: num(),
    created_at: DataTypes.DATE,
    updated_at: DataTypes.DATE,
  },
  { sequelize, modelName: "Well", tableName: "wells" },
);
