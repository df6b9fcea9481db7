// Migrations are the only source of the schema: they apply down and up
// cleanly on a scratch database (so the shared test database is untouched).
import { execFileSync } from "node:child_process";
import { afterAll, beforeAll, expect, it } from "vitest";
import { Client } from "pg";

const base = new URL(process.env.DATABASE_URL!);
const scratch = `${base.pathname.slice(1)}_migrations`;
const scratchUrl = new URL(base);
scratchUrl.pathname = `/${scratch}`;

async function admin(sql: string) {
  const c = new Client({ connectionString: new URL("/postgres", base).toString() });
  await c.connect();
  await c.query(sql);
  await c.end();
}

const cli = (cmd: string) =>
  execFileSync("npx", ["sequelize-cli", cmd], { env: { ...process.env, DATABASE_URL: scratchUrl.toString() }, stdio: "pipe" }).toString();

async function tables(): Promise<string[]> {
  const c = new Client({ connectionString: scratchUrl.toString() });
  await c.connect();
  const r = await c.query(`SELECT tablename FROM pg_tables WHERE schemaname='public' AND tablename <> 'sequelize_meta' ORDER BY 1`);
  await c.end();
  return r.rows.map((x) => x.tablename as string);
}

beforeAll(async () => {
  await admin(`DROP DATABASE IF EXISTS ${scratch}`);
  await admin(`CREATE DATABASE ${scratch}`);
});
afterAll(async () => {
  await admin(`DROP DATABASE IF EXISTS ${scratch}`);
});

it("up, down to nothing, and up again", async () => {
  cli("db:migrate");
  const first = await tables();
  expect(first).toEqual(expect.arrayContaining(["organizations", "users", "wells", "mandrels", "audit_logs"]));
  cli("db:migrate:undo:all");
  expect(await tables()).toEqual([]);
  cli("db:migrate");
  expect(await tables()).toEqual(first);
});
