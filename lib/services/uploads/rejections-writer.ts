// Stream refused rows to a CSV in storage while the import runs, so the report
// never sits whole in memory. The object is only kept when something was refused.
import { once } from "node:events";
import { PassThrough } from "node:stream";
import { quoteCell } from "@/lib/ingest/write-csv";
import type { Rejection } from "@/lib/ingest/types";
import type { ObjectStorage } from "@/lib/storage/object-storage";

export interface RejectionsWriter {
  write(rows: Rejection[]): Promise<void>;
  /** Finish; resolves the storage key, or null when nothing was written. */
  close(): Promise<string | null>;
  abort(): Promise<void>;
}

const HEADER = "row,column,raw,reason,message\n";

export function createRejectionsWriter(storage: ObjectStorage, key: string): RejectionsWriter {
  let pass: PassThrough | null = null;
  let put: Promise<void> | null = null;
  const open = () => {
    pass = new PassThrough();
    put = storage.put(key, pass);
    put.catch(() => undefined); // awaited in close(); avoid an unhandled rejection meanwhile
    pass.write(HEADER);
    return pass;
  };
  return {
    async write(rows) {
      if (rows.length === 0) return;
      const p = pass ?? open();
      let text = "";
      for (const r of rows) {
        text += `${r.row},${quoteCell(r.column, ",")},${quoteCell(r.raw, ",")},${r.reason},${quoteCell(r.message, ",")}\n`;
      }
      if (!p.write(text)) await once(p, "drain");
    },
    async close() {
      if (!pass || !put) return null;
      (pass as PassThrough).end();
      await put;
      return key;
    },
    async abort() {
      if (!pass || !put) return;
      (pass as PassThrough).destroy(new Error("import aborted"));
      await put.catch(() => undefined);
      await storage.delete(key).catch(() => undefined);
    },
  };
}
