// Keep samples_3h (the 3-hour rollup, migration 20261202000007) in step with
// samples_1h, and give each written series a new version number
// (sample_series_versions), which tells the web app's chart cache that its answers
// for that series are out of date. Call it once the hourly rows of the written hours
// are final in the writer's transaction: it reads them, and the per-series locks the
// writer holds keep two writers from interleaving.
//
// A 3-hour bucket is recomputed from ALL of its stored hourly rows, not only the
// written ones: a file's hours arrive one batch at a time, so a bucket may already
// hold hours from earlier batches.
//
// Definitions, per (well, signal, 3-hour bucket), over its hourly rows:
//   n, vmin, vmax, vsum     sum of counts, least minimum, greatest maximum, sum of sums;
//   vfirst, vlast           first value of the earliest hour, last value of the latest;
//   tmin, tmax              tmin (tmax) of the hour holding the least minimum (greatest
//                           maximum), the earliest on a tie: the start of the earliest
//                           15-minute bucket holding the extreme, as in samples_1h;
//   hfirst, hlast           start of the earliest and of the latest hour.
//
// New hours (nothing of them stored yet) take the cheaper way, addThreeHourParts:
// their partial rows, computed in the writer, are combined with the stored rows.
import type pg from "pg";
import { THREE_HOURS_MS } from "./find-blocks";
import { mergeSeriesRanges, type SeriesRanges } from "./merge-series-ranges";
import type { ThreeHourSummaries } from "./summarize-buckets";


// LATERAL makes it one primary-key range scan of samples_1h per range. First/last and
// arg-min/arg-max use min/max of two-element arrays (compared element by element)
// instead of a sort per group; a negated time in the max() picks the earliest time on
// a tie. The version bump rides in the same statement, so the 3-hour table costs the
// writer no extra round trip: a data-modifying WITH runs to completion whether or
// not the outer query reads it (and neither part reads what the other writes).
const REFRESH_SQL = `
WITH r AS (
  SELECT * FROM unnest($1::int[], $2::smallint[], $3::float8[], $4::float8[]) AS r(well_id, signal, lo_ms, hi_ms)
), rollup AS (
INSERT INTO samples_3h (well_id, signal, bucket, n, vmin, vmax, vsum, vfirst, vlast, tmin, tmax, hfirst, hlast)
SELECT r.well_id, r.signal, x.bucket, x.n, x.vmin, x.vmax, x.vsum, x.vfirst, x.vlast, x.tmin, x.tmax, x.hfirst, x.hlast
FROM r
CROSS JOIN LATERAL (
  SELECT date_bin('3 hours', h.bucket, timestamptz '2000-01-01Z') AS bucket,
         sum(h.n)::int AS n, min(h.vmin) AS vmin, max(h.vmax) AS vmax, sum(h.vsum) AS vsum,
         (min(array[extract(epoch FROM h.bucket)::float8, h.vfirst]))[2] AS vfirst,
         (max(array[extract(epoch FROM h.bucket)::float8, h.vlast]))[2] AS vlast,
         to_timestamp((min(array[h.vmin, extract(epoch FROM h.tmin)::float8]))[2]) AS tmin,
         to_timestamp(-(max(array[h.vmax, -extract(epoch FROM h.tmax)::float8]))[2]) AS tmax,
         min(h.bucket) AS hfirst, max(h.bucket) AS hlast
  FROM samples_1h h
  WHERE h.well_id = r.well_id AND h.signal = r.signal
    AND h.bucket >= to_timestamp(r.lo_ms / 1000.0) AND h.bucket < to_timestamp(r.hi_ms / 1000.0)
  GROUP BY 1
) x
ORDER BY 1, 2, 3
ON CONFLICT (well_id, signal, bucket) DO UPDATE
SET n = EXCLUDED.n, vmin = EXCLUDED.vmin, vmax = EXCLUDED.vmax, vsum = EXCLUDED.vsum,
    vfirst = EXCLUDED.vfirst, vlast = EXCLUDED.vlast, tmin = EXCLUDED.tmin, tmax = EXCLUDED.tmax,
    hfirst = EXCLUDED.hfirst, hlast = EXCLUDED.hlast
)
INSERT INTO sample_series_versions (well_id, signal, version)
SELECT well_id, signal, nextval('sample_series_version_seq') FROM (SELECT DISTINCT well_id, signal FROM r ORDER BY 1, 2) s
ON CONFLICT (well_id, signal) DO UPDATE SET version = EXCLUDED.version`;

