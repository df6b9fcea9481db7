// The ingest job's body (run by workers/ingest.worker.ts, and in-process by the
// benchmark): stream the stored file through readRows and upsert every batch.
//
// Safe to run twice and from several workers:
// - a session-level advisory lock on the upload id lets one process work on an
//   upload at a time (it is released when that process's connection ends, so a
//   killed worker frees it at once);
// - every batch is an idempotent upsert, so a re-run after a crash stores exactly
//   the file's values again, no more.
//
// Counts (stored in uploads.counts):
// - valuesStored: values written by this run: new (well, signal, t) keys plus keys
//   whose stored value differed and was replaced (the file's value wins);
// - duplicatesMerged: values that added nothing: a repeat of the same (well, signal,
//   t) later in the same batch (the last one is kept), or a key already stored with
//   the identical value (an earlier batch of this file, an earlier run of it, or
//   another upload). So re-importing a file counts all of its values here.
// - rejectedByReason: refused cells and rows by reason (details in the rejections CSV).
import { Upload } from "@/models";
import type { UploadCountsJson } from "@/models/upload";
import { readRows, type ReadCounts, type RowBatch } from "@/lib/ingest/read-rows";
import type { ValueColumns } from "@/lib/ingest/value-buffer";
import { MappingSchema } from "@/lib/ingest/mapping";
import type { Detection } from "@/lib/ingest/types";
import { getStorage } from "@/lib/storage/get-storage";
import { StorageNotFoundError } from "@/lib/storage/object-storage";
import { openSampleClient } from "@/lib/services/samples/sample-db";
import { OpenHourHolder } from "@/lib/services/samples/hold-open-hours";
import { writeSampleBatch } from "@/lib/services/samples/write-sample-batch";
import { createRejectionsWriter } from "./rejections-writer";
import { isParseThreadWanted, readRowsInThread } from "./read-rows-in-thread";
import { loadWellIndex } from "./well-index";

/** A problem with the file or its mapping: retrying will not help. */
export class IngestRefusedError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "IngestRefusedError";
  }
}

/** Another process holds this upload; try again later. */
export class UploadBusyError extends Error {
  constructor(id: number) {
    super(`upload ${id} is being imported by another worker`);
    this.name = "UploadBusyError";
  }
}

export interface ProcessResult {
  status: "done" | "skipped";
  counts?: UploadCountsJson;
  wellIds?: number[];
  from?: number;
  to?: number;
}

export interface ProcessOptions {
  signal?: AbortSignal;
  /** Values per batch (default 50 000). */
  batchSize?: number;
  /** Called after each stored batch, e.g. to renew a job lock. */
  onBatch?: () => Promise<void> | void;
}

// Advisory-lock namespace for uploads (any constant shared by all workers).
const LOCK_NAMESPACE = 0x1e57;
const PROGRESS_EVERY_MS = 1000;

function toCountsJson(c: ReadCounts<number>, valuesStored: number, unchanged: number): UploadCountsJson {
  const rejectedByReason: Record<string, number> = {};
  for (const [reason, n] of Object.entries(c.rejected)) if (n > 0) rejectedByReason[reason] = n;
  const spans: UploadCountsJson["spans"] = {};
  for (const [wellId, s] of c.wells) spans[String(wellId)] = { from: new Date(s.first).toISOString(), to: new Date(s.last).toISOString() };
  return { rowsRead: c.rowsRead, valuesStored, duplicatesMerged: c.duplicatesMerged + unchanged, rejectedByReason, spans };
}

async function* countBytes(input: AsyncIterable<Buffer>, onBytes: (n: number) => void): AsyncGenerator<Buffer> {
  for await (const chunk of input) {
    onBytes(chunk.length);
    yield chunk;
  }
}

