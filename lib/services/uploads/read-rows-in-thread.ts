// readRows on a worker thread (workers/parse-rows.thread.ts), same contract as
// readRows: batches reach `onBatch` in file order and the summary comes back at the
// end. This side feeds the file's chunks on request and acknowledges each batch once
// `onBatch` has settled, so the thread parses one batch ahead, no more.
//
// Threads are kept between uploads (a few idle ones, unreferenced so they never keep
// the process up) and a thread that failed is thrown away. If a new thread cannot
// start (before it asked for any of the file), the rows are parsed here instead:
// same result, one core.
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
const MAX_IDLE = 2;
const idle: Worker[] = [];

function ownsItsMemory(b: Uint8Array): boolean {
  return b.byteOffset === 0 && b.buffer.byteLength === b.byteLength && b.buffer instanceof ArrayBuffer;
}

export function isParseThreadWanted(): boolean {
  return process.env.INGEST_PARSE_THREAD !== "0";
}

/** Start an idle thread ahead of the first upload (the worker process calls this at start). */
export function warmParseThread(): void {
  if (!isParseThreadWanted() || idle.length > 0) return;
  const worker = new Worker(THREAD_FILE);
  worker.on("error", (e) => console.warn(`[ingest] parse thread did not start: ${e.message}`));
  release(worker);
}

function release(worker: Worker): void {
  worker.removeAllListeners("message");
  worker.removeAllListeners("error");
  worker.removeAllListeners("exit");
  if (idle.length >= MAX_IDLE) return void worker.terminate();
  worker.unref();
  worker.once("exit", () => idle.splice(idle.indexOf(worker) >>> 0, 1));
  idle.push(worker);
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
  const reused = idle.pop();
  if (reused) reused.removeAllListeners("exit");
  const worker = reused ?? new Worker(THREAD_FILE);
  worker.ref();
  const chunks = input[Symbol.asyncIterator]();
  let hasStarted = reused !== undefined;
  let startError = "";
  let isSettled = false;

  const result = new Promise<ReadSummary<number> | "fallback">((resolve, reject) => {
    const fail = (e: unknown) => {
      if (isSettled) return;
      isSettled = true;
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
        isSettled = true;
        release(worker);
        resolve(m.summary);
      } else {
        throw new Error(m.message);
      }
    };
    // Pulls are answered at once, on their own chain (the file is read in order);
    // batches and the end are handled in order on another, so a batch waiting for
    // the database never holds up the next chunk.
    let reads: Promise<unknown> = Promise.resolve();
    let queue: Promise<unknown> = Promise.resolve();
    worker.on("message", (m: ThreadMessage) => {
      if (m.type === "pull") reads = reads.then(() => handle(m)).catch(fail);
      else queue = queue.then(() => handle(m)).catch(fail);
    });
    worker.on("error", (e) => {
      startError = e.message;
      if (hasStarted) fail(e);
      else if (!isSettled) {
        isSettled = true;
        resolve("fallback");
      }
    });
    worker.on("exit", (code) => {
      if (isSettled) return;
      if (hasStarted) fail(new Error(`parse thread exited with ${code}`));
      else {
        isSettled = true;
        resolve("fallback");
      }
    });
    worker.postMessage({ type: "start", input: { detection, mapping, wells, options: plain } });
  });
  const outcome = await result;
  if (outcome !== "fallback") return outcome;
  console.warn(`[ingest] parse thread unavailable (${startError || "it exited"}); parsing on the main thread`);
  return readRows<number>({ [Symbol.asyncIterator]: () => chunks }, detection, mapping, createWellKeyResolver(wells), onBatch, options);
}
