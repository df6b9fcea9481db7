// Assemble the full UploadView: stored state plus the mapping proposal and the
// wells of the file that the register does not know (recomputed on each read, so a
// well added to the register after the upload stops being reported).
import { Organization } from "@/models";
import type { Upload } from "@/models/upload";
import type { Actor } from "@/lib/auth/actor";
import { MappingSchema, type Mapping } from "@/lib/ingest/mapping";
import { suggestMapping } from "@/lib/ingest/suggest-mapping";
import { isValidTimeZone } from "@/lib/ingest/parse-time";
import { findMappingByShape } from "@/lib/services/mappings/find-mapping-by-shape";
import { listFileWellKeys } from "./list-file-well-keys";
import { readStoredDetection, toUploadSummary, type UploadView } from "./upload-view";
import { loadWellIndex } from "./well-index";

async function findDefaultTimeZone(organizationId: number): Promise<string> {
  const org = await Organization.findByPk(organizationId, { attributes: ["settings"] });
  const tz = (org?.settings as { timeZone?: unknown } | undefined)?.timeZone;
  return typeof tz === "string" && isValidTimeZone(tz) ? tz : "UTC";
}

export async function buildUploadView(actor: Actor, u: Upload): Promise<UploadView> {
  const { detection, refusal } = readStoredDetection(u);
  const submitted = u.mapping ? MappingSchema.safeParse(u.mapping) : null;
  const mapping: Mapping | null = submitted?.success ? submitted.data : null;
  let suggestedMapping: Mapping | null = null;
  let isMappingComplete = false;
  let mappingNotes: string[] = [];
  let savedMappingMatch: UploadView["savedMappingMatch"] = null;
  let unknownWells: string[] = [];
  if (detection) {
    const saved = await findMappingByShape(actor, detection.headerShape);
    const savedOk = saved ? MappingSchema.safeParse(saved.mapping) : null;
    if (saved && savedOk?.success) {
      savedMappingMatch = { id: saved.id, name: saved.name, mapping: savedOk.data };
      suggestedMapping = savedOk.data;
      isMappingComplete = true;
      mappingNotes = [`Reusing the saved mapping "${saved.name}" made for files with this header.`];
    } else {
      const s = suggestMapping(detection, { timeZone: await findDefaultTimeZone(u.organization_id) });
      suggestedMapping = s.mapping;
      isMappingComplete = s.isComplete;
      mappingNotes = s.notes;
    }
    const keys = listFileWellKeys(detection, mapping ?? suggestedMapping);
    if (keys.length > 0) {
      const index = await loadWellIndex(u.organization_id, u.well_matches ?? {});
      unknownWells = keys.filter((k) => index.resolve(k) === undefined).sort();
    }
  }
  return {
    ...toUploadSummary(u),
    sha256: u.sha256,
    bytesProcessed: Number(u.bytes_processed),
    detection,
    refusal,
    suggestedMapping,
    isMappingComplete,
    mappingNotes,
    savedMappingMatch,
    mapping,
    unknownWells,
  };
}
