// The 15-minute rollup rows of one key-sorted batch, computed in one pass: a batch
// sorted by (well_id, signal, t) holds each series' buckets back to back.
// Used when every value of the batch is new, so each bucket's summary can be
// folded into the stored one (see write-sample-batch.ts) instead of re-reading
// the bucket's samples from the table.
import type { ValueColumns } from "@/lib/ingest/value-buffer";

export const BUCKET_MS = 15 * 60_000;

/** One row per (well, signal, bucket), as parallel arrays ready for unnest(). */
export interface BucketSummaries {
  wellId: number[];
  signal: number[];
  /** Bucket start, epoch ms (multiples of 15 minutes from the Unix epoch, as 2000-01-01 UTC is). */
  bucket: number[];
  n: number[];
  vmin: number[];
  vmax: number[];
  vsum: number[];
  tfirst: number[];
  vfirst: number[];
  tlast: number[];
  vlast: number[];
}

/** Summaries of a batch sorted by (well_id, signal, t) with unique keys. */
export function summarizeBuckets(b: ValueColumns<number>): BucketSummaries {
  const out: BucketSummaries = { wellId: [], signal: [], bucket: [], n: [], vmin: [], vmax: [], vsum: [], tfirst: [], vfirst: [], tlast: [], vlast: [] };
  let k = -1;
  let w = NaN;
  let s = NaN;
  let bucket = NaN;
  for (let i = 0; i < b.length; i++) {
    const t = b.t[i];
    const v = b.v[i];
    const start = Math.floor(t / BUCKET_MS) * BUCKET_MS;
    if (b.wellId[i] !== w || b.signal[i] !== s || start !== bucket) {
      w = b.wellId[i];
      s = b.signal[i];
      bucket = start;
      k++;
      out.wellId.push(w);
      out.signal.push(s);
      out.bucket.push(start);
      out.n.push(1);
      out.vmin.push(v);
      out.vmax.push(v);
      out.vsum.push(v);
      out.tfirst.push(t);
      out.vfirst.push(v);
      out.tlast.push(t);
      out.vlast.push(v);
      continue;
    }
    out.n[k]++;
    if (v < out.vmin[k]) out.vmin[k] = v;
    if (v > out.vmax[k]) out.vmax[k] = v;
    out.vsum[k] += v;
    // Sorted by time within the series: the latest value so far is the last.
    out.tlast[k] = t;
    out.vlast[k] = v;
  }
  return out;
}
