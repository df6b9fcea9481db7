// The one bulk write path for samples (file ingest and the JSON API). Samples are
// stored as hour blocks (sample_blocks, migration 20261202000006). Per batch, in one
// transaction, after taking a lock per series:
//   1. try the whole batch as new hours (step 2); if one is already stored, the blocks
//      COPY fails on the key: roll back to a savepoint and find which hours are stored
//      (one index probe each), then insert the new ones and merge the rest;
//   2. new hours: binary COPY of the blocks, and of their 15-minute and hourly rollup
//      rows computed here (summarize-buckets.ts): an hour with no stored values has no
//      rollup rows yet, so all are plain inserts, the cheapest write PostgreSQL has.
//      Their 3-hour buckets may hold hours of earlier batches, so the new hours'
//      3-hour parts are added to the stored rows (refresh-three-hour-rollup.ts);
//   3. stored hours: the batch's blocks go to a per-connection TEMP staging table and
//      are merged into the stored ones by time: the later value of a time wins,
//      identical values are not rewritten (so re-importing a file changes nothing and
//      counts its values as unchanged), and the merged hours' rollup rows (15-minute,
//      hourly, 3-hour) are recomputed from the stored blocks;
//   4. every written series gets a new version (sample_series_versions), which tells
//      the web app's chart cache that its answers for the series are out of date; it
//      rides in the 3-hour statement.
//
// The batch must hold each (well, signal, t) at most once (readRows and the API
// service both merge in-batch duplicates first). Rows go in key order; a deadlock
// that still happens is retried.
import type pg from "pg";
import { from as copyFrom } from "pg-copy-streams";
import type { ValueColumns } from "@/lib/ingest/value-buffer";
import { encodeBlockRows, encodeCopyHeader, encodeCopyTrailer, encodeSummaryRows } from "./encode-copy-binary";
import { ensureSamplePartitions } from "./ensure-partitions";
import { findBlocks, HOUR_MS, pickBlocks, type Blocks } from "./find-blocks";
import type { SeriesRanges } from "./merge-series-ranges";
import { refreshHourlyRollup } from "./refresh-hourly-rollup";
import { addThreeHourParts } from "./refresh-three-hour-rollup";
import { isSortedByKey, sortByKey } from "./sort-by-key";
import { summarizeBuckets, summarizeHours, summarizeThreeHours, type SummaryColumns } from "./summarize-buckets";

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
const BLOCKS_PER_CHUNK = 256;
const ROLLUP_ROWS_PER_CHUNK = 4096;

async function ensureStagingTable(client: pg.ClientBase): Promise<void> {
  if (staged.has(client)) return;
  // ON COMMIT DELETE ROWS: the table empties itself at the end of every batch.
  await client.query(
    `CREATE TEMP TABLE IF NOT EXISTS ingest_stage_blocks (well_id integer, signal smallint, hour timestamptz, ts timestamptz[], vs double precision[]) ON COMMIT DELETE ROWS`,
  );
  staged.add(client);
}

/** Binary COPY of encoded pieces into a table, with back-pressure. */
async function copyPieces(client: pg.ClientBase, sql: string, pieces: Iterable<Buffer>): Promise<void> {
  const stream = client.query(copyFrom(sql));
  const done = new Promise<void>((resolve, reject) => {
    stream.on("finish", resolve);
    stream.on("error", reject);
  });
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
    for (const piece of pieces) await write(piece);
    stream.end(encodeCopyTrailer());
  } catch (e) {
    stream.destroy();
    await done.catch(() => undefined);
    throw e;
  }
  await done;
}

function* blockPieces(batch: ValueColumns<number>, blocks: Blocks, which: readonly number[]): Generator<Buffer> {
  for (let i = 0; i < which.length; i += BLOCKS_PER_CHUNK) yield encodeBlockRows(batch, blocks, which.slice(i, i + BLOCKS_PER_CHUNK));
}