/**
 * Recompute the 3-hour rollup over every 3-hour bucket overlapping each series range
 * [los[i], his[i]) (epoch ms) of (wellIds[i], signals[i]) from samples_1h, and renew
 * each of those series' versions (one statement). Ranges may overlap and come in any
 * order: they are widened to whole 3-hour buckets and merged first.
 */
export async function refreshThreeHourRollup(client: pg.ClientBase, ranges: SeriesRanges): Promise<void> {
  if (ranges.wellIds.length === 0) return;
  const r = mergeSeriesRanges(ranges, THREE_HOURS_MS);
  await client.query(REFRESH_SQL, [r.wellIds, r.signals, r.los, r.his]);
}

// Partial 3-hour rows of new hours combined with the stored rows. Valid only because
// the hours are new: nothing of them is in a stored row yet. Every SET expression
// reads the stored row's values from before the update. The version bump rides along.
const ADD_PARTS_SQL = `
WITH p AS (
  SELECT * FROM unnest($1::int[], $2::smallint[], $3::float8[], $4::int[], $5::float8[], $6::float8[], $7::float8[],
                       $8::float8[], $9::float8[], $10::float8[], $11::float8[], $12::float8[], $13::float8[])
    AS p(well_id, signal, bucket, n, vmin, vmax, vsum, vfirst, vlast, tmin, tmax, hfirst, hlast)
), rollup AS (
INSERT INTO samples_3h AS h (well_id, signal, bucket, n, vmin, vmax, vsum, vfirst, vlast, tmin, tmax, hfirst, hlast)
SELECT well_id, signal, to_timestamp(bucket / 1000.0), n, vmin, vmax, vsum, vfirst, vlast,
       to_timestamp(tmin / 1000.0), to_timestamp(tmax / 1000.0), to_timestamp(hfirst / 1000.0), to_timestamp(hlast / 1000.0)
FROM p
ORDER BY 1, 2, 3
ON CONFLICT (well_id, signal, bucket) DO UPDATE
SET n = h.n + EXCLUDED.n, vsum = h.vsum + EXCLUDED.vsum,
    vmin = least(h.vmin, EXCLUDED.vmin),
    tmin = CASE WHEN EXCLUDED.vmin < h.vmin OR (EXCLUDED.vmin = h.vmin AND EXCLUDED.tmin < h.tmin) THEN EXCLUDED.tmin ELSE h.tmin END,
    vmax = greatest(h.vmax, EXCLUDED.vmax),
    tmax = CASE WHEN EXCLUDED.vmax > h.vmax OR (EXCLUDED.vmax = h.vmax AND EXCLUDED.tmax < h.tmax) THEN EXCLUDED.tmax ELSE h.tmax END,
    vfirst = CASE WHEN EXCLUDED.hfirst < h.hfirst THEN EXCLUDED.vfirst ELSE h.vfirst END,
    hfirst = least(h.hfirst, EXCLUDED.hfirst),
    vlast = CASE WHEN EXCLUDED.hlast > h.hlast THEN EXCLUDED.vlast ELSE h.vlast END,
    hlast = greatest(h.hlast, EXCLUDED.hlast)
)
INSERT INTO sample_series_versions (well_id, signal, version)
SELECT well_id, signal, nextval('sample_series_version_seq') FROM (SELECT DISTINCT well_id, signal FROM p ORDER BY 1, 2) s
ON CONFLICT (well_id, signal) DO UPDATE SET version = EXCLUDED.version`;

/**
 * Add the 3-hour partial rows of hours that had no stored values (summarizeThreeHours
 * of their hourly rows) to samples_3h, and renew each of those series' versions (one
 * statement). For hours already stored, use refreshThreeHourRollup instead.
 */
export async function addThreeHourParts(client: pg.ClientBase, p: ThreeHourSummaries): Promise<void> {
  if (p.length === 0) return;
  const list = (a: ArrayLike<number>) => Array.from(a);
  await client.query(ADD_PARTS_SQL, [
    list(p.wellId), list(p.signal), list(p.bucket), list(p.n), list(p.vmin), list(p.vmax), list(p.vsum),
    list(p.vfirst), list(p.vlast), list(p.tmin), list(p.tmax), list(p.hfirst), list(p.hlast),
  ]);
}
