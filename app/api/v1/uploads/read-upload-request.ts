// Read POST /api/v1/uploads without buffering the file: either a text/csv body
// (name in ?name=, mapping in ?mapping=) or multipart/form-data with a `file` part
// and `mapping` (saved name) or `mappingJson` fields, parsed as a stream by busboy.
import busboy from "busboy";
import { Readable } from "node:stream";
import type { ReadableStream as NodeWebStream } from "node:stream/web";
import type { MappingRef } from "@/lib/services/uploads/accept-api-upload";
import { BadRequest } from "../bad-request";

export interface UploadRequest {
  fileName: string;
  body: Readable;
  mapping: MappingRef | Promise<MappingRef>;
}

const MAX_FIELD_BYTES = 256 * 1024;

export function readUploadRequest(req: Request): Promise<UploadRequest> {
  const url = new URL(req.url);
  const type = req.headers.get("content-type") ?? "";
  if (!req.body) throw new BadRequest("The request has no body");
  const body = Readable.fromWeb(req.body as unknown as NodeWebStream<Uint8Array>);
  if (/^text\/(csv|plain)|^application\/(octet-stream|csv)/i.test(type)) {
    const name = url.searchParams.get("name") ?? "upload.csv";
    const mappingName = url.searchParams.get("mapping") ?? undefined;
    return Promise.resolve({ fileName: name, body, mapping: { name: mappingName } });
  }
  if (!/^multipart\/form-data/i.test(type)) {
    throw new BadRequest("Send the file as text/csv (with ?mapping=<saved name>) or as multipart/form-data with a `file` part");
  }
  return new Promise<UploadRequest>((resolve, reject) => {
    const fields: Record<string, string> = {};
    let sawFile = false;
    let resolveFields: (m: MappingRef) => void = () => undefined;
    let rejectFields: (e: Error) => void = () => undefined;
    const later = new Promise<MappingRef>((res, rej) => { resolveFields = res; rejectFields = rej; });
    later.catch(() => undefined);
    const bb = busboy({ headers: Object.fromEntries(req.headers), limits: { files: 1, fieldSize: MAX_FIELD_BYTES, fields: 20 } });
    bb.on("field", (name, value) => { fields[name] = value; });
    bb.on("file", (name, stream, info) => {
      if (name !== "file" || sawFile) { stream.resume(); return; }
      sawFile = true;
      // Fields sent before the file are known now: hand them over synchronously so a
      // bad mapping is refused before the file is stored.
      const known = fields.mapping !== undefined || fields.mappingJson !== undefined;
      resolve({
        fileName: info.filename || "upload.csv",
        body: stream,
        mapping: known ? { name: fields.mapping, json: fields.mappingJson } : later,
      });
    });
    bb.on("close", () => {
      if (!sawFile) reject(new BadRequest("The form has no `file` part"));
      resolveFields({ name: fields.mapping, json: fields.mappingJson });
    });
    bb.on("error", (e: Error) => { reject(new BadRequest(`The form could not be read: ${e.message}`)); rejectFields(e); });
    body.pipe(bb);
  });
}
