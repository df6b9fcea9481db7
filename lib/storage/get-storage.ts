// The storage driver chosen by the environment, one per process:
//   STORAGE_DRIVER=local (default): files under STORAGE_DIR;
//   STORAGE_DRIVER=s3: S3_BUCKET, S3_ENDPOINT, S3_REGION, S3_ACCESS_KEY_ID,
//   S3_SECRET_ACCESS_KEY, S3_FORCE_PATH_STYLE (default true), S3_PREFIX.
import { z } from "zod";
import { createLocalStorage } from "./local-storage";
import type { ObjectStorage } from "./object-storage";
import { createS3Storage } from "./s3-storage";

const StorageEnvSchema = z.discriminatedUnion("STORAGE_DRIVER", [
  z.object({ STORAGE_DRIVER: z.literal("local"), STORAGE_DIR: z.string().min(1).default(".data/dev/storage") }),
  z.object({
    STORAGE_DRIVER: z.literal("s3"),
    S3_BUCKET: z.string().min(1),
    S3_ENDPOINT: z.string().url().optional(),
    S3_REGION: z.string().optional(),
    S3_ACCESS_KEY_ID: z.string().optional(),
    S3_SECRET_ACCESS_KEY: z.string().optional(),
    S3_FORCE_PATH_STYLE: z.enum(["true", "false"]).default("true"),
    S3_PREFIX: z.string().optional(),
  }),
]);

const g = globalThis as unknown as { __bellowsStorage?: ObjectStorage };

export function createStorageFromEnv(env: NodeJS.ProcessEnv): ObjectStorage {
  const e = StorageEnvSchema.parse({ ...env, STORAGE_DRIVER: env.STORAGE_DRIVER || "local" });
  if (e.STORAGE_DRIVER === "local") return createLocalStorage(e.STORAGE_DIR);
  return createS3Storage({
    bucket: e.S3_BUCKET,
    endpoint: e.S3_ENDPOINT,
    region: e.S3_REGION,
    accessKeyId: e.S3_ACCESS_KEY_ID,
    secretAccessKey: e.S3_SECRET_ACCESS_KEY,
    forcePathStyle: e.S3_FORCE_PATH_STYLE === "true",
    prefix: e.S3_PREFIX,
  });
}

export function getStorage(): ObjectStorage {
  return (g.__bellowsStorage ??= createStorageFromEnv(process.env));
}