function* summaryPieces(s: SummaryColumns, times: readonly [Float64Array, Float64Array]): Generator<Buffer> {
  for (let i = 0; i < s.length; i += ROLLUP_ROWS_PER_CHUNK) yield encodeSummaryRows(s, times, i, Math.min(s.length, i + ROLLUP_ROWS_PER_CHUNK));
}

// Which blocks are stored: LATERAL … LIMIT 1 keeps it one primary-key probe per
// block (a join could be planned as a scan of the whole table).
const STORED_SQL = `
SELECT u.i::int AS i
FROM unnest($1::int[], $2::smallint[], $3::float8[]) WITH ORDINALITY AS u(w, s, ms, i)
CROSS JOIN LATERAL (
  SELECT 1 FROM sample_blocks b WHERE b.well_id = u.w AND b.signal = u.s AND b.hour = to_timestamp(u.ms / 1000.0) LIMIT 1
) x`;

// Merge staged blocks into their stored hours. Per block: a full join of the two
// (t, v) lists on t, the staged value winning; `changed` counts staged values that
// were missing or different. Only blocks with a change are rewritten.
const MERGE_SQL = `
WITH m AS (
  SELECT s.well_id, s.signal, s.hour, x.ts, x.vs, x.changed
  FROM ingest_stage_blocks s
  CROSS JOIN LATERAL (
    SELECT b.ts, b.vs FROM sample_blocks b WHERE b.well_id = s.well_id AND b.signal = s.signal AND b.hour = s.hour LIMIT 1
  ) b
  CROSS JOIN LATERAL (
    SELECT array_agg(u.t ORDER BY u.t) AS ts, array_agg(u.v ORDER BY u.t) AS vs,
           (count(*) FILTER (WHERE u.is_staged AND u.old_v IS DISTINCT FROM u.v))::int AS changed
    FROM (
      SELECT coalesce(n.t, o.t) AS t, coalesce(n.v, o.v) AS v, n.t IS NOT NULL AS is_staged, o.v AS old_v
      FROM unnest(s.ts, s.vs) AS n(t, v) FULL JOIN unnest(b.ts, b.vs) AS o(t, v) ON o.t = n.t
    ) u
  ) x
), w AS (
  INSERT INTO sample_blocks (well_id, signal, hour, ts, vs)
  SELECT well_id, signal, hour, ts, vs FROM m WHERE changed > 0
  ON CONFLICT (well_id, signal, hour) DO UPDATE SET ts = EXCLUDED.ts, vs = EXCLUDED.vs
)
SELECT coalesce(sum(changed), 0)::int AS written FROM m`;

// Recompute the rollup buckets of some series ranges from the stored blocks, one
// index range scan per range (LATERAL), pruned to the hours in range.
const ROLLUP_SQL = `
INSERT INTO samples_15m (well_id, signal, bucket, n, vmin, vmax, vsum, vfirst, vlast, tfirst, tlast)
SELECT r.well_id, r.signal, x.bucket, x.n, x.vmin, x.vmax, x.vsum, x.vfirst, x.vlast, x.tfirst, x.tlast
FROM unnest($1::int[], $2::smallint[], $3::float8[], $4::float8[]) AS q(well_id, signal, lo_ms, hi_ms)
CROSS JOIN LATERAL (SELECT q.well_id, q.signal, to_timestamp(q.lo_ms / 1000.0) AS lo, to_timestamp(q.hi_ms / 1000.0) AS hi) r
CROSS JOIN LATERAL (
  SELECT date_bin('15 minutes', s.t, timestamptz '2000-01-01Z') AS bucket, count(*)::int AS n,
         min(s.v) AS vmin, max(s.v) AS vmax, sum(s.v) AS vsum,
         -- first/last value by time: min/max of [epoch seconds, v] pairs (arrays compare
         -- element by element).
         (min(array[extract(epoch from s.t)::float8, s.v]))[2] AS vfirst,
         (max(array[extract(epoch from s.t)::float8, s.v]))[2] AS vlast,
         min(s.t) AS tfirst, max(s.t) AS tlast
  FROM sample_blocks b CROSS JOIN LATERAL unnest(b.ts, b.vs) AS s(t, v)
  WHERE b.well_id = r.well_id AND b.signal = r.signal
    AND b.hour >= date_bin('1 hour', r.lo, timestamptz '2000-01-01Z') AND b.hour < r.hi
    AND s.t >= r.lo AND s.t < r.hi
  GROUP BY 1
) x
ORDER BY 1, 2, 3
ON CONFLICT (well_id, signal, bucket) DO UPDATE
SET n = EXCLUDED.n, vmin = EXCLUDED.vmin, vmax = EXCLUDED.vmax, vsum = EXCLUDED.vsum,
    vfirst = EXCLUDED.vfirst, vlast = EXCLUDED.vlast, tfirst = EXCLUDED.tfirst, tlast = EXCLUDED.tlast`;

