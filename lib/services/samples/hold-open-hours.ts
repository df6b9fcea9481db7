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

const empty = (): ValueColumns<number> => ({ length: 0, wellId: [], signal: new Uint8Array(0), t: new Float64Array(0), v: new Float64Array(0) });

/** -1, 0, 1 as row i of a is before, at, after row j of b in (well, signal, t) order. */
function compareRows(a: ValueColumns<number>, i: number, b: ValueColumns<number>, j: number): number {
  return Math.sign(a.wellId[i] - b.wellId[j] || a.signal[i] - b.signal[j] || a.t[i] - b.t[j]);
}

export class OpenHourHolder {
  private held = empty();

  /** The values ready to write: held values merged with `batch` (both key-sorted), minus each series' latest hour. */
  next(batch: ValueColumns<number>): { ready: ValueColumns<number>; duplicates: number } {
    const { merged, duplicates } = mergeSorted(this.held, batch);
    const keep = new Uint8Array(merged.length);
    // Walk each series run backwards from its end while still in its latest hour.
    for (let z = merged.length; z > 0; ) {
      const w = merged.wellId[z - 1];
      const s = merged.signal[z - 1];
      const last = hourOf(merged.t[z - 1]);
      let i = z - 1;
      while (i >= 0 && merged.wellId[i] === w && merged.signal[i] === s && hourOf(merged.t[i]) === last) keep[i--] = 1;
      while (i >= 0 && merged.wellId[i] === w && merged.signal[i] === s) i--;
      z = i + 1;
    }
    const [held, ready] = split(merged, keep);
    this.held = held;
    return { ready, duplicates };
  }

  /** Everything still held (end of file). */
  flush(): ValueColumns<number> {
    const out = this.held;
    this.held = empty();
    return out;
  }
}

function mergeSorted(a: ValueColumns<number>, b: ValueColumns<number>): { merged: ValueColumns<number>; duplicates: number } {
  if (a.length === 0) return { merged: b, duplicates: 0 };
  const n = a.length + b.length;
  const out: ValueColumns<number> = { length: 0, wellId: [], signal: new Uint8Array(n), t: new Float64Array(n), v: new Float64Array(n) };
  let i = 0;
  let j = 0;
  let duplicates = 0;
  const take = (c: ValueColumns<number>, k: number) => {
    const o = out.length++;
    out.wellId.push(c.wellId[k]);
    out.signal[o] = c.signal[k];
    out.t[o] = c.t[k];
    out.v[o] = c.v[k];
  };
  while (i < a.length || j < b.length) {
    const c = i >= a.length ? 1 : j >= b.length ? -1 : compareRows(a, i, b, j);
    if (c < 0) take(a, i++);
    else if (c > 0) take(b, j++);
    else {
      take(b, j++); // the later batch's value wins
      i++;
      duplicates++;
    }
  }
  out.signal = out.signal.slice(0, out.length);
  out.t = out.t.slice(0, out.length);
  out.v = out.v.slice(0, out.length);
  return { merged: out, duplicates };
}

/** [rows where keep is 1, rows where it is 0], each in input order. */
function split(b: ValueColumns<number>, keep: Uint8Array): [ValueColumns<number>, ValueColumns<number>] {
  let k = 0;
  for (let i = 0; i < b.length; i++) k += keep[i];
  const make = (n: number): ValueColumns<number> => ({ length: 0, wellId: [], signal: new Uint8Array(n), t: new Float64Array(n), v: new Float64Array(n) });
  const yes = make(k);
  const no = make(b.length - k);
  for (let i = 0; i < b.length; i++) {
    const o = keep[i] ? yes : no;
    const m = o.length++;
    o.wellId.push(b.wellId[i]);
    o.signal[m] = b.signal[i];
    o.t[m] = b.t[i];
    o.v[m] = b.v[i];
  }
  return [yes, no];
}
