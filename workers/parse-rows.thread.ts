// A worker thread that parses one upload's rows (lib/ingest/read-rows.ts) while the
// ingest job's main thread writes the previous batch: on a small machine parsing is
// the costliest part of an import, and this puts it on its own core.
//
// Messages (see lib/services/uploads/read-rows-in-thread.ts for the other side):
//   thread → host  { type: "pull" }                 send me the next chunk of the file
//   host → thread  { type: "chunk", chunk | null }  a chunk, or null at end of file
//   thread → host  { type: "batch", batch }         a parsed batch (its arrays transferred)
//   host → thread  { type: "ack" }                  that batch is handled
//   thread → host  { type: "done", summary } | { type: "failed", message }
// At most one batch waits for its ack while the next one is parsed.
import { parentPort, workerData } from "node:worker_threads";
import { readRows, type ReadOptions, type RowBatch } from "@/lib/ingest/read-rows";
import type { Mapping } from "@/lib/ingest/mapping";
import type { Detection } from "@/lib/ingest/types";
import { createWellKeyResolver, type WellKeyTable } from "@/lib/ingest/well-keys";

export interface ParseThreadInput {
  detection: Detection;
  mapping: Mapping;
  wells: WellKeyTable;
  options: Omit<ReadOptions, "signal">;
}

type HostMessage = { type: "chunk"; chunk: Uint8Array | null } | { type: "ack" };

const port = parentPort!;
const input = workerData as ParseThreadInput;
const waiting: ((m: HostMessage) => void)[] = [];
port.on("message", (m: HostMessage) => waiting.shift()?.(m));
const next = () => new Promise<HostMessage>((resolve) => waiting.push(resolve));

async function* pullChunks(): AsyncGenerator<Uint8Array> {
  for (;;) {
    const reply = next();
    port.postMessage({ type: "pull" });
    const m = await reply;
    if (m.type !== "chunk" || m.chunk === null) return;
    yield m.chunk;
  }
}

let unacked: Promise<HostMessage> | null = null;

async function sendBatch(batch: RowBatch<number>): Promise<void> {
  if (unacked) await unacked;
  const v = batch.values;
  unacked = next();
  port.postMessage({ type: "batch", batch }, [v.wellId, v.signal, v.t, v.v].map((a) => (a as Int32Array).buffer as ArrayBuffer));
}

readRows<number>(pullChunks(), input.detection, input.mapping, createWellKeyResolver(input.wells), sendBatch, input.options)
  .then(async (summary) => {
    if (unacked) await unacked;
    port.postMessage({ type: "done", summary });
  })
  .catch((e: Error) => port.postMessage({ type: "failed", message: e.message }));
