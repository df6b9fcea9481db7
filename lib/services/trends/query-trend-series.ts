// The SQL behind a trend: counts, raw values and min/max buckets of one well's
// signals over a time range. Every query is a prefix-plus-range read on a primary
// key: the hour blocks behind the samples view (well_id, signal, hour), or a rollup,
// samples_15m / samples_1h (well_id, signal, bucket), so PostgreSQL prunes the
// samples to the months in range and walks one index per partition.
// Times leave the database as epoch ms (float8) so no Date objects are built per row.
import type pg from "pg";
import { HOURLY_BUCKET_MS, ROLLUP_BUCKET_MS, type BucketSource } from "@/lib/trends/bucket-plan";
import { isMinFirst, type MinMaxBucket } from "@/lib/trends/minmax-points";

/** The rollup's bucket origin (write-sample-batch.ts bins from 2000-01-01 UTC). */
const ORIGIN = "timestamptz '2000-01-01Z'";
/**
 * The hour blocks holding [$3, $4]: `samples` unnests one stored row per (well,
 * signal, hour), so readers bound `hour` too, which prunes months and reads only
 * those blocks (migration 20261202000006).
 */
const SAMPLE_HOURS = `hour >= date_bin('1 hour', $3::timestamptz, ${ORIGIN}) AND hour <= $4`;

export interface SeriesQuery {
  wellId: number;
  codes: number[];
  fromMs: number;
  toMs: number;
}

const params = (q: SeriesQuery) => [q.wellId, q.codes, new Date(q.fromMs), new Date(q.toMs)];

// Every query here is a named (prepared) statement: each pooled connection plans it
// once and then reuses a generic plan, with the months pruned at run time. Planning
// a read of the partitioned samples cost 6–14 ms of database CPU per request, more
// than running it (measured with EXPLAIN ANALYZE on the dashboard bench's data).
const named = (name: string, text: string, values: unknown[]) => ({ name: `bellows-trend-${name}`, text, values });

/** Stored values per signal in the range, from the rollup's counts (edge buckets may add a few). */
export async function countRawValues(db: pg.Pool | pg.ClientBase, q: SeriesQuery): Promise<Map<number, number>> {
  const r = await db.query<{ signal: number; n: string }>(
    named(
      "count",
      `SELECT signal, sum(n) AS n FROM samples_15m
       WHERE well_id = $1 AND signal = ANY($2::smallint[])
         AND bucket >= date_bin(interval '${ROLLUP_BUCKET_MS} milliseconds', $3::timestamptz, ${ORIGIN}) AND bucket <= $4
       GROUP BY signal`,
      params(q),
    ),
  );
  return new Map(r.rows.map((row) => [Number(row.signal), Number(row.n)]));
}

