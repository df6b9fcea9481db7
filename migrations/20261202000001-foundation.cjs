"use strict";
// The ground floor: organizations, users, sign-in tokens, the well register
// (fields → pads → wells → mandrels) and the audit log. Canonical units are
// oilfield (psig, ft, °F, in): see lib/units/units.ts.

/** @type {import('sequelize-cli').Migration} */
module.exports = {
  async up(queryInterface, Sequelize) {
    const { DataTypes } = Sequelize;
    const stamps = {
      created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: Sequelize.fn("now") },
      updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: Sequelize.fn("now") },
    };
    const orgRef = {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: "organizations", key: "id" },
      onDelete: "CASCADE",
    };

    await queryInterface.createTable("organizations", {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      name: { type: DataTypes.STRING(120), allowNull: false },
      slug: { type: DataTypes.STRING(60), allowNull: false, unique: true },
      settings: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
      ...stamps,
    });

    await queryInterface.createTable("users", {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      organization_id: orgRef,
      email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
      name: { type: DataTypes.STRING(120), allowNull: false },
      password_hash: { type: DataTypes.STRING(100), allowNull: true },
      role: { type: DataTypes.ENUM("admin", "analyst", "engineer", "operator"), allowNull: false },
      active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
      unit_system: { type: DataTypes.ENUM("oilfield", "metric"), allowNull: false, defaultValue: "oilfield" },
      preferences: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
      ...stamps,
    });
    await queryInterface.addIndex("users", ["organization_id", "role"]);

    await queryInterface.createTable("auth_tokens", {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      organization_id: orgRef,
      user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
      purpose: { type: DataTypes.ENUM("invite", "reset"), allowNull: false },
      token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      expires_at: { type: DataTypes.DATE, allowNull: false },
      used_at: { type: DataTypes.DATE, allowNull: true },
      created_at: stamps.created_at,
    });

    // Failed sign-ins per key ("account:<email>" or "address:<ip>") in a fixed window.
    await queryInterface.createTable("sign_in_failures", {
      key: { type: DataTypes.STRING(300), primaryKey: true },
      count: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      window_start: { type: DataTypes.DATE, allowNull: false },
    });

    await queryInterface.createTable("fields", {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      organization_id: orgRef,
      name: { type: DataTypes.STRING(120), allowNull: false },
      time_zone: { type: DataTypes.STRING(64), allowNull: false, defaultValue: "UTC" },
      ...stamps,
    });
    await queryInterface.addIndex("fields", ["organization_id", "name"], { unique: true });

    await queryInterface.createTable("pads", {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      organization_id: orgRef,
      field_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "fields", key: "id" }, onDelete: "CASCADE" },
      name: { type: DataTypes.STRING(120), allowNull: false },
      ...stamps,
    });
    await queryInterface.addIndex("pads", ["field_id", "name"], { unique: true });
    await queryInterface.addIndex("pads", ["organization_id"]);

    await queryInterface.createTable("wells", {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      organization_id: orgRef,
      pad_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "pads", key: "id" }, onDelete: "RESTRICT" },
      name: { type: DataTypes.STRING(120), allowNull: false },
      uwi: { type: DataTypes.STRING(40), allowNull: false },
      status: { type: DataTypes.ENUM("producing", "kicking_off", "shut_in", "suspended"), allowNull: false, defaultValue: "producing" },
      time_zone: { type: DataTypes.STRING(64), allowNull: false, defaultValue: "UTC" },
      tubing_id_in: { type: DataTypes.DOUBLE, allowNull: false },
      tubing_depth_ft: { type: DataTypes.DOUBLE, allowNull: false },
      perf_depth_ft: { type: DataTypes.DOUBLE, allowNull: false },
      surface_temp_f: { type: DataTypes.DOUBLE, allowNull: false },
      bottomhole_temp_f: { type: DataTypes.DOUBLE, allowNull: false },
      gas_sg: { type: DataTypes.DOUBLE, allowNull: false },
      liquid_type: { type: DataTypes.ENUM("oil", "water", "condensate"), allowNull: false },
      liquid_gravity: { type: DataTypes.DOUBLE, allowNull: false },
      water_cut: { type: DataTypes.DOUBLE, allowNull: false },
      reservoir_pressure_psig: { type: DataTypes.DOUBLE, allowNull: false },
      injection_pressure_psig: { type: DataTypes.DOUBLE, allowNull: false },
      ...stamps,
    });
    await queryInterface.addIndex("wells", ["organization_id", "uwi"], { unique: true });
    await queryInterface.addIndex("wells", ["organization_id", "name"]);
    await queryInterface.addIndex("wells", ["pad_id"]);

    await queryInterface.createTable("mandrels", {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      organization_id: orgRef,
      well_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "wells", key: "id" }, onDelete: "CASCADE" },
      position: { type: DataTypes.INTEGER, allowNull: false },
      md_ft: { type: DataTypes.DOUBLE, allowNull: false },
      tvd_ft: { type: DataTypes.DOUBLE, allowNull: false },
      kind: { type: DataTypes.ENUM("ipo", "orifice", "dummy"), allowNull: false },
      port_in: { type: DataTypes.DOUBLE, allowNull: true },
      valve_od_in: { type: DataTypes.DOUBLE, allowNull: true },
      r_ratio: { type: DataTypes.DOUBLE, allowNull: true },
      tro_psig: { type: DataTypes.DOUBLE, allowNull: true },
      installed_on: { type: DataTypes.DATEONLY, allowNull: true },
      ...stamps,
    });
    await queryInterface.addIndex("mandrels", ["well_id", "position"], { unique: true });

    await queryInterface.createTable("audit_logs", {
      id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
      organization_id: orgRef,
      user_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
      action: { type: DataTypes.STRING(80), allowNull: false },
      entity_type: { type: DataTypes.STRING(40), allowNull: false },
      entity_id: { type: DataTypes.STRING(40), allowNull: true },
      before: { type: DataTypes.JSONB, allowNull: true },
      after: { type: DataTypes.JSONB, allowNull: true },
      created_at: stamps.created_at,
    });
    await queryInterface.addIndex("audit_logs", ["organization_id", "entity_type", "entity_id"]);
    await queryInterface.addIndex("audit_logs", ["organization_id", "created_at"]);
  },

  async down(queryInterface) {
    for (const t of ["audit_logs", "mandrels", "wells", "pads", "fields", "sign_in_failures", "auth_tokens", "users", "organizations"]) {
      await queryInterface.dropTable(t);
    }
    for (const e of ["enum_users_role", "enum_users_unit_system", "enum_auth_tokens_purpose", "enum_wells_status", "enum_wells_liquid_type", "enum_mandrels_kind"]) {
      await queryInterface.sequelize.query(`DROP TYPE IF EXISTS "${e}"`);
    }
  },
};
