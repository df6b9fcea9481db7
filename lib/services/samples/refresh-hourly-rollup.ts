// Keep samples_1h (the hourly rollup, migration 20261202000005) in step with
// samples_15m: recompute every hour that overlaps each written series range from
// its 15-minute rows, and give each written series a new version number
// (sample_series_versions), which tells the web app's chart cache that its answers
// for that series are out of date. Call it right after the 15-minute rollup, in the
// same transaction, so it sees the buckets that write just stored and the
// per-series locks the writer holds keep two writers from interleaving.
//
// Definitions, per (well, signal, hour), over the hour's 15-minute rows:
//   n, vmin, vmax, vsum     sum of counts, least minimum, greatest maximum, sum of sums;
//   vfirst, vlast           first value of the earliest row, last value of the latest;
//   tmin, tmax              start of the earliest row that holds the hour's minimum
//                           (maximum): the chart orders each bucket's extremes by them.
import type pg from "pg";

const HOUR_MS = 3_600_000;

// LATERAL makes it one primary-key range scan of samples_15m per series (as the
// 15-minute rollup does on samples). First/last and arg-min/arg-max use min/max of
// two-element arrays (compared element by element) instead of a sort per group.
// A negated time in the max() picks the earliest hour-part on a tie.
// The version bump rides in the same statement (a data-modifying WITH runs to
// completion whether or not the outer query reads it).
const REFRESH_SQL = `
WITH r AS (
  SELECT * FROM unnest($1::int[], $2::smallint[], $3::timestamptz[], $4::timestamptz[]) AS r(well_id, signal, lo, hi)
), hourly AS (
INSERT INTO samples_1h AS h (well_id, signal, bucket, n, vmin, vmax, vsum, vfirst, vlast, tmin, tmax)
SELECT r.well_id, r.signal, x.bucket, x.n, x.vmin, x.vmax, x.vsum, x.vfirst, x.vlast, x.tmin, x.tmax
FROM r
CROSS JOIN LATERAL (
  SELECT date_bin('1 hour', q.bucket, timestamptz '2000-01-01Z') AS bucket,
         sum(q.n)::int AS n, min(q.vmin) AS vmin, max(q.vmax) AS vmax, sum(q.vsum) AS vsum,
         (min(array[extract(epoch FROM q.bucket)::float8, q.vfirst]))[2] AS vfirst,
         (max(array[extract(epoch FROM q.bucket)::float8, q.vlast]))[2] AS vlast,
         to_timestamp((min(array[q.vmin, extract(epoch FROM q.bucket)::float8]))[2]) AS tmin,
         to_timestamp(-(max(array[q.vmax, -extract(epoch FROM q.bucket)::float8]))[2]) AS tmax
  FROM samples_15m q
  WHERE q.well_id = r.well_id AND q.signal = r.signal AND q.bucket >= r.lo AND q.bucket < r.hi
  GROUP BY 1
) x
ORDER BY 1, 2, 3
ON CONFLICT (well_id, signal, bucket) DO UPDATE
SET n = EXCLUDED.n, vmin = EXCLUDED.vmin, vmax = EXCLUDED.vmax, vsum = EXCLUDED.vsum,
    vfirst = EXCLUDED.vfirst, vlast = EXCLUDED.vlast, tmin = EXCLUDED.tmin, tmax = EXCLUDED.tmax
)
INSERT INTO sample_series_versions (well_id, signal, version)
SELECT well_id, signal, nextval('sample_series_version_seq') FROM (SELECT DISTINCT well_id, signal FROM r ORDER BY 1, 2) s
ON CONFLICT (well_id, signal) DO UPDATE SET version = EXCLUDED.version`;

/** The whole hours covering [lo, hi): hours bin from 2000-01-01 UTC, a whole number of hours from the Unix epoch. */
function widenToHours(lo: Date, hi: Date): [Date, Date] {
  return [new Date(Math.floor(lo.getTime() / HOUR_MS) * HOUR_MS), new Date(Math.ceil(hi.getTime() / HOUR_MS) * HOUR_MS)];
}

/**
 * Recompute the hourly rollup over every hour overlapping each series range
 * [los[i], his[i]) of (wellIds[i], signals[i]) from samples_15m, and renew each
 * series' version (one statement).
 * Ranges are those the 15-minute rollup was just recomputed over (15-minute aligned).
 */
export async function refreshHourlyRollup(
  client: pg.ClientBase,
  r: { wellIds: number[]; signals: number[]; los: Date[]; his: Date[] },
): Promise<void> {
  if (r.wellIds.length === 0) return;
  const los: Date[] = [];
  const his: Date[] = [];
  for (let i = 0; i < r.wellIds.length; i++) {
    const [lo, hi] = widenToHours(r.los[i], r.his[i]);
    los.push(lo);
    his.push(hi);
  }
  await client.query(REFRESH_SQL, [r.wellIds, r.signals, los, his]);
}

// A new version for each series (one sequence, so a number never repeats).
const BUMP_SQL = `
INSERT INTO sample_series_versions (well_id, signal, version)
SELECT well_id, signal, nextval('sample_series_version_seq')
FROM (SELECT DISTINCT w AS well_id, s AS signal FROM unnest($1::int[], $2::smallint[]) AS u(w, s) ORDER BY 1, 2) x
ON CONFLICT (well_id, signal) DO UPDATE SET version = EXCLUDED.version`;

/** Renew the version of each (wellIds[i], signals[i]) series: its chart answers are out of date. */
export async function bumpSeriesVersions(client: pg.ClientBase, wellIds: number[], signals: number[]): Promise<void> {
  if (wellIds.length > 0) await client.query(BUMP_SQL, [wellIds, signals]);
}
