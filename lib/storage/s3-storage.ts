// S3-compatible driver (AWS S3, MinIO, Ceph, a local fake). Puts go through
// lib-storage's multipart Upload so a stream of unknown length is sent in
// parts (5 MB each, 4 at a time) instead of being buffered whole.
import { DeleteObjectCommand, GetObjectCommand, HeadObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { Upload } from "@aws-sdk/lib-storage";
import { Readable } from "node:stream";
import { checkStorageKey, StorageNotFoundError, type ObjectStorage } from "./object-storage";

export interface S3StorageConfig {
  bucket: string;
  endpoint?: string;
  region?: string;
  accessKeyId?: string;
  secretAccessKey?: string;
  /** Path-style URLs (http://host/bucket/key), needed by most self-hosted servers. */
  forcePathStyle?: boolean;
  /** Prefix put before every key, e.g. "bellows/". */
  prefix?: string;
}

function isNotFound(e: unknown): boolean {
  const err = e as { name?: string; $metadata?: { httpStatusCode?: number } };
  return err?.name === "NoSuchKey" || err?.name === "NotFound" || err?.$metadata?.httpStatusCode === 404;
}

export function createS3Storage(config: S3StorageConfig): ObjectStorage {
  const client = new S3Client({
    endpoint: config.endpoint,
    region: config.region ?? "us-east-1",
    forcePathStyle: config.forcePathStyle ?? true,
    credentials: config.accessKeyId && config.secretAccessKey
      ? { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey }
      : undefined,
  });
  const Bucket = config.bucket;
  const keyOf = (key: string) => `${config.prefix ?? ""}${checkStorageKey(key)}`;

  return {
    async put(key, body) {
      const upload = new Upload({ client, params: { Bucket, Key: keyOf(key), Body: body }, queueSize: 4, partSize: 5 * 1024 * 1024 });
      await upload.done();
    },
    async get(key) {
      try {
        const r = await client.send(new GetObjectCommand({ Bucket, Key: keyOf(key) }));
        if (!r.Body) throw new StorageNotFoundError(key);
        return r.Body instanceof Readable ? r.Body : Readable.fromWeb(r.Body.transformToWebStream() as never);
      } catch (e) {
        if (isNotFound(e)) throw new StorageNotFoundError(key);
        throw e;
      }
    },
    async delete(key) {
      await client.send(new DeleteObjectCommand({ Bucket, Key: keyOf(key) }));
    },
    async exists(key) {
      try {
        await client.send(new HeadObjectCommand({ Bucket, Key: keyOf(key) }));
        return true;
      } catch (e) {
        if (isNotFound(e)) return false;
        throw e;
      }
    },
  };
}
