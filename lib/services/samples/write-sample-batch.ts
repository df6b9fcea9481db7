// The one bulk write path for samples (file ingest and the JSON API). Per batch,
// in one transaction:
//   1. fast path: binary COPY straight into `samples` inside a savepoint. New data
//      (the usual case) costs no more than a COPY into a keyed table, and the batch's
//      15-minute summaries (computed here, summarize-buckets.ts) are folded into the
//      stored rollup rows: counts and sums add, min/max and first/last by time combine;
//   2. if any (well, signal, t) already exists the COPY fails with a unique
//      violation; we roll back to the savepoint and take the merge path: binary
//      COPY into a per-connection TEMP staging table, then
//      INSERT … SELECT … ON CONFLICT (well_id, signal, t) DO UPDATE — the later
//      value wins, identical values are not rewritten, so re-importing a file
//      changes nothing — and the touched buckets are recomputed from `samples`
//      (a replaced value cannot be folded in).
//
// The batch must hold each (well, signal, t) at most once (readRows and the API
// service both merge in-batch duplicates first): PostgreSQL refuses to update one
// row twice in a single INSERT … ON CONFLICT, and COPY would fail on it.
// Rows go in key order (faster B-tree inserts, see sort-by-key.ts, and two writers
// take row locks in the same order); a deadlock that still happens is retried.
import type pg from "pg";
import { from as copyFrom } from "pg-copy-streams";
import type { ValueColumns } from "@/lib/ingest/value-buffer";
import { encodeCopyHeader, encodeCopyRows, encodeCopyTrailer } from "./encode-copy-binary";
import { ensureSamplePartitions } from "./ensure-partitions";
import { isSortedByKey, sortByKey } from "./sort-by-key";
import { BUCKET_MS, summarizeBuckets } from "./summarize-buckets";

export interface SampleWriteResult {
  /** Values written: new (well, signal, t) keys plus stored keys whose value differed and was replaced. */
  written: number;
  /** Keys already stored with the identical value: nothing written. */
  unchanged: number;
}

const staged = new WeakSet<pg.ClientBase>();
const DEADLOCK = "40P01";
const SERIALIZATION = "40001";
const UNIQUE_VIOLATION = "23505";

async function ensureStagingTable(client: pg.ClientBase): Promise<void> {
  if (staged.has(client)) return;
  // ON COMMIT DELETE ROWS: the table empties itself at the end of every batch.
  await client.query(
    `CREATE TEMP TABLE IF NOT EXISTS ingest_stage (well_id integer, signal smallint, t timestamptz, v double precision) ON COMMIT DELETE ROWS`,
  );
  staged.add(client);
}

/** Binary COPY of the batch into a table, in chunks, with back-pressure. */
async function copyBatch(client: pg.ClientBase, table: "samples" | "ingest_stage", b: ValueColumns<number>): Promise<void> {
  const stream = client.query(copyFrom(`COPY ${table} (well_id, signal, t, v) FROM STDIN (FORMAT binary)`));
  const done = new Promise<void>((resolve, reject) => {
    stream.on("finish", resolve);
    stream.on("error", reject);
  });
  const CHUNK = 8192;
  const write = async (buf: Buffer) => {
    if (!stream.write(buf)) {
      await new Promise<void>((resolve, reject) => {
        const onError = (e: Error) => reject(e);
        stream.once("drain", () => { stream.off("error", onError); resolve(); });
        stream.once("error", onError);
      });
    }
  };
  try {
    await write(encodeCopyHeader());
    for (let start = 0; start < b.length; start += CHUNK) await write(encodeCopyRows(b, start, Math.min(b.length, start + CHUNK)));
    stream.end(encodeCopyTrailer());
  } catch (e) {
    stream.destroy();
    await done.catch(() => undefined);
    throw e;
  }
  await done;
}

// The WHERE skips identical values: no write, no WAL, and the statement's row count
// is exactly the number of values written.
const UPSERT_SQL = `
INSERT INTO samples (well_id, signal, t, v)
SELECT well_id, signal, t, v FROM ingest_stage
ON CONFLICT (well_id, signal, t) DO UPDATE SET v = EXCLUDED.v
WHERE samples.v IS DISTINCT FROM EXCLUDED.v`;

