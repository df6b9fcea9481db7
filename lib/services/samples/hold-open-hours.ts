// Between the batches of one file import, hold back each series' latest hour.
//
// Samples are stored per hour (sample_blocks). A file's batches cut series at any
// minute, so without this the next batch would find the hour it continues already
// stored and take the slower merge path. Held values join the next batch (the
// later value of a repeated time wins, and is counted as a merged duplicate) and
// the series' hours before its latest are released. For a file in time order per
// series every hour is written once, as a new block; `flush` releases the rest at
// the end. Memory: at most one hour of values per series.
import type { ValueColumns } from "@/lib/ingest/value-buffer";
import { hourOf } from "./find-blocks";

const empty = (): ValueColumns<number> => ({ length: 0, wellId: new Int32Array(0), signal: new Uint8Array(0), t: new Float64Array(0), v: new Float64Array(0) });

/** Growable-by-bound output columns: at most `n` rows. */
class Out {
  length = 0;
  wellId: Int32Array;
  signal: Uint8Array;
  t: Float64Array;
  v: Float64Array;
  constructor(n: number) {
    this.wellId = new Int32Array(n);
    this.signal = new Uint8Array(n);
    this.t = new Float64Array(n);
    this.v = new Float64Array(n);
  }
  push(c: ValueColumns<number>, i: number): void {
    const o = this.length++;
    this.wellId[o] = c.wellId[i];
    this.signal[o] = c.signal[i];
    this.t[o] = c.t[i];
    this.v[o] = c.v[i];
  }
  /** Rows [from, to) of c, appended. */
  copy(c: ValueColumns<number>, from: number, to: number): void {
    if (to <= from) return;
    const o = this.length;
    for (let k = from; k < to; k++) this.wellId[o + k - from] = c.wellId[k];
    this.signal.set(c.signal.subarray(from, to), o);
    this.t.set(c.t.subarray(from, to), o);
    this.v.set(c.v.subarray(from, to), o);
    this.length += to - from;
  }
  done(): ValueColumns<number> {
    return { length: this.length, wellId: this.wellId.subarray(0, this.length), signal: this.signal.subarray(0, this.length), t: this.t.subarray(0, this.length), v: this.v.subarray(0, this.length) };
  }
}

/** First index in [from, to) whose time is at or after `t` (times ascending there), else `to`. */
function firstAtOrAfter(times: Float64Array, from: number, to: number, t: number): number {
  let k = to;
  while (k > from && times[k - 1] >= t) k--;
  return k;
}

/** End of the run of rows with the same (well, signal) as row i. */
function runEnd(c: ValueColumns<number>, i: number): number {
  let z = i + 1;
  while (z < c.length && c.wellId[z] === c.wellId[i] && c.signal[z] === c.signal[i]) z++;
  return z;
}

export class OpenHourHolder {
  private held = empty();

  /** The values ready to write: held values merged with `batch` (both key-sorted), minus each series' latest hour. */
  next(batch: ValueColumns<number>): { ready: ValueColumns<number>; duplicates: number } {
    const a = this.held;
    const b = batch;
    const n = a.length + b.length;
    const ready = new Out(n);
    const held = new Out(n);
    let duplicates = 0;
    // One series at a time, in key order, from whichever input has it.
    let i = 0;
    let j = 0;
    while (i < a.length || j < b.length) {
      const order = i >= a.length ? 1 : j >= b.length ? -1 : Math.sign(a.wellId[i] - b.wellId[j] || a.signal[i] - b.signal[j]);
      const az = order <= 0 ? runEnd(a, i) : i;
      const bz = order >= 0 ? runEnd(b, j) : j;
      if (az === i || bz === j || a.t[az - 1] < b.t[j]) {
        // The usual case: only one input has the series, or the new values all come
        // after the held ones; the series' latest hour is then that of its last row.
        const latest = hourOf(bz > j ? b.t[bz - 1] : a.t[az - 1]);
        // Rows before the first one in the latest hour are ready; the rest are held.
        const ak = firstAtOrAfter(a.t, i, az, latest);
        const bk = firstAtOrAfter(b.t, j, bz, latest);
        ready.copy(a, i, ak);
        ready.copy(b, j, bk);
        held.copy(a, ak, az);
        held.copy(b, bk, bz);
      } else {
        const m = mergeRuns(a, i, az, b, j, bz);
        duplicates += m.duplicates;
        const src = m.merged;
        const k = firstAtOrAfter(src.t, 0, src.length, hourOf(src.t[src.length - 1]));
        ready.copy(src, 0, k);
        held.copy(src, k, src.length);
      }
      i = az;
      j = bz;
    }
    this.held = held.done();
    return { ready: ready.done(), duplicates };
  }

  /** Everything still held (end of file). */
  flush(): ValueColumns<number> {
    const out = this.held;
    this.held = empty();
    return out;
  }
}

/** Merge one series' held rows [i, az) of a and new rows [j, bz) of b by time; on a tie the new value wins. */
function mergeRuns(a: ValueColumns<number>, i: number, az: number, b: ValueColumns<number>, j: number, bz: number): { merged: ValueColumns<number>; duplicates: number } {
  const out = new Out(az - i + bz - j);
  let duplicates = 0;
  while (i < az || j < bz) {
    if (j >= bz || (i < az && a.t[i] < b.t[j])) out.push(a, i++);
    else if (i >= az || b.t[j] < a.t[i]) out.push(b, j++);
    else {
      out.push(b, j++); // the later batch's value wins
      i++;
      duplicates++;
    }
  }
  return { merged: out.done(), duplicates };
}
