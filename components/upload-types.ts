// The upload as the browser receives it from /api/uploads (JSON: dates are
// ISO strings). Written against the uploads service's view; the readers below
// tolerate missing optional parts so a half-finished upload still renders.
import type { Detection } from "@/lib/ingest/types";
import type { Mapping } from "@/lib/ingest/mapping";

export type UploadStatus = "received" | "refused" | "queued" | "processing" | "done" | "failed";

export interface UploadCounts {
  rowsRead: number;
  valuesStored: number;
  duplicatesMerged: number;
  rejectedByReason: Record<string, number>;
  spans: Record<string, { from: string; to: string }>;
}

export interface SavedMappingRef {
  id: number;
  name: string;
  mapping: Mapping;
}

export interface UploadJson {
  id: number;
  fileName: string;
  byteSize: number;
  status: UploadStatus;
  source?: "browser" | "api";
  uploadedBy?: string | null;
  detection?: Detection | null;
  refusal?: { message: string } | null;
  suggestedMapping?: Mapping | null;
  savedMappingMatch?: SavedMappingRef | null;
  unknownWells?: string[];
  progress?: number;
  counts?: Partial<UploadCounts> | null;
  error?: string | null;
  hasRejections?: boolean;
  mappingNotes?: string[];
  createdAt?: string;
  startedAt?: string | null;
  finishedAt?: string | null;
}

/** Per well id (as text) in counts.spans → the well's name, for display. */
export type WellNames = Record<string, string>;

/** Statuses after which nothing changes without a person acting. */
export function isUploadSettled(status: UploadStatus): boolean {
  return status === "done" || status === "failed" || status === "refused" || status === "received";
}

/** Statuses the worker is (or will be) moving. */
export function isUploadMoving(status: UploadStatus): boolean {
  return status === "queued" || status === "processing";
}

/** The detection, or the plain message of why the file was refused. */
export function readDetection(u: UploadJson): { detection: Detection | null; refusal: string | null } {
  const d = u.detection as (Detection & { message?: string }) | null | undefined;
  if (d && Array.isArray(d.columns)) return { detection: d, refusal: null };
  const message = u.refusal?.message ?? d?.message ?? (u.status === "refused" ? u.error ?? "The file was not accepted." : null);
  return { detection: null, refusal: message };
}

export const UPLOAD_STATUS_LABEL: Record<UploadStatus, string> = {
  received: "Waiting for mapping",
  refused: "Not accepted",
  queued: "Queued",
  processing: "Processing",
  done: "Done",
  failed: "Failed",
};
