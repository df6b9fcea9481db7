"use strict";
// Findings become issues: one open issue per well and problem while the
// signature lasts, with its evidence, the triage lifecycle (ISA-18.2 words
// where they apply: acknowledged, shelved), comments, photos, field events,
// rule settings, diagnose runs, notifications and saved list filters.

/** @type {import('sequelize-cli').Migration} */
module.exports = {
  async up(queryInterface, Sequelize) {
    const { DataTypes } = Sequelize;
    const now = { type: DataTypes.DATE, allowNull: false, defaultValue: Sequelize.fn("now") };
    const stamps = { created_at: now, updated_at: { ...now } };
    const ref = (model, allowNull = false, onDelete = "CASCADE") => ({
      type: DataTypes.INTEGER, allowNull, references: { model, key: "id" }, onDelete,
    });

    await queryInterface.createTable("issues", {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      organization_id: ref("organizations"),
      well_id: ref("wells"),
      rule: { type: DataTypes.STRING(40), allowNull: false },
      status: {
        type: DataTypes.ENUM("new", "acknowledged", "assigned", "resolved", "verified", "recurred", "dismissed", "shelved"),
        allowNull: false, defaultValue: "new",
      },
      severity: { type: DataTypes.INTEGER, allowNull: false },
      confidence: { type: DataTypes.DOUBLE, allowNull: false },
      started_at: { type: DataTypes.DATE, allowNull: false },
      // The last time the diagnostics saw the signature; null ended_at = ongoing.
      last_seen_at: { type: DataTypes.DATE, allowNull: false },
      ended_at: { type: DataTypes.DATE, allowNull: true },
      production_at_risk: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
      production_at_risk_unit: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "bbl/d" },
      production_at_risk_method: { type: DataTypes.TEXT, allowNull: true },
      summary: { type: DataTypes.TEXT, allowNull: false },
      evidence: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
      annotations: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
      assignee_id: ref("users", true, "SET NULL"),
      priority: { type: DataTypes.ENUM("low", "normal", "high", "urgent"), allowNull: true },
      due_on: { type: DataTypes.DATEONLY, allowNull: true },
      resolved_action: { type: DataTypes.STRING(80), allowNull: true },
      resolved_note: { type: DataTypes.TEXT, allowNull: true },
      resolved_at: { type: DataTypes.DATE, allowNull: true },
      resolved_by: ref("users", true, "SET NULL"),
      dismiss_reason: { type: DataTypes.ENUM("false_alarm", "known_accepted", "data_problem"), allowNull: true },
      shelved_until: { type: DataTypes.DATE, allowNull: true },
      recurrence_count: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      ...stamps,
    });
    await queryInterface.addIndex("issues", ["organization_id", "status", "production_at_risk"]);
    await queryInterface.addIndex("issues", ["organization_id", "well_id", "rule"]);
    await queryInterface.addIndex("issues", ["organization_id", "assignee_id"]);
    // At most one live issue per well and rule: the diagnose job extends it.
    await queryInterface.sequelize.query(
      `CREATE UNIQUE INDEX issues_one_live_per_well_rule ON issues (well_id, rule)
       WHERE status IN ('new','acknowledged','assigned','recurred','shelved')`,
    );

    await queryInterface.createTable("issue_events", {
      id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
      organization_id: ref("organizations"),
      issue_id: ref("issues"),
      user_id: ref("users", true, "SET NULL"),
      kind: { type: DataTypes.STRING(40), allowNull: false },
      from_status: { type: DataTypes.STRING(20), allowNull: true },
      to_status: { type: DataTypes.STRING(20), allowNull: true },
      data: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
      created_at: now,
    });
    await queryInterface.addIndex("issue_events", ["issue_id", "created_at"]);
    await queryInterface.addIndex("issue_events", ["organization_id", "created_at"]);

    await queryInterface.createTable("issue_comments", {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      organization_id: ref("organizations"),
      issue_id: ref("issues"),
      user_id: ref("users", true, "SET NULL"),
      body: { type: DataTypes.TEXT, allowNull: false },
      ...stamps,
    });
    await queryInterface.addIndex("issue_comments", ["issue_id", "created_at"]);

    await queryInterface.createTable("issue_attachments", {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      organization_id: ref("organizations"),
      issue_id: ref("issues"),
      user_id: ref("users", true, "SET NULL"),
      file_name: { type: DataTypes.STRING(200), allowNull: false },
      content_type: { type: DataTypes.STRING(60), allowNull: false },
      byte_size: { type: DataTypes.INTEGER, allowNull: false },
      storage_key: { type: DataTypes.STRING(300), allowNull: false },
      created_at: now,
    });
    await queryInterface.addIndex("issue_attachments", ["issue_id"]);

    // A pad-wide event (e.g. every well on a pad lost injection at once):
    // one field event instead of an issue per well.
    await queryInterface.createTable("field_events", {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      organization_id: ref("organizations"),
      pad_id: ref("pads"),
      kind: { type: DataTypes.STRING(40), allowNull: false },
      started_at: { type: DataTypes.DATE, allowNull: false },
      ended_at: { type: DataTypes.DATE, allowNull: true },
      well_count: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      summary: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
      ...stamps,
    });
    await queryInterface.addIndex("field_events", ["organization_id", "pad_id", "kind", "started_at"], { unique: true });

    // Rule settings cascade: organization (field_id and well_id null), field, well.
    await queryInterface.createTable("rule_settings", {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      organization_id: ref("organizations"),
      field_id: ref("fields", true),
      well_id: ref("wells", true),
      settings: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
      updated_by: ref("users", true, "SET NULL"),
      ...stamps,
    });
    await queryInterface.sequelize.query(
      `CREATE UNIQUE INDEX rule_settings_scope ON rule_settings (organization_id, COALESCE(field_id, 0), COALESCE(well_id, 0))`,
    );

    await queryInterface.createTable("diagnose_runs", {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      organization_id: ref("organizations"),
      requested_by: ref("users", true, "SET NULL"),
      reason: { type: DataTypes.STRING(20), allowNull: false },
      scope: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
      status: { type: DataTypes.ENUM("queued", "running", "done", "failed"), allowNull: false, defaultValue: "queued" },
      wells_total: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      wells_done: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      issues_opened: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      issues_updated: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      error: { type: DataTypes.TEXT, allowNull: true },
      started_at: { type: DataTypes.DATE, allowNull: true },
      finished_at: { type: DataTypes.DATE, allowNull: true },
      ...stamps,
    });
    await queryInterface.addIndex("diagnose_runs", ["organization_id", "created_at"]);

    await queryInterface.createTable("notifications", {
      id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
      organization_id: ref("organizations"),
      user_id: ref("users"),
      kind: { type: DataTypes.STRING(40), allowNull: false },
      title: { type: DataTypes.STRING(200), allowNull: false },
      body: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
      link: { type: DataTypes.STRING(300), allowNull: true },
      read_at: { type: DataTypes.DATE, allowNull: true },
      created_at: now,
    });
    await queryInterface.addIndex("notifications", ["user_id", "read_at", "created_at"]);

    await queryInterface.createTable("saved_filters", {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      organization_id: ref("organizations"),
      user_id: ref("users"),
      name: { type: DataTypes.STRING(80), allowNull: false },
      query: { type: DataTypes.STRING(1000), allowNull: false },
      ...stamps,
    });
    await queryInterface.addIndex("saved_filters", ["user_id", "name"], { unique: true });
  },

  async down(queryInterface) {
    for (const t of ["saved_filters", "notifications", "diagnose_runs", "rule_settings", "field_events", "issue_attachments", "issue_comments", "issue_events", "issues"]) {
      await queryInterface.dropTable(t);
    }
    for (const e of ["enum_issues_status", "enum_issues_priority", "enum_issues_dismiss_reason", "enum_diagnose_runs_status"]) {
      await queryInterface.sequelize.query(`DROP TYPE IF EXISTS "${e}"`);
    }
  },
};
