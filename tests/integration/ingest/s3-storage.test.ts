// The S3-compatible storage driver against a local fake S3 (s3rver, on loopback):
// a multipart streamed put, get, exists, delete, and a missing key.
import { createHash, randomBytes } from "node:crypto";
import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { Readable } from "node:stream";
import { afterAll, beforeAll, expect, it } from "vitest";
import S3rver from "s3rver";
import { createS3Storage } from "@/lib/storage/s3-storage";
import { createStorageFromEnv } from "@/lib/storage/get-storage";
import { StorageNotFoundError, type ObjectStorage } from "@/lib/storage/object-storage";

let server: S3rver;
let dir = "";
let storage: ObjectStorage;
let endpoint = "";

beforeAll(async () => {
  dir = mkdtempSync(path.join(os.tmpdir(), "bellows-s3-"));
  server = new S3rver({ port: 0, address: "127.0.0.1", silent: true, directory: dir, configureBuckets: [{ name: "bellows-test" }] });
  const { port } = await server.run();
  endpoint = `http://127.0.0.1:${port}`;
  // s3rver accepts its fixed development credentials.
  storage = createS3Storage({ bucket: "bellows-test", endpoint, accessKeyId: "S3RVER", secretAccessKey: "S3RVER", forcePathStyle: true, prefix: "t/" });
});
afterAll(async () => {
  await server?.close();
  rmSync(dir, { recursive: true, force: true });
});

function chunks(total: number, size = 1024 * 1024): { stream: Readable; sha256: () => string } {
  const hash = createHash("sha256");
  let sent = 0;
  const stream = new Readable({
    read() {
      if (sent >= total) return void this.push(null);
      const b = randomBytes(Math.min(size, total - sent));
      sent += b.length;
      hash.update(b);
      this.push(b);
    },
  });
  return { stream, sha256: () => hash.digest("hex") };
}

async function hashOf(r: Readable): Promise<string> {
  const h = createHash("sha256");
  for await (const c of r) h.update(c as Buffer);
  return h.digest("hex");
}

it("puts a 12 MB stream in parts and reads back the same bytes", async () => {
  const src = chunks(12 * 1024 * 1024);
  await storage.put("uploads/1/big.csv", src.stream);
  expect(await storage.exists("uploads/1/big.csv")).toBe(true);
  expect(await hashOf(await storage.get("uploads/1/big.csv"))).toBe(src.sha256());
});

it("deletes, reports missing keys, and refuses keys that climb out", async () => {
  await storage.put("uploads/1/small.csv", Readable.from([Buffer.from("a,b\n1,2\n")]));
  await storage.delete("uploads/1/small.csv");
  expect(await storage.exists("uploads/1/small.csv")).toBe(false);
  await expect(storage.get("uploads/1/small.csv")).rejects.toBeInstanceOf(StorageNotFoundError);
  await expect(storage.put("../x", Readable.from([]))).rejects.toThrow(/invalid storage key/);
});

it("is selected by STORAGE_DRIVER=s3", async () => {
  const s = createStorageFromEnv({ STORAGE_DRIVER: "s3", S3_BUCKET: "bellows-test", S3_ENDPOINT: endpoint, S3_ACCESS_KEY_ID: "S3RVER", S3_SECRET_ACCESS_KEY: "S3RVER" } as unknown as NodeJS.ProcessEnv);
  await s.put("env/check.txt", Readable.from([Buffer.from("ok")]));
  expect(await s.exists("env/check.txt")).toBe(true);
});
