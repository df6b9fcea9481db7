// Take a file in: stream it to storage while hashing it and keeping only its first
// 64 KB, sniff that head with detectFile, and record the upload. The file is never
// held whole in memory, whatever its size.
import { createHash, randomUUID } from "node:crypto";
import { Readable, Transform } from "node:stream";
import { Upload } from "@/models";
import type { UploadSource } from "@/models/upload";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { AppError } from "@/lib/errors";
import { detectFile, HEAD_CHARS } from "@/lib/ingest/detect";
import { getStorage } from "@/lib/storage/get-storage";
import { buildUploadView } from "./build-upload-view";
import type { UploadView } from "./upload-view";

export interface ReceiveUploadInput {
  fileName: string;
  body: ReadableStream<Uint8Array> | NodeJS.ReadableStream;
  source: UploadSource;
}

/** Largest accepted file (default 4 GiB; UPLOAD_MAX_BYTES overrides). */
function maxUploadBytes(): number {
  const n = Number(process.env.UPLOAD_MAX_BYTES);
  return Number.isFinite(n) && n > 0 ? n : 4 * 1024 ** 3;
}

export function toNodeReadable(body: ReadableStream<Uint8Array> | NodeJS.ReadableStream): Readable {
  if (body instanceof Readable) return body;
  if (typeof (body as ReadableStream<Uint8Array>).getReader === "function") {
    return Readable.fromWeb(body as import("node:stream/web").ReadableStream<Uint8Array>);
  }
  return Readable.from(body as AsyncIterable<Uint8Array>);
}

export function cleanFileName(name: string): string {
  const base = name.split(/[\\/]/).pop()?.replace(/[\0-\x1f]/g, "").trim() ?? "";
  if (!base) throw new AppError("invalid", "The file needs a name", [{ path: "fileName", message: "missing" }]);
  return base.slice(0, 255);
}

interface Tapped {
  stream: Transform;
  result: () => { byteSize: number; sha256: string; head: Buffer };
}

/** Pass bytes through unchanged, hashing and counting them and keeping the head. */
function tapStream(limit: number): Tapped {
  const hash = createHash("sha256");
  let byteSize = 0;
  const headParts: Buffer[] = [];
  let headSize = 0;
  const stream = new Transform({
    transform(chunk: Buffer, _enc, cb) {
      byteSize += chunk.length;
      if (byteSize > limit) {
        cb(new AppError("too_large", `The file is larger than the ${Math.round(limit / 1024 ** 2)} MB limit`));
        return;
      }
      hash.update(chunk);
      if (headSize < HEAD_CHARS) {
        const part = chunk.subarray(0, HEAD_CHARS - headSize);
        headParts.push(Buffer.from(part));
        headSize += part.length;
      }
      cb(null, chunk);
    },
  });
  return { stream, result: () => ({ byteSize, sha256: hash.digest("hex"), head: Buffer.concat(headParts) }) };
}

export async function receiveUpload(actor: Actor, input: ReceiveUploadInput): Promise<UploadView> {
  requireCapability(actor, "uploads.create");
  const fileName = cleanFileName(input.fileName);
  const storage = getStorage();
  const month = new Date().toISOString().slice(0, 7);
  const storageKey = `uploads/${actor.organizationId}/${month}/${randomUUID()}.csv`;
  const tap = tapStream(maxUploadBytes());
  const source = toNodeReadable(input.body);
  source.on("error", (e) => tap.stream.destroy(e));
  await storage.put(storageKey, source.pipe(tap.stream));
  const { byteSize, sha256, head } = tap.result();

  // The head is decoded leniently: a bad byte becomes U+FFFD and detectFile judges it.
  const headText = new TextDecoder("utf-8").decode(head);
  const detected = detectFile(headText, { isTruncated: byteSize > head.length });
  const row = await Upload.create({
    organization_id: actor.organizationId,
    created_by: actor.userId,
    api_key_id: actor.apiKeyId ?? null,
    source: input.source,
    file_name: fileName,
    storage_key: storageKey,
    byte_size: byteSize,
    sha256,
    status: detected.ok ? "received" : "refused",
    detection: detected.ok ? detected.detection : detected.error,
    mapping: null,
    mapping_id: null,
    counts: null,
    error: detected.ok ? null : detected.error.message,
    rejections_key: null,
    started_at: null,
    finished_at: null,
  });
  return buildUploadView(actor, row);
}
