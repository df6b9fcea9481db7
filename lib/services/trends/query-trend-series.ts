// The SQL behind a trend: counts, raw values and min/max buckets of one well's
// signals over a time range. Every query is a prefix-plus-range read on a primary
// key: the hour blocks behind the samples view (well_id, signal, hour), or a rollup,
// samples_15m / samples_1h (well_id, signal, bucket), so PostgreSQL prunes the
// samples to the months in range and walks one index per partition.
// Times leave the database as epoch ms (float8) so no Date objects are built per row.
import pg from "pg";
import { ROLLUP_BUCKET_MS, SOURCE_ROW_MS, type BucketSource } from "@/lib/trends/bucket-plan";
import { flattenPairArray, jsonSafe, reorderPairs, type NumberListText } from "@/lib/trends/number-list-text";
import { minMaxTypeParsers } from "./pg-array-text";

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

// Min/max buckets come back as one row per signal holding two arrays (bucket
// numbers, and each bucket's extremes in the order they happened) and the count of
// stored values read: decoding one row per bucket (3,600 for 90 days × 5 signals)
// cost more Node CPU than anything else in a chart request, and most of the bytes
// (measured under the dashboard bench). The extremes travel as float4, about 7
// significant digits: far finer than a chart can draw, and a value stored with 7
// digits or fewer (as historians record them) comes back exactly, because float4
// output is the shortest text that reads back to the same float4. That text goes on
// to the browser as it is (lib/trends/number-list-text.ts). Raw values (zoomed in)
// stay exact.

/** The bucket origin in epoch ms (2000-01-01 UTC). */
const ORIGIN_MS = Date.UTC(2000, 0, 1);
/** A bucket's number: whole buckets of $5 ms since the origin. */
const bucketNumber = (col: string) => `round((date_part('epoch', ${col}) * 1000 - ${ORIGIN_MS}) / $5::bigint)::int`;
/** isMinFirst (lib/trends/minmax-points.ts) in SQL: the extremes' times, a tie settled by the first value. */
const minFirst = (tmin: string, tmax: string, vfirst: string) =>
  `CASE WHEN ${tmin} <> ${tmax} THEN ${tmin} < ${tmax} ELSE ${vfirst} - vmin <= vmax - ${vfirst} END`;

/**
 * One row per signal: the arrays, in bucket order, from rows with columns b, n, vmin,
 * vmax, tmin, tmax, vfirst; v holds each bucket's pair {first, second} (a
 * two-dimensional float4 array). The rows come from a subquery sorted by bucket
 * rather than an ORDER BY inside each aggregate, which sorted the same rows once per
 * aggregate (5.3 against 2.2 ms of database time for 90 days × 5 signals, measured).
 * PostgreSQL feeds a plain aggregate its subquery's rows in order ("will usually
 * work", says its manual, §4.2.7), so readMinMaxBuckets checks the order and sorts if
 * it ever is not; both arrays come from the same rows, so they stay paired.
 */
const arraysPerSignal = (rows: string) => `
SELECT s.code AS signal, x.n, x.k, x.v
FROM unnest($2::smallint[]) AS s(code)
CROSS JOIN LATERAL (
  SELECT sum(n)::float8 AS n, array_agg(${bucketNumber("b")}) AS k,
         array_agg(CASE WHEN mf THEN array[vmin::float4, vmax::float4] ELSE array[vmax::float4, vmin::float4] END) AS v
  FROM (SELECT b, n, vmin, vmax, ${minFirst("tmin", "tmax", "vfirst")} AS mf FROM (${rows}) r0 ORDER BY b) g
) x`;

// Per chart bucket from finer rows: count, extremes, the time of each extreme
// (earliest on a tie) and the first value. Arg-min, arg-max and first-by-time come
// from min/max over two-element arrays (compared element by element; a negated time
// makes max() keep the earliest): one pass per group, where array_agg(… ORDER BY …)[1]
// sorted every group (~70 ms against ~10 ms for 90 days × 5 signals, measured here).
// date_part() answers float8 directly; extract() answers numeric (PostgreSQL 14+),
// and the numeric detour doubled the cost of the hourly read (measured here).
const epoch = (col: string) => `date_part('epoch', ${col})`;
const BIN = (col: string) => `date_bin($5::bigint * interval '1 millisecond', ${col}, ${ORIGIN})`;
const grouped = (rows: string) => `
    SELECT ${BIN("rb")} AS b, sum(n) AS n, min(vmin) AS vmin, max(vmax) AS vmax,
           (min(array[vmin, etmin]))[2] AS tmin, -(max(array[vmax, -etmax]))[2] AS tmax,
           (min(array[eb, vfirst]))[2] AS vfirst
    FROM (${rows}) r
    GROUP BY 1`;

