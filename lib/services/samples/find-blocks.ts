// The hour blocks of a key-sorted batch: the values of one (well, signal, UTC hour)
// are back to back, so each block is an index range [start, end) of the batch.
// A block is one row of `sample_blocks` (see migration 20261202000006).
import type { ValueColumns } from "@/lib/ingest/value-buffer";

export const HOUR_MS = 3_600_000;
/** The 3-hour rollup's bucket (samples_3h); bins from 2000-01-01 UTC, a whole number of 3 hours from the Unix epoch. */
export const THREE_HOURS_MS = 3 * HOUR_MS;

export interface Blocks {
  length: number;
  wellId: number[];
  signal: number[];
  /** Start of the UTC hour, epoch ms. */
  hour: number[];
  start: number[];
  end: number[];
}

export function hourOf(t: number): number {
  return Math.floor(t / HOUR_MS) * HOUR_MS;
}

/** Blocks of a batch sorted by (well_id, signal, t). */
export function findBlocks(b: ValueColumns<number>): Blocks {
  const out: Blocks = { length: 0, wellId: [], signal: [], hour: [], start: [], end: [] };
  for (let i = 0; i < b.length; i++) {
    const h = hourOf(b.t[i]);
    const k = out.length - 1;
    if (k >= 0 && out.wellId[k] === b.wellId[i] && out.signal[k] === b.signal[i] && out.hour[k] === h) continue;
    if (k >= 0) out.end[k] = i;
    out.wellId.push(b.wellId[i]);
    out.signal.push(b.signal[i]);
    out.hour.push(h);
    out.start.push(i);
    out.end.push(b.length);
    out.length++;
  }
  return out;
}

/** The values of the chosen blocks, as a batch of their own (still key-sorted). */
export function pickBlocks(b: ValueColumns<number>, blocks: Blocks, which: readonly number[]): ValueColumns<number> {
  let n = 0;
  for (const k of which) n += blocks.end[k] - blocks.start[k];
  const wellIds = new Int32Array(n);
  const out: ValueColumns<number> = { length: n, wellId: wellIds, signal: new Uint8Array(n), t: new Float64Array(n), v: new Float64Array(n) };
  let o = 0;
  for (const k of which) {
    for (let i = blocks.start[k]; i < blocks.end[k]; i++, o++) {
      wellIds[o] = b.wellId[i];
      out.signal[o] = b.signal[i];
      out.t[o] = b.t[i];
      out.v[o] = b.v[i];
    }
  }
  return out;
}
