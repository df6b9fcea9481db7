// readRows on a worker thread (workers/parse-rows.thread.ts), same contract as
// readRows: batches reach `onBatch` in file order and the summary comes back at the
// end. This side feeds the file's chunks on request and acknowledges each batch once
// `onBatch` has settled, so the thread parses one batch ahead, no more.
//
// If the thread cannot start (before it asked for any of the file), the rows are
// parsed here instead: same result, one core.
import path from "node:path";
import { Worker } from "node:worker_threads";
import { readRows, type ReadOptions, type ReadSummary, type RowBatch } from "@/lib/ingest/read-rows";
import type { Mapping } from "@/lib/ingest/mapping";
import type { Detection } from "@/lib/ingest/types";
import { createWellKeyResolver, type WellKeyTable } from "@/lib/ingest/well-keys";

type ThreadMessage =
  | { type: "pull" }
  | { type: "batch"; batch: RowBatch<number> }
  | { type: "done"; summary: ReadSummary<number> }
  | { type: "failed"; message: string };

const THREAD_FILE = path.join(__dirname, "..", "..", "..", "workers", "parse-rows.thread.cjs");

function ownsItsMemory(b: Uint8Array): boolean {
  return b.byteOffset === 0 && b.buffer.byteLength === b.byteLength && b.buffer instanceof ArrayBuffer;
}

export function isParseThreadWanted(): boolean {
  return process.env.INGEST_PARSE_THREAD !== "0";
}

export async function readRowsInThread(
  input: AsyncIterable<Uint8Array>,
  detection: Detection,
  mapping: Mapping,
  wells: WellKeyTable,
  onBatch: (batch: RowBatch<number>) => void | Promise<void>,
  options: ReadOptions = {},
): Promise<ReadSummary<number>> {
  const { signal, ...plain } = options;
  const worker = new Worker(THREAD_FILE, {
    workerData: { detection, mapping, wells, options: plain },
  });
  const chunks = input[Symbol.asyncIterator]();
  let hasStarted = false;
  // Messages are handled one at a time, in order.
  let queue: Promise<unknown> = Promise.resolve();

  let startError = "";
  const result = new Promise<ReadSummary<number> | "fallback">((resolve, reject) => {
    const fail = (e: unknown) => {
      reject(e);
      void worker.terminate();
    };
    const handle = async (m: ThreadMessage) => {
      if (signal?.aborted) throw new Error("ingest cancelled");
      if (m.type === "pull") {
        hasStarted = true;
        const r = await chunks.next();
        // Handed over without a copy when the chunk owns its whole memory (a file
        // stream's large reads do); copied when it may share it with other buffers.
        const chunk = r.done ? null : ownsItsMemory(r.value) ? r.value : new Uint8Array(r.value);
        worker.postMessage({ type: "chunk", chunk }, chunk ? [chunk.buffer as ArrayBuffer] : []);
      } else if (m.type === "batch") {
        await onBatch(m.batch);
        worker.postMessage({ type: "ack" });
      } else if (m.type === "done") {
        resolve(m.summary);
        void worker.terminate();
      } else {
        throw new Error(m.message);
      }
    };
    worker.on("message", (m: ThreadMessage) => {
      queue = queue.then(() => handle(m)).catch(fail);
    });
    worker.on("error", (e) => {
      startError = e.message;
      if (hasStarted) fail(e);
      else resolve("fallback");
    });
    worker.on("exit", (code) => {
      if (code !== 0) queue = queue.then(() => (hasStarted ? fail(new Error(`parse thread exited with ${code}`)) : resolve("fallback")));
    });
  });
  const outcome = await result;
  if (outcome !== "fallback") return outcome;
  console.warn(`[ingest] parse thread unavailable (${startError || "it exited"}); parsing on the main thread`);
  return readRows<number>({ [Symbol.asyncIterator]: () => chunks }, detection, mapping, createWellKeyResolver(wells), onBatch, options);
}
