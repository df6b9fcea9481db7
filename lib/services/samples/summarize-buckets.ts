// The 15-minute rollup rows of one key-sorted batch, computed in one pass: a batch
// sorted by (well_id, signal, t) holds each series' buckets back to back.
// Used for hours with no stored values yet (see write-sample-batch.ts), whose
// rollup rows can then be inserted as they are.
import type { ValueColumns } from "@/lib/ingest/value-buffer";
import { hourOf, THREE_HOURS_MS } from "./find-blocks";

const BUCKET_MS = 15 * 60_000;

/** Rollup rows as parallel typed arrays: what samples_15m and samples_1h rows share. */
export interface SummaryColumns {
  length: number;
  wellId: Int32Array;
  signal: Uint8Array;
  /** Bucket start, epoch ms (15-minute and hour buckets are whole multiples from the Unix epoch, as 2000-01-01 UTC is). */
  bucket: Float64Array;
  n: Int32Array;
  vmin: Float64Array;
  vmax: Float64Array;
  vsum: Float64Array;
  vfirst: Float64Array;
  vlast: Float64Array;
}

/** One samples_15m row per (well, signal, 15-minute bucket), with the times of its first and last value. */
export interface BucketSummaries extends SummaryColumns {
  tfirst: Float64Array;
  tlast: Float64Array;
}

const bucketOf = (t: number) => Math.floor(t / BUCKET_MS) * BUCKET_MS;

const isNewBucket = (b: ValueColumns<number>, i: number) =>
  i === 0 || b.wellId[i] !== b.wellId[i - 1] || b.signal[i] !== b.signal[i - 1] || bucketOf(b.t[i]) !== bucketOf(b.t[i - 1]);

/** Summaries of a batch sorted by (well_id, signal, t) with unique keys. */
export function summarizeBuckets(b: ValueColumns<number>): BucketSummaries {
  // Count first, so the columns are allocated once at their size.
  let m = 0;
  for (let i = 0; i < b.length; i++) if (isNewBucket(b, i)) m++;
  const out: BucketSummaries = {
    length: m, wellId: new Int32Array(m), signal: new Uint8Array(m), bucket: new Float64Array(m), n: new Int32Array(m),
    vmin: new Float64Array(m), vmax: new Float64Array(m), vsum: new Float64Array(m),
    tfirst: new Float64Array(m), vfirst: new Float64Array(m), tlast: new Float64Array(m), vlast: new Float64Array(m),
  };
  let k = -1;
  for (let i = 0; i < b.length; i++) {
    const t = b.t[i];
    const v = b.v[i];
    if (isNewBucket(b, i)) {
      k++;
      out.wellId[k] = b.wellId[i];
      out.signal[k] = b.signal[i];
      out.bucket[k] = bucketOf(t);
      out.n[k] = 1;
      out.vmin[k] = v;
      out.vmax[k] = v;
      out.vsum[k] = v;
      out.tfirst[k] = t;
      out.vfirst[k] = v;
      out.tlast[k] = t;
      out.vlast[k] = v;
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

/** One samples_1h row per (well, signal, hour) (migration 20261202000005). */
export interface HourSummaries extends SummaryColumns {
  /** Start of the earliest 15-minute bucket holding the hour's minimum (maximum). */
  tmin: Float64Array;
  tmax: Float64Array;
}

/** One samples_3h row per (well, signal, 3-hour bucket) (migration 20261202000007). */
export interface ThreeHourSummaries extends HourSummaries {
  /** Start of the earliest and of the latest hour in the row. */
  hfirst: Float64Array;
  hlast: Float64Array;
}

const threeHourOf = (t: number) => Math.floor(t / THREE_HOURS_MS) * THREE_HOURS_MS;

/**
 * Coarser rows from finer ones in key order (rows of one bin are back to back):
 * counts and sums add, min/max combine, first/last come from the earliest/latest
 * row, the time of the minimum (maximum) is the earliest row's `tmin` (`tmax`)
 * holding it, and hfirst/hlast are the bucket starts of the first and last row.
 */
function coarsen(src: SummaryColumns, binOf: (t: number) => number, tmin: Float64Array, tmax: Float64Array): ThreeHourSummaries {
  const isNew = (k: number) =>
    k === 0 || src.wellId[k] !== src.wellId[k - 1] || src.signal[k] !== src.signal[k - 1] || binOf(src.bucket[k]) !== binOf(src.bucket[k - 1]);
  let m = 0;
  for (let k = 0; k < src.length; k++) if (isNew(k)) m++;
  const out: ThreeHourSummaries = {
    length: m, wellId: new Int32Array(m), signal: new Uint8Array(m), bucket: new Float64Array(m), n: new Int32Array(m),
    vmin: new Float64Array(m), vmax: new Float64Array(m), vsum: new Float64Array(m), vfirst: new Float64Array(m), vlast: new Float64Array(m),
    tmin: new Float64Array(m), tmax: new Float64Array(m), hfirst: new Float64Array(m), hlast: new Float64Array(m),
  };
  let j = -1;
  for (let k = 0; k < src.length; k++) {
    if (isNew(k)) {
      j++;
      out.wellId[j] = src.wellId[k];
      out.signal[j] = src.signal[k];
      out.bucket[j] = binOf(src.bucket[k]);
      out.n[j] = src.n[k];
      out.vmin[j] = src.vmin[k];
      out.vmax[j] = src.vmax[k];
      out.vsum[j] = src.vsum[k];
      out.vfirst[j] = src.vfirst[k];
      out.vlast[j] = src.vlast[k];
      out.tmin[j] = tmin[k];
      out.tmax[j] = tmax[k];
      out.hfirst[j] = src.bucket[k];
      out.hlast[j] = src.bucket[k];
      continue;
    }
    out.n[j] += src.n[k];
    out.vsum[j] += src.vsum[k];
    // Rows come in time order: strictly lower / higher, so on a tie the earlier row keeps it.
    if (src.vmin[k] < out.vmin[j]) { out.vmin[j] = src.vmin[k]; out.tmin[j] = tmin[k]; }
    if (src.vmax[k] > out.vmax[j]) { out.vmax[j] = src.vmax[k]; out.tmax[j] = tmax[k]; }
    out.vlast[j] = src.vlast[k];
    out.hlast[j] = src.bucket[k];
  }
  return out;
}

/**
 * The hourly rows from a batch's 15-minute rows (in key order), as the SQL refresh
 * in refresh-hourly-rollup.ts defines them: the time of the minimum (maximum) is the
 * start of the earliest quarter holding it.
 */
export function summarizeHours(q: BucketSummaries): HourSummaries {
  return coarsen(q, hourOf, q.bucket, q.bucket);
}

/**
 * The 3-hour rows from a batch's hourly rows (in key order), as the SQL refresh in
 * refresh-three-hour-rollup.ts defines them, with the first and last hour of each.
 */
export function summarizeThreeHours(h: HourSummaries): ThreeHourSummaries {
  return coarsen(h, threeHourOf, h.tmin, h.tmax);
}
