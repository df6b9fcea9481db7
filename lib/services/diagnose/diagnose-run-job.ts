// The diagnose job payload as this worker reads it: the shared DiagnoseJobSchema
// (lib/queue/jobs.ts) plus the optional diagnose_runs row a person's request made,
// so the worker reports progress on the row the page is polling.
import { z } from "zod";
import { DiagnoseJobSchema } from "@/lib/queue/jobs";

export const DiagnoseRunJobSchema = DiagnoseJobSchema.extend({
  runId: z.number().int().positive().optional(),
});
export type DiagnoseRunJob = z.infer<typeof DiagnoseRunJobSchema>;

/** Job name of the hourly sweep that fans out one scheduled diagnosis per organization. */
export const SWEEP_JOB_NAME = "diagnose-sweep";
export const SWEEP_SCHEDULER_ID = "diagnose-hourly-sweep";
