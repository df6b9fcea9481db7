// One batch of accepted values as parallel typed arrays, with in-batch dedupe of
// (well, signal, t) keeping the LAST value. Typed arrays keep a 50 000-value batch at
// about 1 MB and hand straight to a COPY writer.
export type WellId = string | number;

/** Accepted values as parallel arrays: value i is (wellId[i], signal[i], t[i], v[i]). */
export interface ValueColumns<W extends WellId> {
  length: number;
  wellId: W[];
  /** SIGNAL_CODE of each value (lib/signals.ts), as stored in the samples table. */
  signal: Uint8Array;
  /** Epoch milliseconds, UTC. */
  t: Float64Array;
  /** Value in the canonical unit of the signal's quantity. */
  v: Float64Array;
}

/** Growable parallel arrays for one batch, with in-batch dedupe. */
export class ValueBuffer<W extends WellId> {
  length = 0;
  wellId: W[] = [];
  signal = new Uint8Array(1024);
  t = new Float64Array(1024);
  v = new Float64Array(1024);
  private index = new Map<number, Map<number, number>>(); // series → t → position

  /** Returns false when the value replaced an earlier one (a duplicate). */
  add(series: number, wellId: W, code: number, t: number, v: number): boolean {
    let bySeries = this.index.get(series);
    if (bySeries === undefined) {
      bySeries = new Map();
      this.index.set(series, bySeries);
    }
    const at = bySeries.get(t);
    if (at !== undefined) {
      this.v[at] = v; // keep the LAST value seen for this (well, signal, t)
      return false;
    }
    if (this.length === this.t.length) this.grow();
    const i = this.length++;
    bySeries.set(t, i);
    this.wellId.push(wellId);
    this.signal[i] = code;
    this.t[i] = t;
    this.v[i] = v;
    return true;
  }

  private grow(): void {
    const n = this.t.length * 2;
    const s = new Uint8Array(n); s.set(this.signal); this.signal = s;
    const t = new Float64Array(n); t.set(this.t); this.t = t;
    const v = new Float64Array(n); v.set(this.v); this.v = v;
  }

  take(): ValueColumns<W> {
    const out: ValueColumns<W> = {
      length: this.length,
      wellId: this.wellId,
      signal: this.signal.slice(0, this.length),
      t: this.t.slice(0, this.length),
      v: this.v.slice(0, this.length),
    };
    this.length = 0;
    this.wellId = [];
    this.index = new Map();
    return out;
  }
}

