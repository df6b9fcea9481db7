import { Sequelize } from "sequelize";
import pg from "pg";
import { env } from "@/lib/env";

// One Sequelize per process, kept on globalThis so Next's hot reload and
// route-handler bundles share it instead of opening a pool per module copy.
const g = globalThis as unknown as { __bellowsSequelize?: Sequelize };

function databaseUrl(): string {
  return env().DATABASE_URL;
}

export const sequelize: Sequelize =
  g.__bellowsSequelize ??
  (g.__bellowsSequelize = new Sequelize(databaseUrl(), {
    dialect: "postgres",
    dialectModule: pg,
    logging: false,
    pool: { max: Number(process.env.DB_POOL_MAX ?? 10), min: 0, idle: 10_000 },
    define: { underscored: true, timestamps: true, createdAt: "created_at", updatedAt: "updated_at" },
  }));
