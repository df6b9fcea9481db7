// PostgreSQL binary COPY rows for (well_id int4, signal int2, t timestamptz, v float8).
// Binary spares the server from parsing numbers and dates as text and spares us
// from formatting them: each row is 40 bytes written straight into a Buffer.
// Format: PostgreSQL documentation, "COPY — Binary Format" (signature, flags,
// header extension, then per tuple a field count and length-prefixed fields; a
// timestamptz is int64 microseconds since 2000-01-01 00:00 UTC).
import type { ValueColumns } from "@/lib/ingest/value-buffer";

const SIGNATURE = Buffer.from([0x50, 0x47, 0x43, 0x4f, 0x50, 0x59, 0x0a, 0xff, 0x0d, 0x0a, 0x00]);
const PG_EPOCH_MS = Date.UTC(2000, 0, 1);
const ROW_BYTES = 2 + (4 + 4) + (4 + 2) + (4 + 8) + (4 + 8);
const TWO_32 = 4294967296;

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

/** Rows [start, end) of the batch as binary COPY tuples. */
export function encodeCopyRows(batch: ValueColumns<number>, start: number, end: number): Buffer {
  const b = Buffer.allocUnsafe((end - start) * ROW_BYTES);
  let o = 0;
  for (let i = start; i < end; i++) {
    o = b.writeInt16BE(4, o);
    o = b.writeInt32BE(4, o);
    o = b.writeInt32BE(batch.wellId[i], o);
    o = b.writeInt32BE(2, o);
    o = b.writeInt16BE(batch.signal[i], o);
    // Microseconds since 2000-01-01 as a 64-bit integer, split in two 32-bit halves
    // (exact: |µs| stays far below 2^53 for any plausible date).
    const us = Math.round(batch.t[i] - PG_EPOCH_MS) * 1000;
    const hi = Math.floor(us / TWO_32);
    o = b.writeInt32BE(8, o);
    o = b.writeInt32BE(hi, o);
    o = b.writeUInt32BE(us - hi * TWO_32, o);
    o = b.writeInt32BE(8, o);
    o = b.writeDoubleBE(batch.v[i], o);
  }
  return b;
}
