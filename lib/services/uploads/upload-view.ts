// What the UI and the public API see of an upload: plain JSON-ready objects.
import type { Upload, UploadCountsJson, UploadSource, UploadStatus } from "@/models/upload";
import type { Mapping } from "@/lib/ingest/mapping";
import type { Detection, DetectionFailure } from "@/lib/ingest/types";

export interface SavedMappingMatch {
  id: number;
  name: string;
  mapping: Mapping;
}

export interface UploadSummary {
  id: number;
  fileName: string;
  byteSize: number;
  status: UploadStatus;
  source: UploadSource;
  progress: number;
  counts: UploadCountsJson | null;
  error: string | null;
  hasRejections: boolean;
  createdAt: string;
  startedAt: string | null;
  finishedAt: string | null;
}

export interface UploadView extends UploadSummary {
  sha256: string;
  bytesProcessed: number;
  /** How the file reads, or null when it was refused (see `refusal`). */
  detection: Detection | null;
  refusal: DetectionFailure | null;
  /** The saved mapping for this header shape when there is one, else our proposal. */
  suggestedMapping: Mapping | null;
  /** Whether suggestedMapping already passes MappingSchema (a wide file may need its well). */
  isMappingComplete: boolean;
  mappingNotes: string[];
  savedMappingMatch: SavedMappingMatch | null;
  /** The mapping submitted for import, once submitted. */
  mapping: Mapping | null;
  /** Well keys in the file's head that match no registered well (name or UWI) nor a confirmed match. */
  unknownWells: string[];
  /** Set when the upload is kept but could not be handed to the worker yet. */
  notice?: string;
}

export function toUploadSummary(u: Upload): UploadSummary {
  return {
    id: u.id,
    fileName: u.file_name,
    byteSize: Number(u.byte_size),
    status: u.status,
    source: u.source,
    progress: u.progress,
    counts: u.counts,
    error: u.error,
    hasRejections: !!u.rejections_key,
    createdAt: u.created_at.toISOString(),
    startedAt: u.started_at?.toISOString() ?? null,
    finishedAt: u.finished_at?.toISOString() ?? null,
  };
}

/** The stored detection column holds either a Detection or the refusal. */
export function readStoredDetection(u: Upload): { detection: Detection | null; refusal: DetectionFailure | null } {
  const d = u.detection as (Detection & Partial<DetectionFailure>) | null;
  if (d && Array.isArray(d.columns)) return { detection: d, refusal: null };
  if (d && typeof d.message === "string") return { detection: null, refusal: { code: d.code ?? "not_csv", message: d.message } as DetectionFailure };
  return { detection: null, refusal: null };
}
