// The SQL behind a trend: counts, raw values and min/max buckets of one well's
// signals over a time range. Every query is a prefix-plus-range read on a primary
// key, samples (well_id, signal, t) or samples_15m (well_id, signal, bucket), so
// PostgreSQL prunes to the months in range and walks one index per partition.
// Times leave the database as epoch ms (float8) so no Date objects are built per row.
import type pg from "pg";
import { ROLLUP_BUCKET_MS } from "@/lib/trends/bucket-plan";
import { isMinFirst, type MinMaxBucket } from "@/lib/trends/minmax-points";

/** The rollup's bucket origin (write-sample-batch.ts bins from 2000-01-01 UTC). */
const ORIGIN = "timestamptz '2000-01-01Z'";

export interface SeriesQuery {
  wellId: number;
  codes: number[];
  fromMs: number;
  toMs: number;
}

const params = (q: SeriesQuery) => [q.wellId, q.codes, new Date(q.fromMs), new Date(q.toMs)];

/** Stored values per signal in the range, from the rollup's counts (edge buckets may add a few). */
export async function countRawValues(db: pg.Pool | pg.ClientBase, q: SeriesQuery): Promise<Map<number, number>> {
  const r = await db.query<{ signal: number; n: string }>(
    `SELECT signal, sum(n) AS n FROM samples_15m
     WHERE well_id = $1 AND signal = ANY($2::smallint[])
       AND bucket >= date_bin(interval '${ROLLUP_BUCKET_MS} milliseconds', $3::timestamptz, ${ORIGIN}) AND bucket <= $4
     GROUP BY signal`,
    params(q),
  );
  return new Map(r.rows.map((row) => [Number(row.signal), Number(row.n)]));
}

/** Every stored value in the range, per signal, in time order. */
export async function readRawValues(db: pg.Pool | pg.ClientBase, q: SeriesQuery): Promise<Map<number, { t: number[]; v: number[] }>> {
  const r = await db.query<{ signal: number; t: number; v: number }>(
    `SELECT signal, extract(epoch FROM t)::float8 * 1000 AS t, v FROM samples
     WHERE well_id = $1 AND signal = ANY($2::smallint[]) AND t >= $3 AND t <= $4
     ORDER BY signal, t`,
    params(q),
  );
  const out = new Map<number, { t: number[]; v: number[] }>();
  for (const row of r.rows) {
    const code = Number(row.signal);
    let s = out.get(code);
    if (!s) out.set(code, (s = { t: [], v: [] }));
    s.t.push(Math.round(row.t));
    s.v.push(row.v);
  }
  return out;
}

interface BucketRow {
  signal: number;
  bucket: number;
  vmin: number;
  vmax: number;
  tmin: number;
  tmax: number;
  vfirst: number;
}

// Which extreme came first: the time of the minimum and of the maximum inside each
// bucket. From samples that time is exact; from the rollup it is the start of the
// 15-minute bucket that held the extreme (a tie is settled by the first value).
const FROM_SAMPLES = `
  SELECT signal, extract(epoch FROM b)::float8 * 1000 AS bucket, min(v) AS vmin, max(v) AS vmax,
         extract(epoch FROM (array_agg(t ORDER BY v, t))[1])::float8 * 1000 AS tmin,
         extract(epoch FROM (array_agg(t ORDER BY v DESC, t))[1])::float8 * 1000 AS tmax,
         (array_agg(v ORDER BY t))[1] AS vfirst
  FROM (
    SELECT signal, t, v, date_bin($5::bigint * interval '1 millisecond', t, ${ORIGIN}) AS b
    FROM samples
    WHERE well_id = $1 AND signal = ANY($2::smallint[]) AND t >= $3 AND t <= $4
  ) s
  GROUP BY signal, b
  ORDER BY signal, b`;

const FROM_ROLLUP = `
  SELECT signal, extract(epoch FROM b)::float8 * 1000 AS bucket, min(vmin) AS vmin, max(vmax) AS vmax,
         extract(epoch FROM (array_agg(bucket ORDER BY vmin, bucket))[1])::float8 * 1000 AS tmin,
         extract(epoch FROM (array_agg(bucket ORDER BY vmax DESC, bucket))[1])::float8 * 1000 AS tmax,
         (array_agg(vfirst ORDER BY bucket))[1] AS vfirst
  FROM (
    SELECT signal, bucket, vmin, vmax, vfirst, date_bin($5::bigint * interval '1 millisecond', bucket, ${ORIGIN}) AS b
    FROM samples_15m
    WHERE well_id = $1 AND signal = ANY($2::smallint[])
      AND bucket >= date_bin(interval '${ROLLUP_BUCKET_MS} milliseconds', $3::timestamptz, ${ORIGIN}) AND bucket <= $4
  ) r
  GROUP BY signal, b
  ORDER BY signal, b`;

/** Minimum and maximum per bucket and signal, with the order they happened in. */
export async function readMinMaxBuckets(
  db: pg.Pool | pg.ClientBase,
  q: SeriesQuery,
  bucketMs: number,
  source: "samples" | "rollup",
): Promise<Map<number, MinMaxBucket[]>> {
  const r = await db.query<BucketRow>(source === "rollup" ? FROM_ROLLUP : FROM_SAMPLES, [...params(q), bucketMs]);
  const out = new Map<number, MinMaxBucket[]>();
  for (const row of r.rows) {
    const code = Number(row.signal);
    let list = out.get(code);
    if (!list) out.set(code, (list = []));
    list.push({
      bucket: Math.round(row.bucket),
      vmin: row.vmin,
      vmax: row.vmax,
      isMinFirst: isMinFirst(row.tmin, row.tmax, row.vfirst, row.vmin, row.vmax),
    });
  }
  return out;
}
