// POST /api/v1/uploads in one use case: store the file, pick its mapping (a saved
// mapping by name, an inline JSON mapping, or the saved mapping that matches the
// file's header), and queue it. When the mapping is known before the body (query
// parameter, or a form field sent before the file) a bad mapping is refused before
// anything is stored.
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { AppError, fromZod } from "@/lib/errors";
import { MappingSchema, type Mapping } from "@/lib/ingest/mapping";
import { findMappingByName } from "@/lib/services/mappings/find-mapping-by-name";
import { receiveUpload, type ReceiveUploadInput } from "./receive-upload";
import { submitUpload } from "./submit-upload";
import type { UploadView } from "./upload-view";

export interface MappingRef {
  /** Name of a saved mapping. */
  name?: string;
  /** A mapping as JSON text. */
  json?: string;
}

export interface AcceptApiUploadInput {
  fileName: string;
  body: ReceiveUploadInput["body"];
  mapping: MappingRef | Promise<MappingRef>;
}

async function resolveMapping(actor: Actor, ref: MappingRef): Promise<Mapping | null> {
  if (ref.name && ref.json) throw new AppError("invalid", "Send either a saved mapping name or an inline mapping, not both", [{ path: "mapping", message: "both given" }]);
  if (ref.name) {
    const saved = await findMappingByName(actor, ref.name);
    if (!saved) throw new AppError("invalid", `There is no saved mapping named "${ref.name}"`, [{ path: "mapping", message: "unknown mapping name" }]);
    return saved.mapping;
  }
  if (ref.json) {
    let raw: unknown;
    try {
      raw = JSON.parse(ref.json);
    } catch {
      throw new AppError("invalid", "mappingJson is not valid JSON", [{ path: "mappingJson", message: "not valid JSON" }]);
    }
    const r = MappingSchema.safeParse(raw);
    if (!r.success) {
      const e = fromZod(r.error, "The inline mapping is not valid");
      throw new AppError("invalid", e.message, e.issues.map((i) => ({ path: `mappingJson.${i.path}`, message: i.message })));
    }
    return r.data;
  }
  return null;
}

export async function acceptApiUpload(actor: Actor, input: AcceptApiUploadInput): Promise<UploadView> {
  requireCapability(actor, "uploads.create");
  const early = input.mapping instanceof Promise ? null : await resolveMapping(actor, input.mapping);
  const view = await receiveUpload(actor, { fileName: input.fileName, body: input.body, source: "api" });
  const mapping = early ?? (await resolveMapping(actor, await input.mapping)) ?? view.savedMappingMatch?.mapping ?? null;
  if (view.status === "refused") throw new AppError("invalid", `Upload ${view.id} was not accepted: ${view.refusal?.message ?? "unreadable file"}`, [{ path: "file", message: view.refusal?.message ?? "unreadable" }]);
  if (!mapping) {
    throw new AppError("invalid", `Upload ${view.id} is stored but has no mapping: name a saved mapping (?mapping=<name>) or send mappingJson`, [{ path: "mapping", message: "required: no saved mapping matches this file's header" }]);
  }
  try {
    return await submitUpload(actor, view.id, { mapping });
  } catch (e) {
    if (e instanceof AppError) throw new AppError(e.code, `Upload ${view.id}: ${e.message}`, e.issues);
    throw e;
  }
}
