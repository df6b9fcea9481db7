// Hand an upload to the ingest worker. The job id is `upload-<id>`, so however often
// this runs (a double submit, the start-up sweep) the upload is in the queue once.
// A finished job of the same id (a failed earlier try) is removed first, since
// BullMQ would otherwise treat the new add as a duplicate and drop it.
import type { Queue } from "bullmq";
import { IngestJobSchema, QUEUES } from "@/lib/queue/jobs";
import { getQueue } from "@/lib/queue/queues";

export function ingestJobId(uploadId: number): string {
  return `upload-${uploadId}`;
}

/** Resolves "added" or "already-queued"; rejects when Redis cannot be reached. */
export async function enqueueIngest(uploadId: number, organizationId: number, queue: Queue = getQueue(QUEUES.ingest)): Promise<"added" | "already-queued"> {
  const jobId = ingestJobId(uploadId);
  const existing = await queue.getJob(jobId);
  if (existing) {
    const state = await existing.getState();
    if (state !== "completed" && state !== "failed" && state !== "unknown") return "already-queued";
    await existing.remove();
  }
  await queue.add("ingest", IngestJobSchema.parse({ v: 1, uploadId, organizationId }), { jobId });
  return "added";
}