/** The stored values in range as rows of one value each, for grouped(). */
const SAMPLE_ROWS = `
      SELECT t AS rb, 1 AS n, v AS vmin, v AS vmax, v AS vfirst, ${epoch("t")} AS eb, ${epoch("t")} AS etmin, ${epoch("t")} AS etmax
      FROM samples
      WHERE well_id = $1 AND signal = s.code AND ${SAMPLE_HOURS} AND t >= $3 AND t <= $4`;

/**
 * A rollup's rows whose bucket starts in [the row bucket holding `from`, `to`].
 * `extreme` names the columns with each row's time of minimum and maximum
 * (samples_1h and samples_3h store them; for samples_15m the row's own bucket start
 * is the best we know, so a tie there is settled by the first value).
 */
const rollupRows = (table: string, rowMs: number, extreme: { tmin: string; tmax: string }) => `
      SELECT bucket AS rb, n, vmin, vmax, vfirst, ${epoch("bucket")} AS eb, ${epoch(extreme.tmin)} AS etmin, ${epoch(extreme.tmax)} AS etmax
      FROM ${table}
      WHERE well_id = $1 AND signal = s.code
        AND bucket >= date_bin(interval '${rowMs} milliseconds', $3::timestamptz, ${ORIGIN}) AND bucket <= $4`;

/** A rollup read one stored row per chart bucket: no grouping at all. */
const directRows = (rows: string) => `SELECT rb AS b, n, vmin, vmax, etmin AS tmin, etmax AS tmax, vfirst FROM (${rows}) r`;

const ROLLUPS: Record<Exclude<BucketSource, "samples">, { table: string; extreme: { tmin: string; tmax: string } }> = {
  rollup: { table: "samples_15m", extreme: { tmin: "bucket", tmax: "bucket" } },
  hourly: { table: "samples_1h", extreme: { tmin: "tmin", tmax: "tmax" } },
  three_hourly: { table: "samples_3h", extreme: { tmin: "tmin", tmax: "tmax" } },
};

/**
 * 3-hour buckets read as stored, with each bucket's extremes already written as the
 * chart draws them (samples_3h.extremes, migration 20261202000008): the values
 * come back as one text list per signal and nothing is turned into text per
 * request, which was most of this read's database CPU (~3.0 against ~1.6 ms for 90
 * days × 5 signals, measured). The bucket numbers are sent only when the buckets
 * are not consecutive (b0, the first, and nb, the count, say where they are
 * otherwise): numbering and printing 3,600 of them cost ~1 ms more (measured).
 *
 * The list's order comes from a subquery sorted by bucket (an index-order read, no
 * sort): an ORDER BY inside string_agg sorted the rows again, about half of this
 * read's database time (pgbench here: ~1.3–1.5 against ~0.67 ms for 90 days × 5
 * signals). PostgreSQL's manual (§4.2.7) says a sorted subquery "will usually work"
 * and names when it can fail: further processing at the aggregate's level, "such as a
 * join", that reorders the rows. The aggregate here reads that subquery alone, and
 * an integration test stores buckets out of time order and reads them back in order
 * (tests/integration/trends/three-hour-rollup.test.ts).
 */
const THREE_HOUR_RANGE = `well_id = $1 AND signal = s.code
      AND bucket >= date_bin(interval '${SOURCE_ROW_MS.three_hourly} milliseconds', $3::timestamptz, ${ORIGIN}) AND bucket <= $4`;
const STORED_THREE_HOUR_EXTREMES = `
SELECT s.code AS signal, x.n, x.nb, x.b0, x.v,
  CASE WHEN x.nb > 0 AND x.b1 - x.b0 + 1 <> x.nb
       THEN (SELECT array_agg(${bucketNumber("bucket")} ORDER BY bucket) FROM samples_3h WHERE ${THREE_HOUR_RANGE}) END AS k
FROM unnest($2::smallint[]) AS s(code)
CROSS JOIN LATERAL (
  SELECT sum(n)::float8 AS n, count(*)::int AS nb, ${bucketNumber("min(bucket)")} AS b0, ${bucketNumber("max(bucket)")} AS b1,
         string_agg(extremes, ',') AS v
  FROM (SELECT bucket, n, extremes FROM samples_3h WHERE ${THREE_HOUR_RANGE} ORDER BY bucket) r
) x`;

