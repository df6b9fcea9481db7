"use strict";
// `sequelize-cli db:seed:all` runs the same idempotent TypeScript demo seed
// that npm start uses (scripts/seed-demo.ts), so there is one source of truth.
const { execFileSync } = require("node:child_process");
const path = require("node:path");

module.exports = {
  async up() {
    execFileSync(process.execPath, ["--import", "tsx", path.resolve(__dirname, "../scripts/seed-demo.ts")], { stdio: "inherit" });
  },
  async down() {
    // The demo organization is removed with its rows (ON DELETE CASCADE).
    const { Sequelize } = require("sequelize");
    const s = new Sequelize(process.env.DATABASE_URL, { logging: false });
    await s.query(`DELETE FROM organizations WHERE slug = 'demo'`);
    await s.close();
  },
};
