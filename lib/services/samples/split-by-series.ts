// Split a key-sorted batch into `parts` batches by series, so several connections
// can write at once. A series always goes to the same part (by well and signal),
// so one connection writes all of a series' batches in file order and "last write
// wins" still holds; parts never share a series, so they never wait on each
// other's series locks. Each part keeps the input's order.
import type { ValueColumns } from "@/lib/ingest/value-buffer";

export function partOfSeries(wellId: number, signal: number, parts: number): number {
  return (wellId * 31 + signal) % parts;
}

export function splitBySeries(b: ValueColumns<number>, parts: number): ValueColumns<number>[] {
  if (parts <= 1) return [b];
  const which = new Uint8Array(b.length);
  const sizes = new Array<number>(parts).fill(0);
  for (let i = 0; i < b.length; i++) sizes[(which[i] = partOfSeries(b.wellId[i], b.signal[i], parts))]++;
  const out = sizes.map((n) => ({ length: 0, wellId: new Int32Array(n), signal: new Uint8Array(n), t: new Float64Array(n), v: new Float64Array(n) }));
  for (let i = 0; i < b.length; i++) {
    const o = out[which[i]];
    const k = o.length++;
    o.wellId[k] = b.wellId[i];
    o.signal[k] = b.signal[i];
    o.t[k] = b.t[i];
    o.v[k] = b.v[i];
  }
  return out;
}
