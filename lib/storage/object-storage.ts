// Where uploaded files and rejected-row reports live. Two drivers share this
// interface: a local folder (default) and any S3-compatible bucket. Bodies are
// always streams so a file of any size passes through bounded memory.
import type { Readable } from "node:stream";

export interface ObjectStorage {
  /** Store the stream under key (replacing any object there); resolves once it is durable. */
  put(key: string, body: Readable): Promise<void>;
  /** The object as a stream; throws StorageNotFoundError when missing. */
  get(key: string): Promise<Readable>;
  delete(key: string): Promise<void>;
  exists(key: string): Promise<boolean>;
}

export class StorageNotFoundError extends Error {
  constructor(key: string) {
    super(`no stored object "${key}"`);
    this.name = "StorageNotFoundError";
  }
}

/** Keys are relative, slash-separated, without "." or ".." parts (they become file paths). */
export function checkStorageKey(key: string): string {
  const parts = key.split("/");
  if (!key || key.startsWith("/") || parts.some((p) => p === "" || p === "." || p === "..") || /[\\\0]/.test(key)) {
    throw new Error(`invalid storage key "${key}"`);
  }
  return key;
}
