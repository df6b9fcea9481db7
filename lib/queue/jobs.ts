// Job definitions shared by the web app (producers) and the worker: queue
// name, zod payload schema and version. Handlers must be safe to run twice.
import { z } from "zod";

export const QUEUES = {
  ingest: "ingest",
  diagnose: "diagnose",
  notify: "notify",
} as const;

export const IngestJobSchema = z.object({
  v: z.literal(1),
  uploadId: z.number().int().positive(),
  organizationId: z.number().int().positive(),
});
export type IngestJob = z.infer<typeof IngestJobSchema>;

export const DiagnoseJobSchema = z.object({
  v: z.literal(1),
  organizationId: z.number().int().positive(),
  wellIds: z.array(z.number().int().positive()).optional(),
  fieldId: z.number().int().positive().optional(),
  /** Epoch ms; the rules add their own look-back before `from`. */
  from: z.number().optional(),
  to: z.number().optional(),
  reason: z.enum(["ingest", "schedule", "manual"]),
  requestedBy: z.number().int().positive().nullable().optional(),
});
export type DiagnoseJob = z.infer<typeof DiagnoseJobSchema>;

/** Defaults for every producer: retries with backoff, bounded history. */
export const DEFAULT_JOB_OPTIONS = {
  attempts: 5,
  backoff: { type: "exponential" as const, delay: 2000 },
  removeOnComplete: { count: 1000, age: 7 * 24 * 3600 },
  removeOnFail: { count: 5000 },
};