// Recompute the rollup over each touched series' bucket range from all stored
// samples in it. LATERAL makes it one index range scan per series (a plain join
// let the planner merge-join the whole samples table: seconds per batch).
const ROLLUP_SQL = `
INSERT INTO samples_15m (well_id, signal, bucket, n, vmin, vmax, vsum, vfirst, vlast, tfirst, tlast)
SELECT r.well_id, r.signal, x.bucket, x.n, x.vmin, x.vmax, x.vsum, x.vfirst, x.vlast, x.tfirst, x.tlast
FROM unnest($1::int[], $2::smallint[], $3::timestamptz[], $4::timestamptz[]) AS r(well_id, signal, lo, hi)
CROSS JOIN LATERAL (
  SELECT date_bin('15 minutes', s.t, timestamptz '2000-01-01Z') AS bucket, count(*)::int AS n,
         min(s.v) AS vmin, max(s.v) AS vmax, sum(s.v) AS vsum,
         -- first/last value by time: min/max of [epoch seconds, v] pairs (arrays compare
         -- element by element); 30 % cheaper here than array_agg(v ORDER BY t)[1].
         (min(array[extract(epoch from s.t)::float8, s.v]))[2] AS vfirst,
         (max(array[extract(epoch from s.t)::float8, s.v]))[2] AS vlast,
         min(s.t) AS tfirst, max(s.t) AS tlast
  FROM samples s
  WHERE s.well_id = r.well_id AND s.signal = r.signal AND s.t >= r.lo AND s.t < r.hi
  GROUP BY 1
) x
ORDER BY 1, 2, 3
ON CONFLICT (well_id, signal, bucket) DO UPDATE
SET n = EXCLUDED.n, vmin = EXCLUDED.vmin, vmax = EXCLUDED.vmax, vsum = EXCLUDED.vsum,
    vfirst = EXCLUDED.vfirst, vlast = EXCLUDED.vlast, tfirst = EXCLUDED.tfirst, tlast = EXCLUDED.tlast`;

// Fold a batch of NEW values into the rollup (valid only when the fast-path COPY
// succeeded: no stored value was replaced). On conflict every expression reads the
// stored row as it was, so the first/last swaps compare against the old times.
// Times travel as epoch ms (float8) and become timestamptz here, exact to the µs.
const FOLD_SQL = `
INSERT INTO samples_15m AS r (well_id, signal, bucket, n, vmin, vmax, vsum, vfirst, vlast, tfirst, tlast)
SELECT w, s, to_timestamp(b / 1000.0), n, lo, hi, su, vf, vl, to_timestamp(tf / 1000.0), to_timestamp(tl / 1000.0)
FROM unnest($1::int[], $2::smallint[], $3::float8[], $4::int[], $5::float8[], $6::float8[], $7::float8[],
            $8::float8[], $9::float8[], $10::float8[], $11::float8[]) AS x(w, s, b, n, lo, hi, su, tf, vf, tl, vl)
ON CONFLICT (well_id, signal, bucket) DO UPDATE
SET n = r.n + EXCLUDED.n, vmin = least(r.vmin, EXCLUDED.vmin), vmax = greatest(r.vmax, EXCLUDED.vmax),
    vsum = r.vsum + EXCLUDED.vsum,
    vfirst = CASE WHEN EXCLUDED.tfirst < r.tfirst THEN EXCLUDED.vfirst ELSE r.vfirst END,
    vlast = CASE WHEN EXCLUDED.tlast > r.tlast THEN EXCLUDED.vlast ELSE r.vlast END,
    tfirst = least(r.tfirst, EXCLUDED.tfirst), tlast = greatest(r.tlast, EXCLUDED.tlast)`;

async function foldIntoRollup(client: pg.ClientBase, batch: ValueColumns<number>): Promise<void> {
  const s = summarizeBuckets(batch);
  await client.query(FOLD_SQL, [s.wellId, s.signal, s.bucket, s.n, s.vmin, s.vmax, s.vsum, s.tfirst, s.vfirst, s.tlast, s.vlast]);
}

interface SeriesRanges {
  wellIds: number[];
  signals: number[];
  los: Date[];
  his: Date[];
  /** One advisory-lock key per series (bigint form, apart from the two-integer upload locks), ascending. */
  lockKeys: string[];
  lo: number;
  hi: number;
}

