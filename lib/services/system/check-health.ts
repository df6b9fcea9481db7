import { sequelize } from "@/models";
import { pingRedis } from "@/lib/queue/connection";

export interface Health {
  ok: boolean;
  database: "up" | "down";
  redis: "up" | "down";
}

async function within<T>(p: Promise<T>, ms: number): Promise<T> {
  return Promise.race([p, new Promise<T>((_, rej) => setTimeout(() => rej(new Error("timeout")), ms))]);
}

export async function checkHealth(): Promise<Health> {
  const [db, redis] = await Promise.allSettled([within(sequelize.query("SELECT 1"), 2000), within(pingRedis(), 2000)]);
  const database = db.status === "fulfilled" ? "up" : "down";
  const r = redis.status === "fulfilled" ? "up" : "down";
  return { ok: database === "up" && r === "up", database, redis: r };
}
