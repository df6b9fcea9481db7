// The `ingest` queue: import one submitted upload (lib/services/uploads/process-upload.ts),
// then ask for a diagnosis of the wells and time range it touched.
//
// Failures: a problem with the file or mapping fails at once (no retry) with the
// message stored on the upload; anything else (database or storage unreachable) is
// retried with backoff and only the last attempt marks the upload failed. The file
// is always kept so the person can submit it again.
import { UnrecoverableError, type Job } from "bullmq";
import { DiagnoseJobSchema, IngestJobSchema, QUEUES } from "@/lib/queue/jobs";
import { getQueue } from "@/lib/queue/queues";
import { IngestRefusedError, markUploadFailed, processUpload, UploadBusyError } from "@/lib/services/uploads/process-upload";
import { requeueStuckUploads } from "@/lib/services/uploads/requeue-stuck-uploads";
import { warmParseThread } from "@/lib/services/uploads/read-rows-in-thread";
import { findUploadSubmitter, markUploadRetrying } from "@/lib/services/uploads/mark-upload-retrying";
import type { Processor } from "./registry";

const SWEEP_EVERY_MS = 60_000;

async function processIngestJob(job: Job): Promise<unknown> {
  const data = IngestJobSchema.parse(job.data);
  const isLastAttempt = job.attemptsMade + 1 >= (job.opts.attempts ?? 1);
  try {
    const result = await processUpload(data.uploadId, data.organizationId, {
      // Keep the job's lock fresh during long files (BullMQ also renews it on a timer).
      onBatch: () => job.updateProgress(Date.now()).then(() => undefined),
    });
    if (result.status === "done" && result.wellIds && result.wellIds.length > 0) {
      await getQueue(QUEUES.diagnose).add(
        "diagnose",
        DiagnoseJobSchema.parse({
          v: 1,
          organizationId: data.organizationId,
          wellIds: result.wellIds,
          from: result.from,
          to: result.to,
          reason: "ingest",
          requestedBy: await findUploadSubmitter(data.uploadId),
        }),
      );
    }
    return { status: result.status, counts: result.counts };
  } catch (e) {
    if (e instanceof UploadBusyError) throw e; // retried later; the other holder finishes it
    const message = e instanceof Error ? e.message : String(e);
    if (e instanceof IngestRefusedError) {
      await markUploadFailed(data.uploadId, message);
      throw new UnrecoverableError(message);
    }
    if (isLastAttempt) {
      await markUploadFailed(data.uploadId, `The import failed after ${job.attemptsMade + 1} tries: ${message}. The file is kept; submit it again once the problem is fixed.`);
    } else {
      await markUploadRetrying(data.uploadId, message);
    }
    throw e;
  }
}

async function startIngest(): Promise<void> {
  warmParseThread();
  await startSweep();
}

async function startSweep(): Promise<void> {
  const sweep = () =>
    requeueStuckUploads().then(
      (r) => { if (r.requeued.length || r.failed.length) console.log(`[ingest] sweep: requeued ${r.requeued.join(",") || "none"}; failed ${r.failed.join(",") || "none"}`); },
      (e: Error) => console.warn(`[ingest] sweep skipped: ${e.message}`),
    );
  await sweep();
  setInterval(() => void sweep(), SWEEP_EVERY_MS).unref();
}

export const ingestProcessor: Processor = {
  queue: QUEUES.ingest,
  process: processIngestJob,
  concurrency: Number(process.env.INGEST_CONCURRENCY ?? 1),
  onStart: startIngest,
};
