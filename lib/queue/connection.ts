// Redis connections for BullMQ. Producers (web) fail fast when Redis is down
// so an upload can answer clearly; workers wait forever (maxRetriesPerRequest
// null, as BullMQ requires for blocking commands).
import IORedis, { type RedisOptions } from "ioredis";
import { env } from "@/lib/env";

const g = globalThis as unknown as { __bellowsRedis?: IORedis };

function redisUrl(): string {
  return env().REDIS_URL;
}

export function producerConnection(): IORedis {
  if (!g.__bellowsRedis) {
    g.__bellowsRedis = new IORedis(redisUrl(), {
      maxRetriesPerRequest: 1,
      enableOfflineQueue: false,
      connectTimeout: 2000,
    } satisfies RedisOptions);
    // Reported through health and enqueue errors, not as log noise.
    g.__bellowsRedis.on("error", () => undefined);
  }
  return g.__bellowsRedis;
}

export function workerConnection(): IORedis {
  return new IORedis(redisUrl(), { maxRetriesPerRequest: null });
}

export async function pingRedis(): Promise<void> {
  const r = producerConnection();
  if (r.status !== "ready") {
    await new Promise<void>((resolve, reject) => {
      const t = setTimeout(() => reject(new Error("redis not ready")), 1500);
      r.once("ready", () => { clearTimeout(t); resolve(); });
    });
  }
  await r.ping();
}
