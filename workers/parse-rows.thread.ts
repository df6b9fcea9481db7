// A worker thread that parses uploads' rows (lib/ingest/read-rows.ts) while the
// ingest job's main thread writes the previous batch: on a small machine parsing is
// the costliest part of an import, and this puts it on its own core. The thread
// stays up between uploads (starting one costs about 0.3 s here) and parses one
// upload at a time.
//
// Messages (see lib/services/uploads/read-rows-in-thread.ts for the other side):
//   host → thread  { type: "start", input }         parse one upload
//   thread → host  { type: "pull" }                 send me the next chunk of the file
//   host → thread  { type: "chunk", chunk | null }  a chunk, or null at end of file
//   thread → host  { type: "batch", batch }         a parsed batch (its arrays transferred)
//   host → thread  { type: "ack" }                  that batch is handled
//   thread → host  { type: "done", summary } | { type: "failed", message }
// One chunk is requested ahead, and at most one batch waits for its ack while the
// next one is parsed.
import { parentPort } from "node:worker_threads";
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

type Reply = { type: "chunk"; chunk: Uint8Array | null } | { type: "ack" };
type HostMessage = Reply | { type: "start"; input: ParseThreadInput };

const port = parentPort!;
// Replies come in two independent orders: chunks answer pulls, acks answer batches.
let waiting: Record<Reply["type"], ((m: Reply) => void)[]> = { chunk: [], ack: [] };
const next = (type: Reply["type"]) => new Promise<Reply>((resolve) => waiting[type].push(resolve));

port.on("message", (m: HostMessage) => {
  if (m.type === "start") void parse(m.input);
  else waiting[m.type].shift()?.(m);
});

async function* pullChunks(): AsyncGenerator<Uint8Array> {
  const pull = () => {
    const reply = next("chunk");
    port.postMessage({ type: "pull" });
    return reply;
  };
  let coming = pull();
  for (;;) {
    const m = await coming;
    if (m.type !== "chunk" || m.chunk === null) return;
    coming = pull();
    yield m.chunk;
  }
}

async function parse(input: ParseThreadInput): Promise<void> {
  waiting = { chunk: [], ack: [] };
  let unacked: Promise<Reply> | null = null;
  const sendBatch = async (batch: RowBatch<number>) => {
    if (unacked) await unacked;
    const v = batch.values;
    unacked = next("ack");
    port.postMessage({ type: "batch", batch }, [v.wellId, v.signal, v.t, v.v].map((a) => (a as Int32Array).buffer as ArrayBuffer));
  };
  try {
    const summary = await readRows<number>(pullChunks(), input.detection, input.mapping, createWellKeyResolver(input.wells), sendBatch, input.options);
    if (unacked) await unacked;
    port.postMessage({ type: "done", summary });
  } catch (e) {
    port.postMessage({ type: "failed", message: (e as Error).message });
  }
}