/** Each chosen block's hour as a range (epoch ms, in key order as the blocks are). */
function hourRanges(blocks: Blocks, which: readonly number[]): SeriesRanges {
  const r: SeriesRanges = { wellIds: [], signals: [], los: [], his: [] };
  for (const k of which) {
    r.wellIds.push(blocks.wellId[k]);
    r.signals.push(blocks.signal[k]);
    r.los.push(blocks.hour[k]);
    r.his.push(blocks.hour[k] + HOUR_MS);
  }
  return r;
}

/** One advisory-lock key per series (bigint form, apart from the two-integer upload locks), ascending. */
function seriesLockKeys(blocks: Blocks): string[] {
  const keys = new Set<number>();
  for (let k = 0; k < blocks.length; k++) keys.add(blocks.wellId[k] * 64 + blocks.signal[k]);
  return [...keys].sort((x, y) => x - y).map(String);
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

/**
 * New hours: COPY the blocks, then their 15-minute and hourly rollup rows (recomputed
 * instead if a stray row is in the way), then their 3-hour buckets and the series'
 * versions in one statement.
 */
async function insertNewHours(client: pg.ClientBase, batch: ValueColumns<number>, blocks: Blocks, fresh: number[]): Promise<void> {
  await copyPieces(client, "COPY sample_blocks (well_id, signal, hour, ts, vs) FROM STDIN (FORMAT binary)", blockPieces(batch, blocks, fresh));
  const freshValues = fresh.length === blocks.length ? batch : pickBlocks(batch, blocks, fresh);
  const quarters = summarizeBuckets(freshValues);
  const hours = summarizeHours(quarters);
  await client.query("SAVEPOINT rollup");
  try {
    await copyPieces(client, "COPY samples_15m (well_id, signal, bucket, n, vmin, vmax, vsum, vfirst, vlast, tfirst, tlast) FROM STDIN (FORMAT binary)", summaryPieces(quarters, [quarters.tfirst, quarters.tlast]));
    await copyPieces(client, "COPY samples_1h (well_id, signal, bucket, n, vmin, vmax, vsum, vfirst, vlast, tmin, tmax) FROM STDIN (FORMAT binary)", summaryPieces(hours, [hours.tmin, hours.tmax]));
  } catch (e) {
    // A rollup row without stored values (left by a manual delete): rebuild those hours.
    if (codeOf(e) !== UNIQUE_VIOLATION) throw e;
    await client.query("ROLLBACK TO SAVEPOINT rollup");
    await rebuildRollups(client, blocks, fresh);
    return;
  }
  // The new hours' 3-hour parts join the stored 3-hour rows, with the new versions
  // the web app's chart cache checks (one statement).
  await addThreeHourParts(client, summarizeThreeHours(hours));
}

/** Recompute the chosen blocks' hours in all rollups from the stored blocks (the last step also renews the series' versions). */
async function rebuildRollups(client: pg.ClientBase, blocks: Blocks, which: readonly number[]): Promise<void> {
  const r = hourRanges(blocks, which);
  await client.query(ROLLUP_SQL, [r.wellIds, r.signals, r.los, r.his]);
  await refreshHourlyRollup(client, { wellIds: r.wellIds, signals: r.signals, los: r.los.map((t) => new Date(t)), his: r.his.map((t) => new Date(t)) });
}

/** Stored hours: stage the blocks, merge them in by time, recompute the merged hours' buckets. */
async function mergeStoredHours(client: pg.ClientBase, batch: ValueColumns<number>, blocks: Blocks, stored: number[]): Promise<number> {
  await ensureStagingTable(client);
  await copyPieces(client, "COPY ingest_stage_blocks (well_id, signal, hour, ts, vs) FROM STDIN (FORMAT binary)", blockPieces(batch, blocks, stored));
  const written = (await client.query<{ written: number }>(MERGE_SQL)).rows[0]?.written ?? 0;
  // Nothing changed → no bucket changed; skip the rollup reads. Otherwise the merged
  // hours' quarters, then their hourly and 3-hour rows (which also renews the series' versions).
  if (written > 0) {
    await rebuildRollups(client, blocks, stored);
  }
  return written;
}

/**
 * All hours new (the usual case, and always so for a file in time order): one COPY
 * each for blocks and rollups, no look-up first. If any hour is already stored the
 * blocks COPY fails on the key; we roll back to the savepoint, look up which hours
 * are stored, insert the new ones and merge the rest.
 */
async function writeHours(client: pg.ClientBase, batch: ValueColumns<number>, blocks: Blocks): Promise<number> {
  const all = Array.from({ length: blocks.length }, (_, k) => k);
  await client.query("SAVEPOINT hours");
  try {
    await insertNewHours(client, batch, blocks, all);
    return batch.length;
  } catch (e) {
    if (codeOf(e) !== UNIQUE_VIOLATION) throw e;
    await client.query("ROLLBACK TO SAVEPOINT hours");
  }
  const storedRows = (await client.query<{ i: number }>(STORED_SQL, [blocks.wellId, blocks.signal, blocks.hour])).rows;
  const isStored = new Uint8Array(blocks.length);
  for (const row of storedRows) isStored[row.i - 1] = 1;
  const fresh: number[] = [];
  const stored: number[] = [];
  for (let k = 0; k < blocks.length; k++) (isStored[k] ? stored : fresh).push(k);
  let written = 0;
  if (fresh.length > 0) {
    await insertNewHours(client, batch, blocks, fresh);
    for (const k of fresh) written += blocks.end[k] - blocks.start[k];
  }
  if (stored.length > 0) written += await mergeStoredHours(client, batch, blocks, stored);
  return written;
}

export async function writeSampleBatch(client: pg.ClientBase, unsorted: ValueColumns<number>, options: SampleWriteOptions = {}): Promise<SampleWriteResult> {
  if (unsorted.length === 0) return { written: 0, unchanged: 0 };
  const batch = isSortedByKey(unsorted) ? unsorted : sortByKey(unsorted);
  const blocks = findBlocks(batch);
  const lockKeys = seriesLockKeys(blocks);
  let lo = Infinity;
  let hi = -Infinity;
  for (let k = 0; k < blocks.length; k++) {
    lo = Math.min(lo, blocks.hour[k]);
    hi = Math.max(hi, blocks.hour[k]);
  }
  await ensureSamplePartitions(client, lo, hi);
  const maxAttempts = options.maxAttempts ?? 5;
  for (let attempt = 1; ; attempt++) {
    try {
      await client.query("BEGIN");
      if (options.isFlushDeferred) await client.query("SET LOCAL synchronous_commit = off");
      // Serialise writers per series before touching anything: two writers of the
      // same hour would otherwise both see it missing and both insert it, or each
      // rebuild a rollup bucket from a snapshot missing the other's values. Keys are
      // taken in ascending order, so two writers cannot deadlock on them.
      await client.query("SELECT count(pg_advisory_xact_lock(k)) FROM unnest($1::bigint[]) AS k", [lockKeys]);
      const written = await writeHours(client, batch, blocks);
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

