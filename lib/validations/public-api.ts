// Response shapes of the public API (/api/v1). The OpenAPI document is generated
// from these and from the request schemas beside them, so the docs cannot drift.
import { z } from "zod";

export const ApiErrorSchema = z.object({
  error: z.object({
    code: z.string().describe("unauthenticated, forbidden, not_found, invalid, conflict, too_large, unavailable, bad_request, internal"),
    message: z.string(),
    issues: z.array(z.object({ path: z.string(), message: z.string() })).optional(),
  }),
});

export const UploadCountsSchema = z.object({
  rowsRead: z.number().int(),
  valuesStored: z.number().int().describe("values written: new keys plus stored keys whose value changed"),
  duplicatesMerged: z.number().int().describe("repeats within the file plus values already stored with the identical value"),
  rejectedByReason: z.record(z.string(), z.number().int()),
  spans: z.record(z.string(), z.object({ from: z.string(), to: z.string() })).describe("per well id: first and last time imported"),
});

export const UploadStatusEnum = z.enum(["received", "refused", "queued", "processing", "done", "failed"]);

export const ApiUploadStatusSchema = z.object({
  id: z.number().int(),
  fileName: z.string(),
  byteSize: z.number().int(),
  status: UploadStatusEnum,
  progress: z.number().min(0).max(1),
  counts: UploadCountsSchema.nullable(),
  error: z.string().nullable(),
  hasRejections: z.boolean(),
  createdAt: z.string(),
  startedAt: z.string().nullable(),
  finishedAt: z.string().nullable(),
});
export type ApiUploadStatus = z.infer<typeof ApiUploadStatusSchema>;

export const UploadAcceptedSchema = z.object({
  id: z.number().int(),
  status: UploadStatusEnum,
  statusUrl: z.string().describe("GET this to follow the import"),
  notice: z.string().optional().describe("set when the upload is kept but waits for the import queue"),
});

export const IngestSamplesResultSchema = z.object({
  received: z.number().int(),
  valuesStored: z.number().int(),
  duplicatesMerged: z.number().int(),
  rejected: z.number().int(),
  errors: z.array(z.object({ index: z.number().int(), path: z.string(), message: z.string() })),
  isDiagnoseQueued: z.boolean(),
});
