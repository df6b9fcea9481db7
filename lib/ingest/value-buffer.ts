// One batch of accepted values as parallel typed arrays. Adding is a plain append;
// `take` orders the batch by (well, signal, t) and merges repeats of a key keeping
// the LAST value added. Typed arrays keep a 50 000-value batch at about 1 MB and
// hand straight to a COPY writer, already in the table's key order.
//
// Why sort here rather than index every value in a Map as it arrives: the writer
// needs key order anyway (B-tree inserts in order, see
// lib/services/samples/sort-by-key.ts), and in a historian file each series is
// almost always in time order already, so grouping by series (a counting sort) and
// checking that order is linear; a per-value Map cost more than the parsing.
/** A well's database id. */
export type WellId = number;

/** Accepted values as parallel arrays: value i is (wellId[i], signal[i], t[i], v[i]). */
export interface ValueColumns<W extends WellId> {
  length: number;
  /** Typed arrays in practice (large plain arrays are slow to allocate); any indexable list is read. */
  wellId: ArrayLike<W>;
  /** SIGNAL_CODE of each value (lib/signals.ts), as stored in the samples table. */
  signal: Uint8Array;
  /** Epoch milliseconds, UTC. */
  t: Float64Array;
  /** Value in the canonical unit of the signal's quantity. */
  v: Float64Array;
}

export interface TakenValues<W extends WellId> extends ValueColumns<W> {
  /** Values dropped because a later value had the same (well, signal, t). */
  duplicates: number;
}

/** Growable parallel arrays for one batch. */
export class ValueBuffer<W extends WellId> {
  length = 0;
  private series = new Int32Array(1024);
  private wellId = new Int32Array(1024);
  private signal = new Uint8Array(1024);
  private t = new Float64Array(1024);
  private v = new Float64Array(1024);

  /**
   * Add one value. `series` is the caller's small non-negative id for the
   * (wellId, code) pair: the same pair must always get the same id.
   */
  add(series: number, wellId: W, code: number, t: number, v: number): void {
    if (this.length === this.t.length) this.grow();
    const i = this.length++;
    this.series[i] = series;
    this.wellId[i] = wellId;
    this.signal[i] = code;
    this.t[i] = t;
    this.v[i] = v;
  }

  private grow(): void {
    const n = this.t.length * 2;
    const r = new Int32Array(n); r.set(this.series); this.series = r;
    const w = new Int32Array(n); w.set(this.wellId); this.wellId = w;
    const s = new Uint8Array(n); s.set(this.signal); this.signal = s;
    const t = new Float64Array(n); t.set(this.t); this.t = t;
    const v = new Float64Array(n); v.set(this.v); this.v = v;
  }

  /** The batch in (well, signal, t) order, each key once (the last value added wins); then empty. */
  take(): TakenValues<W> {
    const n = this.length;
    const { series, wellId, signal, t, v } = this;
    let maxSeries = 0;
    for (let i = 0; i < n; i++) if (series[i] > maxSeries) maxSeries = series[i];
    // Counting sort by series (stable: a series keeps the order values were added).
    const count = new Int32Array(maxSeries + 1);
    const firstAt = new Int32Array(maxSeries + 1);
    const present: number[] = [];
    for (let i = 0; i < n; i++) {
      const s = series[i];
      if (count[s]++ === 0) {
        firstAt[s] = i;
        present.push(s);
      }
    }
    present.sort((a, b) => wellId[firstAt[a]] - wellId[firstAt[b]] || signal[firstAt[a]] - signal[firstAt[b]]);
    const next = new Int32Array(maxSeries + 1);
    let offset = 0;
    for (const s of present) {
      next[s] = offset;
      offset += count[s];
    }
    const order = new Int32Array(n);
    for (let i = 0; i < n; i++) order[next[series[i]]++] = i;

    const outWell = new Int32Array(n);
    const out: TakenValues<W> = { length: 0, duplicates: 0, wellId: outWell as unknown as ArrayLike<W>, signal: new Uint8Array(n), t: new Float64Array(n), v: new Float64Array(n) };
    let m = 0;
    let end = 0;
    for (const s of present) {
      const start = end;
      end = start + count[s];
      for (let k = start + 1; k < end; k++) {
        if (t[order[k]] < t[order[k - 1]]) {
          // Out of time order: sort this series by time, ties in the order added.
          const part = Array.from(order.subarray(start, end)).sort((a, b) => t[a] - t[b] || a - b);
          order.set(part, start);
          break;
        }
      }
      for (let k = start; k < end; k++) {
        const i = order[k];
        if (k + 1 < end && t[order[k + 1]] === t[i]) {
          out.duplicates++; // a later value of the same key follows
          continue;
        }
        outWell[m] = wellId[i];
        out.signal[m] = signal[i];
        out.t[m] = t[i];
        out.v[m] = v[i];
        m++;
      }
    }
    // Views, not copies: a batch is short-lived, and fresh memory is the costly part.
    out.length = m;
    out.wellId = outWell.subarray(0, m) as unknown as ArrayLike<W>;
    out.signal = out.signal.subarray(0, m);
    out.t = out.t.subarray(0, m);
    out.v = out.v.subarray(0, m);
    this.length = 0;
    return out;
  }
}