/** Per (well, signal): the 15-minute-aligned range the batch touches; and the batch's time span. */
function findSeriesRanges(b: ValueColumns<number>): SeriesRanges {
  const ranges = new Map<number, [number, number, number, number]>();
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < b.length; i++) {
    const t = b.t[i];
    if (t < lo) lo = t;
    if (t > hi) hi = t;
    const key = b.wellId[i] * 64 + b.signal[i];
    const r = ranges.get(key);
    if (r === undefined) ranges.set(key, [b.wellId[i], b.signal[i], t, t]);
    else {
      if (t < r[2]) r[2] = t;
      if (t > r[3]) r[3] = t;
    }
  }
  const out: SeriesRanges = { wellIds: [], signals: [], los: [], his: [], lockKeys: [], lo, hi };
  for (const [w, s, a, z] of ranges.values()) {
    out.wellIds.push(w);
    out.signals.push(s);
    // Buckets are aligned to 2000-01-01 UTC, itself a multiple of 15 minutes from the Unix epoch.
    out.los.push(new Date(Math.floor(a / BUCKET_MS) * BUCKET_MS));
    out.his.push(new Date(Math.floor(z / BUCKET_MS) * BUCKET_MS + BUCKET_MS));
  }
  out.lockKeys = [...ranges.keys()].sort((x, y) => x - y).map(String);
  return out;
}

function codeOf(e: unknown): string | undefined {
  return (e as { code?: string }).code;
}

export interface SampleWriteOptions {
  maxAttempts?: number;
  /**
   * Commit without waiting for the WAL flush (synchronous_commit = off). Only for a
   * caller that ends with a normal commit of its own before it reports success (the
   * file import marks the upload done): that commit flushes the WAL up to itself,
   * which covers every earlier batch, and a crash before it leaves the upload
   * unfinished, so the job is retried and rewrites the same values.
   */
  isFlushDeferred?: boolean;
}

export async function writeSampleBatch(client: pg.ClientBase, unsorted: ValueColumns<number>, options: SampleWriteOptions = {}): Promise<SampleWriteResult> {
  if (unsorted.length === 0) return { written: 0, unchanged: 0 };
  const batch = isSortedByKey(unsorted) ? unsorted : sortByKey(unsorted);
  const ranges = findSeriesRanges(batch);
  await ensureSamplePartitions(client, ranges.lo, ranges.hi);
  const maxAttempts = options.maxAttempts ?? 5;
  for (let attempt = 1; ; attempt++) {
    try {
      await client.query("BEGIN");
      if (options.isFlushDeferred) await client.query("SET LOCAL synchronous_commit = off");
      // Serialise writers per series before touching anything. Without this, two
      // concurrent writers of the same 15-minute bucket would each recompute it from a
      // snapshot missing the other's rows, and the later commit would store a rollup
      // that lacks the earlier one's values. With it, the rollup statement below runs
      // after every earlier writer of these series has committed, so it sees their rows.
      // Keys are taken in ascending order, so two writers cannot deadlock on them.
      await client.query("SELECT count(pg_advisory_xact_lock(k)) FROM unnest($1::bigint[]) AS k", [ranges.lockKeys]);
      let written: number;
      await client.query("SAVEPOINT fresh");
      try {
        await copyBatch(client, "samples", batch);
        written = batch.length;
        await foldIntoRollup(client, batch);
      } catch (e) {
        if (codeOf(e) !== UNIQUE_VIOLATION) throw e;
        await client.query("ROLLBACK TO SAVEPOINT fresh");
        await ensureStagingTable(client);
        await copyBatch(client, "ingest_stage", batch);
        written = (await client.query(UPSERT_SQL)).rowCount ?? 0;
        // Nothing changed → no bucket changed; skip the rollup read.
        if (written > 0) await client.query(ROLLUP_SQL, [ranges.wellIds, ranges.signals, ranges.los, ranges.his]);
      }
      await client.query("COMMIT");
      return { written, unchanged: batch.length - written };
    } catch (e) {
      await client.query("ROLLBACK").catch(() => undefined);
      const code = codeOf(e);
      if ((code === DEADLOCK || code === SERIALIZATION) && attempt < maxAttempts) {
        await new Promise((r) => setTimeout(r, 50 * attempt + Math.random() * 100));
        continue;
      }
      throw e;
    }
  }
}
