// Keep samples_1h (the hourly rollup, migration 20261202000005) in step with
// samples_15m: recompute every hour that overlaps each written series range from
// its 15-minute rows; then the 3-hour rollup over those hours from the hourly rows,
// with a new version number for each written series (refresh-three-hour-rollup.ts),
// which tells the web app's chart cache that its answers for that series are out of
// date. Call it right after the 15-minute rollup, in the same transaction, so it
// sees the buckets that write just stored and the per-series locks the writer holds
// keep two writers from interleaving.
//
// Definitions, per (well, signal, hour), over the hour's 15-minute rows:
//   n, vmin, vmax, vsum     sum of counts, least minimum, greatest maximum, sum of sums;
//   vfirst, vlast           first value of the earliest row, last value of the latest;
//   tmin, tmax              start of the earliest row that holds the hour's minimum
//                           (maximum): the chart orders each bucket's extremes by them.
import type pg from "pg";
import { HOUR_MS } from "./find-blocks";
import { mergeSeriesRanges } from "./merge-series-ranges";
import { refreshThreeHourRollup } from "./refresh-three-hour-rollup";

// LATERAL makes it one primary-key range scan of samples_15m per series (as the
// 15-minute rollup does on samples). First/last and arg-min/arg-max use min/max of
// two-element arrays (compared element by element) instead of a sort per group.
// A negated time in the max() picks the earliest hour-part on a tie.
// The 3-hour refresh is a second statement: it must read the hourly rows this one
// writes, and every part of one statement sees the snapshot taken before it.
const REFRESH_SQL = `
INSERT INTO samples_1h (well_id, signal, bucket, n, vmin, vmax, vsum, vfirst, vlast, tmin, tmax)
SELECT r.well_id, r.signal, x.bucket, x.n, x.vmin, x.vmax, x.vsum, x.vfirst, x.vlast, x.tmin, x.tmax
FROM unnest($1::int[], $2::smallint[], $3::float8[], $4::float8[]) AS r(well_id, signal, lo_ms, hi_ms)
CROSS JOIN LATERAL (
  SELECT date_bin('1 hour', q.bucket, timestamptz '2000-01-01Z') AS bucket,
         sum(q.n)::int AS n, min(q.vmin) AS vmin, max(q.vmax) AS vmax, sum(q.vsum) AS vsum,
         (min(array[extract(epoch FROM q.bucket)::float8, q.vfirst]))[2] AS vfirst,
         (max(array[extract(epoch FROM q.bucket)::float8, q.vlast]))[2] AS vlast,
         to_timestamp((min(array[q.vmin, extract(epoch FROM q.bucket)::float8]))[2]) AS tmin,
         to_timestamp(-(max(array[q.vmax, -extract(epoch FROM q.bucket)::float8]))[2]) AS tmax
  FROM samples_15m q
  WHERE q.well_id = r.well_id AND q.signal = r.signal
    AND q.bucket >= to_timestamp(r.lo_ms / 1000.0) AND q.bucket < to_timestamp(r.hi_ms / 1000.0)
  GROUP BY 1
) x
ORDER BY 1, 2, 3
ON CONFLICT (well_id, signal, bucket) DO UPDATE
SET n = EXCLUDED.n, vmin = EXCLUDED.vmin, vmax = EXCLUDED.vmax, vsum = EXCLUDED.vsum,
    vfirst = EXCLUDED.vfirst, vlast = EXCLUDED.vlast, tmin = EXCLUDED.tmin, tmax = EXCLUDED.tmax`;

/**
 * Recompute the hourly rollup over every hour overlapping each series range
 * [los[i], his[i]) of (wellIds[i], signals[i]) from samples_15m, then the 3-hour
 * rollup over those hours, and renew each series' version (two statements).
 * Ranges are those the 15-minute rollup was just recomputed over (15-minute aligned);
 * they may overlap (merged first).
 */
export async function refreshHourlyRollup(
  client: pg.ClientBase,
  r: { wellIds: number[]; signals: number[]; los: Date[]; his: Date[] },
): Promise<void> {
  if (r.wellIds.length === 0) return;
  const hours = mergeSeriesRanges({ wellIds: r.wellIds, signals: r.signals, los: r.los.map((d) => d.getTime()), his: r.his.map((d) => d.getTime()) }, HOUR_MS);
  await client.query(REFRESH_SQL, [hours.wellIds, hours.signals, hours.los, hours.his]);
  await refreshThreeHourRollup(client, hours);
}