interface MinMaxStatement {
  name: string;
  text: string;
  /** How v comes back: a two-dimensional float4 array of pairs, or the list as text. */
  values: "pairs" | "list";
}

/** The statement for a source, read directly when its rows are the chart's buckets. */
function minMaxSql(source: BucketSource, bucketMs: number): MinMaxStatement {
  if (source === "samples") return { name: "minmax-samples", text: arraysPerSignal(grouped(SAMPLE_ROWS)), values: "pairs" };
  const rowMs = SOURCE_ROW_MS[source];
  if (source === "three_hourly" && bucketMs === rowMs) return { name: "minmax-three_hourly-stored", text: STORED_THREE_HOUR_EXTREMES, values: "list" };
  const { table, extreme } = ROLLUPS[source];
  const rows = rollupRows(table, rowMs, extreme);
  return bucketMs === rowMs
    ? { name: `minmax-${source}-direct`, text: arraysPerSignal(directRows(rows)), values: "pairs" }
    : { name: `minmax-${source}`, text: arraysPerSignal(grouped(rows)), values: "pairs" };
}

interface ArrayRow {
  signal: number;
  n: number | null;
  /** Bucket numbers; null from STORED_THREE_HOUR_EXTREMES when they are b0, b0 + 1, … (nb of them). */
  k: number[] | null;
  nb?: number;
  b0?: number | null;
  /** "{{first,second},…}" (float4 text) or "first,second,…" (MinMaxStatement.values), or null without buckets. */
  v: string | null;
}

const ARRAY_PARSERS = minMaxTypeParsers(pg.types);

/** One signal's buckets: their starts and, per bucket, its two extremes in the order they happened. */
export interface MinMaxColumns {
  /** Bucket starts, epoch ms, ascending. */
  starts: number[];
  /** No bucket missing between the first and the last (the chart points are then evenly spaced). */
  consecutive: boolean;
  /** Two values per bucket, first and second, as JSON number text (number-list-text.ts). */
  values: NumberListText;
}

export interface MinMaxAnswer {
  /** Buckets per signal code, in time order. */
  buckets: Map<number, MinMaxColumns>;
  /** Stored values per signal code in the buckets read (edge buckets may add a few past the range). */
  counts: Map<number, number>;
}

/** Minimum and maximum per bucket and signal, in the order they happened, and the counts behind them. */
export async function readMinMaxBuckets(db: pg.Pool | pg.ClientBase, q: SeriesQuery, bucketMs: number, source: BucketSource): Promise<MinMaxAnswer> {
  const sql = minMaxSql(source, bucketMs);
  const r = await db.query<ArrayRow>({ ...named(sql.name, sql.text, [...params(q), bucketMs]), types: ARRAY_PARSERS });
  const buckets = new Map<number, MinMaxColumns>();
  const counts = new Map<number, number>();
  for (const row of r.rows) {
    const code = Number(row.signal);
    const count = row.k ? row.k.length : (row.nb ?? 0);
    const starts = new Array<number>(count);
    let isSorted = true;
    let isConsecutive = true;
    if (row.k) {
      const k = row.k;
      for (let i = 0; i < count; i++) {
        starts[i] = ORIGIN_MS + k[i] * bucketMs;
        if (i > 0 && k[i] !== k[i - 1] + 1) {
          isConsecutive = false;
          if (k[i] <= k[i - 1]) isSorted = false;
        }
      }
    } else {
      for (let i = 0; i < count; i++) starts[i] = ORIGIN_MS + (row.b0! + i) * bucketMs;
    }
    let values = row.v === null ? "" : sql.values === "pairs" ? flattenPairArray(row.v) : jsonSafe(row.v);
    if (!isSorted) {
      const order = starts.map((_, i) => i).sort((a, b) => starts[a] - starts[b]);
      values = reorderPairs(values, order);
      starts.sort((a, b) => a - b);
      isConsecutive = starts.every((t, i) => i === 0 || t - starts[i - 1] === bucketMs);
    }
    buckets.set(code, { starts, consecutive: isConsecutive, values });
    if (count > 0) counts.set(code, row.n ?? 0);
  }
  return { buckets, counts };
}
