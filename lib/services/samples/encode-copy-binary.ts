// PostgreSQL binary COPY rows for `sample_blocks` (well_id int4, signal int2,
// hour timestamptz, ts timestamptz[], vs float8[]) and `samples_15m`.
// Binary spares the server from parsing numbers and dates as text and spares us
// from formatting them.
// Format: PostgreSQL documentation, "COPY — Binary Format" (signature, flags,
// header extension, then per tuple a field count and length-prefixed fields; a
// timestamptz is int64 microseconds since 2000-01-01 00:00 UTC). An array field is
// array_send's layout (src/backend/utils/adt/arrayfuncs.c): ndim, has-nulls flag,
// element type OID, then per dimension its length and lower bound, then each
// element length-prefixed.
import type { ValueColumns } from "@/lib/ingest/value-buffer";
import type { Blocks } from "./find-blocks";
import type { BucketSummaries } from "./summarize-buckets";

const SIGNATURE = Buffer.from([0x50, 0x47, 0x43, 0x4f, 0x50, 0x59, 0x0a, 0xff, 0x0d, 0x0a, 0x00]);
const PG_EPOCH_MS = Date.UTC(2000, 0, 1);
const TWO_32 = 4294967296;
const TIMESTAMPTZ_OID = 1184; // pg_type.oid of timestamptz
const FLOAT8_OID = 701; // pg_type.oid of float8
const ARRAY_HEADER = 20;

export function encodeCopyHeader(): Buffer {
  const b = Buffer.alloc(SIGNATURE.length + 8);
  SIGNATURE.copy(b, 0);
  // flags (int32 0) and header extension length (int32 0) are already zero.
  return b;
}

export function encodeCopyTrailer(): Buffer {
  const b = Buffer.alloc(2);
  b.writeInt16BE(-1, 0);
  return b;
}

/** A timestamptz value (without its length word): µs since 2000-01-01 as int64. */
function writeTimestamp(b: Buffer, o: number, ms: number): number {
  // Split in two 32-bit halves (exact: |µs| stays far below 2^53 for any plausible date).
  const us = Math.round(ms - PG_EPOCH_MS) * 1000;
  const hi = Math.floor(us / TWO_32);
  o = b.writeInt32BE(hi, o);
  return b.writeUInt32BE(us - hi * TWO_32, o);
}

function writeArrayHeader(b: Buffer, o: number, oid: number, n: number): number {
  o = b.writeInt32BE(1, o); // one dimension
  o = b.writeInt32BE(0, o); // no NULL elements
  o = b.writeInt32BE(oid, o);
  o = b.writeInt32BE(n, o);
  return b.writeInt32BE(1, o); // lower bound 1
}

const blockBytes = (n: number) => 2 + (4 + 4) + (4 + 2) + (4 + 8) + 2 * (4 + ARRAY_HEADER + 12 * n);

/** The chosen blocks of a key-sorted batch as sample_blocks tuples. */
export function encodeBlockRows(batch: ValueColumns<number>, blocks: Blocks, which: readonly number[]): Buffer {
  let size = 0;
  for (const k of which) size += blockBytes(blocks.end[k] - blocks.start[k]);
  const b = Buffer.allocUnsafe(size);
  let o = 0;
  for (const k of which) {
    const a = blocks.start[k];
    const z = blocks.end[k];
    const n = z - a;
    o = b.writeInt16BE(5, o);
    o = b.writeInt32BE(4, o);
    o = b.writeInt32BE(blocks.wellId[k], o);
    o = b.writeInt32BE(2, o);
    o = b.writeInt16BE(blocks.signal[k], o);
    o = b.writeInt32BE(8, o);
    o = writeTimestamp(b, o, blocks.hour[k]);
    o = b.writeInt32BE(ARRAY_HEADER + 12 * n, o);
    o = writeArrayHeader(b, o, TIMESTAMPTZ_OID, n);
    for (let i = a; i < z; i++) {
      o = b.writeInt32BE(8, o);
      o = writeTimestamp(b, o, batch.t[i]);
    }
    o = b.writeInt32BE(ARRAY_HEADER + 12 * n, o);
    o = writeArrayHeader(b, o, FLOAT8_OID, n);
    for (let i = a; i < z; i++) {
      o = b.writeInt32BE(8, o);
      o = b.writeDoubleBE(batch.v[i], o);
    }
  }
  return b;
}

const ROLLUP_ROW_BYTES = 2 + (4 + 4) + (4 + 2) + (4 + 8) + (4 + 4) + 5 * (4 + 8) + 2 * (4 + 8);

/** Rows [start, end) of bucket summaries as samples_15m tuples
 * (well_id, signal, bucket, n, vmin, vmax, vsum, vfirst, vlast, tfirst, tlast). */
export function encodeRollupRows(s: BucketSummaries, start: number, end: number): Buffer {
  const b = Buffer.allocUnsafe((end - start) * ROLLUP_ROW_BYTES);
  let o = 0;
  for (let k = start; k < end; k++) {
    o = b.writeInt16BE(11, o);
    o = b.writeInt32BE(4, o);
    o = b.writeInt32BE(s.wellId[k], o);
    o = b.writeInt32BE(2, o);
    o = b.writeInt16BE(s.signal[k], o);
    o = b.writeInt32BE(8, o);
    o = writeTimestamp(b, o, s.bucket[k]);
    o = b.writeInt32BE(4, o);
    o = b.writeInt32BE(s.n[k], o);
    for (const x of [s.vmin[k], s.vmax[k], s.vsum[k], s.vfirst[k], s.vlast[k]]) {
      o = b.writeInt32BE(8, o);
      o = b.writeDoubleBE(x, o);
    }
    o = b.writeInt32BE(8, o);
    o = writeTimestamp(b, o, s.tfirst[k]);
    o = b.writeInt32BE(8, o);
    o = writeTimestamp(b, o, s.tlast[k]);
  }
  return b;
}