/** Every stored value in the range, per signal, in time order. */
export async function readRawValues(db: pg.Pool | pg.ClientBase, q: SeriesQuery): Promise<Map<number, { t: number[]; v: number[] }>> {
  const r = await db.query<{ signal: number; t: number; v: number }>(
    named(
      "raw",
      `SELECT signal, date_part('epoch', t) * 1000 AS t, v FROM samples
       WHERE well_id = $1 AND signal = ANY($2::smallint[]) AND ${SAMPLE_HOURS} AND t >= $3 AND t <= $4
       ORDER BY signal, t`,
      params(q),
    ),
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
  n: number;
  vmin: number;
  vmax: number;
  tmin: number;
  tmax: number;
  vfirst: number;
}

// Per bucket: count, extremes, the time of each extreme (earliest on a tie) and the
// first value, for isMinFirst. Arg-min, arg-max and first-by-time come from min/max
// over two-element arrays (compared element by element; a negated time makes max()
// keep the earliest): one pass per group, where array_agg(… ORDER BY …)[1] sorted
// every group (~70 ms against ~10 ms for 90 days × 5 signals, measured here).
// From samples the extreme's time is exact; from a rollup it is the start of the
// 15-minute bucket that held it (a tie is then settled by the first value).
const aggregates = (time: { tmin: string; tmax: string; first: string }, n: string) => `
  sum(${n})::float8 AS n, min(vmin) AS vmin, max(vmax) AS vmax,
  (min(array[vmin, ${time.tmin}]))[2] * 1000 AS tmin,
  -(max(array[vmax, -${time.tmax}]))[2] * 1000 AS tmax,
  (min(array[${time.first}, vfirst]))[2] AS vfirst`;

// date_part() answers float8 directly; extract() answers numeric (PostgreSQL 14+),
// and the numeric detour doubled the cost of the hourly read (measured here).
const epoch = (col: string) => `date_part('epoch', ${col})`;
const BIN = (col: string) => `date_bin($5::bigint * interval '1 millisecond', ${col}, ${ORIGIN})`;

const FROM_SAMPLES = `
  SELECT signal, ${epoch("b")} * 1000 AS bucket, ${aggregates({ tmin: "et", tmax: "et", first: "et" }, "1")}
  FROM (
    SELECT signal, ${epoch("t")} AS et, v AS vmin, v AS vmax, v AS vfirst, ${BIN("t")} AS b
    FROM samples
    WHERE well_id = $1 AND signal = ANY($2::smallint[]) AND ${SAMPLE_HOURS} AND t >= $3 AND t <= $4
  ) s
  GROUP BY signal, b
  ORDER BY signal, b`;

/**
 * From a rollup table: rows whose bucket starts in [the row bucket holding `from`, `to`].
 * `extreme` names the columns with each row's time of minimum and maximum (samples_1h
 * stores them; for samples_15m the row's own bucket start is the best we know).
 */
const fromRollup = (table: string, rowBucketMs: number, extreme: { tmin: string; tmax: string }) => `
  SELECT signal, ${epoch("b")} * 1000 AS bucket, ${aggregates({ tmin: "etmin", tmax: "etmax", first: "eb" }, "n")}
  FROM (
    SELECT signal, n, vmin, vmax, vfirst, ${epoch("bucket")} AS eb,
           ${epoch(extreme.tmin)} AS etmin, ${epoch(extreme.tmax)} AS etmax, ${BIN("bucket")} AS b
    FROM ${table}
    WHERE well_id = $1 AND signal = ANY($2::smallint[])
      AND bucket >= date_bin(interval '${rowBucketMs} milliseconds', $3::timestamptz, ${ORIGIN}) AND bucket <= $4
  ) r
  GROUP BY signal, b
  ORDER BY signal, b`;

const FROM_ROLLUP = fromRollup("samples_15m", ROLLUP_BUCKET_MS, { tmin: "bucket", tmax: "bucket" });
const FROM_HOURLY = fromRollup("samples_1h", HOURLY_BUCKET_MS, { tmin: "tmin", tmax: "tmax" });

const SQL_BY_SOURCE: Record<BucketSource, string> = { samples: FROM_SAMPLES, rollup: FROM_ROLLUP, hourly: FROM_HOURLY };

export interface MinMaxAnswer {
  /** Buckets per signal code, in time order. */
  buckets: Map<number, MinMaxBucket[]>;
  /** Stored values per signal code in the buckets read (edge buckets may add a few past the range). */
  counts: Map<number, number>;
}

/** Minimum and maximum per bucket and signal, with the order they happened in, and the counts behind them. */
export async function readMinMaxBuckets(db: pg.Pool | pg.ClientBase, q: SeriesQuery, bucketMs: number, source: BucketSource): Promise<MinMaxAnswer> {
  const r = await db.query<BucketRow>(named(`minmax-${source}`, SQL_BY_SOURCE[source], [...params(q), bucketMs]));
  const buckets = new Map<number, MinMaxBucket[]>();
  const counts = new Map<number, number>();
  let code = NaN;
  let list: MinMaxBucket[] = [];
  let n = 0;
  for (const row of r.rows) {
    // Rows come ordered by signal: switch lists only when the signal changes.
    if (row.signal !== code) {
      if (list.length > 0) counts.set(code, n);
      code = Number(row.signal);
      list = [];
      n = 0;
      buckets.set(code, list);
    }
    n += row.n;
    list.push({
      bucket: Math.round(row.bucket),
      vmin: row.vmin,
      vmax: row.vmax,
      isMinFirst: isMinFirst(row.tmin, row.tmax, row.vfirst, row.vmin, row.vmax),
    });
  }
  if (list.length > 0) counts.set(code, n);
  return { buckets, counts };
}
