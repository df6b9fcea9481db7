// Local-folder driver: one file per key under a root folder. A put writes to a
// temporary name and renames it, so a reader never sees half a file.
import { createReadStream, createWriteStream } from "node:fs";
import { mkdir, rename, rm, stat } from "node:fs/promises";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { pipeline } from "node:stream/promises";
import { checkStorageKey, StorageNotFoundError, type ObjectStorage } from "./object-storage";

export function createLocalStorage(root: string): ObjectStorage {
  const base = path.resolve(root);
  const fileOf = (key: string) => path.join(base, ...checkStorageKey(key).split("/"));

  return {
    async put(key, body) {
      const file = fileOf(key);
      await mkdir(path.dirname(file), { recursive: true });
      const tmp = `${file}.${randomUUID()}.part`;
      try {
        await pipeline(body, createWriteStream(tmp));
        await rename(tmp, file);
      } catch (e) {
        await rm(tmp, { force: true });
        throw e;
      }
    },
    async get(key) {
      const file = fileOf(key);
      try {
        await stat(file);
      } catch {
        throw new StorageNotFoundError(key);
      }
      return createReadStream(file, { highWaterMark: 256 * 1024 });
    },
    async delete(key) {
      await rm(fileOf(key), { force: true });
    },
    async exists(key) {
      try {
        return (await stat(fileOf(key))).isFile();
      } catch {
        return false;
      }
    },
  };
}
