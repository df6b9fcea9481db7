// The 15-minute rollup rows of one key-sorted batch, computed in one pass: a batch
// sorted by (well_id, signal, t) holds each series' buckets back to back.
// Used for hours with no stored values yet (see write-sample-batch.ts), whose
// rollup rows can then be inserted as they are.
import type { ValueColumns } from "@/lib/ingest/value-buffer";
import { hourOf } from "./find-blocks";

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


/**
 * The hourly rows from a batch's 15-minute rows (in key order): counts and sums add,
 * min/max combine, first/last come from the earliest/latest quarter, and the time of
 * the minimum (maximum) is the earliest quarter holding it, as the SQL refresh in
 * refresh-hourly-rollup.ts defines them.
 */
export function summarizeHours(q: BucketSummaries): HourSummaries {
  let m = 0;
  const isNewHour = (k: number) =>
    k === 0 || q.wellId[k] !== q.wellId[k - 1] || q.signal[k] !== q.signal[k - 1] || hourOf(q.bucket[k]) !== hourOf(q.bucket[k - 1]);
  for (let k = 0; k < q.length; k++) if (isNewHour(k)) m++;
  const out: HourSummaries = {
    length: m, wellId: new Int32Array(m), signal: new Uint8Array(m), bucket: new Float64Array(m), n: new Int32Array(m),
    vmin: new Float64Array(m), vmax: new Float64Array(m), vsum: new Float64Array(m), vfirst: new Float64Array(m), vlast: new Float64Array(m),
    tmin: new Float64Array(m), tmax: new Float64Array(m),
  };
  let h = -1;
  for (let k = 0; k < q.length; k++) {
    if (isNewHour(k)) {
      h++;
      out.wellId[h] = q.wellId[k];
      out.signal[h] = q.signal[k];
      out.bucket[h] = hourOf(q.bucket[k]);
      out.n[h] = q.n[k];
      out.vmin[h] = q.vmin[k];
      out.vmax[h] = q.vmax[k];
      out.vsum[h] = q.vsum[k];
      out.vfirst[h] = q.vfirst[k];
      out.vlast[h] = q.vlast[k];
      out.tmin[h] = q.bucket[k];
      out.tmax[h] = q.bucket[k];
      continue;
    }
    out.n[h] += q.n[k];
    out.vsum[h] += q.vsum[k];
    // Strictly lower / higher: on a tie the earlier quarter keeps it.
    if (q.vmin[k] < out.vmin[h]) { out.vmin[h] = q.vmin[k]; out.tmin[h] = q.bucket[k]; }
    if (q.vmax[k] > out.vmax[h]) { out.vmax[h] = q.vmax[k]; out.tmax[h] = q.bucket[k]; }
    out.vlast[h] = q.vlast[k];
  }
  return out;
}

/** One samples_3h row per (well, signal, 3-hour bucket) (migration 20261202000007). */
export interface ThreeHourSummaries extends HourSummaries {
  /** Start of the earliest and of the latest hour in the row. */
  hfirst: Float64Array;
  hlast: Float64Array;
}

const THREE_HOURS_MS = 3 * 3_600_000;
/** 3-hour buckets bin from 2000-01-01 UTC, a whole number of 3 hours from the Unix epoch. */
const threeHourOf = (t: number) => Math.floor(t / THREE_HOURS_MS) * THREE_HOURS_MS;

/**
 * The 3-hour rows from a batch's hourly rows (in key order), as the SQL refresh in
 * refresh-three-hour-rollup.ts defines them: counts and sums add, min/max combine
 * (the earliest time on a tie), first/last come from the earliest/latest hour.
 */
export function summarizeThreeHours(h: HourSummaries): ThreeHourSummaries {
  let m = 0;
  const isNew = (k: number) =>
    k === 0 || h.wellId[k] !== h.wellId[k - 1] || h.signal[k] !== h.signal[k - 1] || threeHourOf(h.bucket[k]) !== threeHourOf(h.bucket[k - 1]);
  for (let k = 0; k < h.length; k++) if (isNew(k)) m++;
  const out: ThreeHourSummaries = {
    length: m, wellId: new Int32Array(m), signal: new Uint8Array(m), bucket: new Float64Array(m), n: new Int32Array(m),
    vmin: new Float64Array(m), vmax: new Float64Array(m), vsum: new Float64Array(m), vfirst: new Float64Array(m), vlast: new Float64Array(m),
    tmin: new Float64Array(m), tmax: new Float64Array(m), hfirst: new Float64Array(m), hlast: new Float64Array(m),
  };
  let j = -1;
  for (let k = 0; k < h.length; k++) {
    if (isNew(k)) {
      j++;
      out.wellId[j] = h.wellId[k];
      out.signal[j] = h.signal[k];
      out.bucket[j] = threeHourOf(h.bucket[k]);
      out.n[j] = h.n[k];
      out.vmin[j] = h.vmin[k];
      out.vmax[j] = h.vmax[k];
      out.vsum[j] = h.vsum[k];
      out.vfirst[j] = h.vfirst[k];
      out.vlast[j] = h.vlast[k];
      out.tmin[j] = h.tmin[k];
      out.tmax[j] = h.tmax[k];
      out.hfirst[j] = h.bucket[k];
      out.hlast[j] = h.bucket[k];
      continue;
    }
    out.n[j] += h.n[k];
    out.vsum[j] += h.vsum[k];
    // Hours come in time order, so a later hour's extreme replaces only a strictly better one.
    if (h.vmin[k] < out.vmin[j]) { out.vmin[j] = h.vmin[k]; out.tmin[j] = h.tmin[k]; }
    if (h.vmax[k] > out.vmax[j]) { out.vmax[j] = h.vmax[k]; out.tmax[j] = h.tmax[k]; }
    out.vlast[j] = h.vlast[k];
    out.hlast[j] = h.bucket[k];
  }
  return out;
}