export async function processUpload(uploadId: number, organizationId: number, options: ProcessOptions = {}): Promise<ProcessResult> {
  const upload = await Upload.findOne({ where: { id: uploadId, organization_id: organizationId } });
  // Gone, never submitted, or already imported: a repeated delivery does nothing.
  if (!upload || upload.status === "done" || upload.status === "received" || upload.status === "refused") return { status: "skipped" };

  const client = await openSampleClient();
  try {
    const lock = await client.query<{ ok: boolean }>("SELECT pg_try_advisory_lock($1, $2) AS ok", [LOCK_NAMESPACE, uploadId]);
    if (!lock.rows[0].ok) throw new UploadBusyError(uploadId);
    // Another worker may have finished it while we waited for the lock.
    await upload.reload();
    if ((upload.status as string) === "done") return { status: "skipped" };

    const parsed = MappingSchema.safeParse(upload.mapping);
    if (!parsed.success) throw new IngestRefusedError("The saved mapping of this upload is not valid any more; submit the upload again with a corrected mapping");
    const detection = upload.detection as Detection;
    if (!detection || !Array.isArray(detection.columns)) throw new IngestRefusedError("This file was not accepted at upload; it cannot be imported");

    const storage = getStorage();
    let source;
    try {
      source = await storage.get(upload.storage_key);
    } catch (e) {
      if (e instanceof StorageNotFoundError) throw new IngestRefusedError("The uploaded file is no longer in storage; send it again");
      throw e;
    }
    await upload.update({ status: "processing", started_at: new Date(), finished_at: null, progress: 0, bytes_processed: 0, error: null, counts: null, rejections_key: null });

    const wells = await loadWellIndex(organizationId, upload.well_matches ?? {});
    const byteSize = Math.max(1, Number(upload.byte_size));
    const rejections = createRejectionsWriter(storage, `rejections/${organizationId}/upload-${uploadId}.csv`);
    let bytesRead = 0;
    let valuesStored = 0;
    let unchanged = 0;
    let lastProgressAt = Date.now();
    let inFlight: Promise<void> = Promise.resolve();
    const hours = new OpenHourHolder();
    const writeAll = (values: ValueColumns<number>): Promise<void> =>
      writeSampleBatch(client, values, { isFlushDeferred: true }).then((r) => {
        valuesStored += r.written;
        unchanged += r.unchanged;
      });
    // Time the reader spent waiting for the database: near the total, the database
    // is the bottleneck; near zero, parsing is.
    let dbWaitMs = 0;
    const startedAt = performance.now();

    try {
      const onBatch = async (batch: RowBatch<number>) => {
        // Pipelined: the database writes this batch while the rows of the next are
        // parsed (on the parse thread, or here when it is off). At most one write is in
        // flight, so at most two batches (three with the thread's) are in memory.
        const waitStart = performance.now();
        await inFlight;
        dbWaitMs += performance.now() - waitStart;
        const { ready, duplicates } = hours.next(batch.values);
        unchanged += duplicates;
        inFlight = writeAll(ready);
        inFlight.catch(() => undefined); // awaited on the next batch or at the end
        await rejections.write(batch.rejections);
        await options.onBatch?.();
        if (Date.now() - lastProgressAt >= PROGRESS_EVERY_MS) {
          lastProgressAt = Date.now();
          await upload.update({
            progress: Math.min(0.99, bytesRead / byteSize),
            bytes_processed: bytesRead,
            counts: toCountsJson(batch.counts, valuesStored, unchanged),
          });
        }
      };
      const readOptions = { batchSize: options.batchSize ?? 50_000, rejectionDetailLimit: 100_000, signal: options.signal };
      const input = countBytes(source, (n) => (bytesRead += n));
      const summary = await (isParseThreadWanted()
        ? readRowsInThread(input, detection, parsed.data, wells.table, onBatch, readOptions)
        : readRows<number>(input, detection, parsed.data, (key) => wells.resolve(key), onBatch, readOptions)
      ).finally(() => inFlight.catch(() => undefined));
      await inFlight;
      if (!summary.refusal) await writeAll(hours.flush());
      if (summary.refusal) {
        const where = summary.refusal.column ? ` (line ${summary.refusal.row}, column "${summary.refusal.column}")` : ` (line ${summary.refusal.row})`;
        throw new IngestRefusedError(`${upload.file_name}: ${summary.refusal.message}${where}. Fix the mapping and submit again.`);
      }
      const counts = toCountsJson(summary, valuesStored, unchanged);
      const rejectionsKey = await rejections.close();
      let from = Infinity;
      let to = -Infinity;
      for (const s of summary.wells.values()) {
        from = Math.min(from, s.first);
        to = Math.max(to, s.last);
      }
      console.log(`[ingest] upload ${uploadId}: ${summary.valuesAccepted} values in ${((performance.now() - startedAt) / 1000).toFixed(1)} s, ${(dbWaitMs / 1000).toFixed(1)} s of it waiting for the database`);
      await upload.update({ status: "done", progress: 1, bytes_processed: bytesRead, counts, rejections_key: rejectionsKey, finished_at: new Date(), error: null });
      const wellIds = [...summary.wells.keys()];
      return { status: "done", counts, wellIds, from: wellIds.length ? from : undefined, to: wellIds.length ? to : undefined };
    } catch (e) {
      await rejections.abort();
      throw e;
    } finally {
      source.destroy();
    }
  } finally {
    // Ending the connection also releases the advisory lock.
    await client.end().catch(() => undefined);
  }
}

/** Record a final failure on the upload (the file stays in storage for a retry). */
export async function markUploadFailed(uploadId: number, message: string): Promise<void> {
  await Upload.update({ status: "failed", error: message, finished_at: new Date() }, { where: { id: uploadId } });
}
