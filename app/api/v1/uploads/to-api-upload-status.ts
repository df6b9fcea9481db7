import type { UploadView } from "@/lib/services/uploads/upload-view";
import type { ApiUploadStatus } from "@/lib/validations/public-api";

/** The public API's view of an upload: no detection internals. */
export function toApiUploadStatus(u: UploadView): ApiUploadStatus {
  return {
    id: u.id,
    fileName: u.fileName,
    byteSize: u.byteSize,
    status: u.status,
    progress: u.progress,
    counts: u.counts,
    error: u.error ?? u.refusal?.message ?? null,
    hasRejections: u.hasRejections,
    createdAt: u.createdAt,
    startedAt: u.startedAt,
    finishedAt: u.finishedAt,
  };
}
