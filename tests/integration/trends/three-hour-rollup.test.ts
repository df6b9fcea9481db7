// The 3-hour rollup (samples_3h) against its definition: for every 3-hour bucket, the
// count, minimum, maximum, sum, first and last value of the stored samples in it, and
// the 15-minute bucket holding the (earliest) minimum and maximum. The expected rows
// come from a direct aggregate of `samples` written independently of the
// implementation (array_agg … ORDER BY, not the rollup's min/max-of-pairs, and not
// through samples_1h); this is the definition of min/max/count, not a regression
// value. Every write goes through the ingest writer alone, which must keep the 3-hour
// rows in step on each of its paths. Values are invented.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type pg from "pg";
import { closeDb, makeOrg, type TestOrg } from "../helpers";
import { getSamplePool, openSampleClient } from "@/lib/services/samples/sample-db";
import { writeSampleBatch } from "@/lib/services/samples/write-sample-batch";
import { refreshHourlyRollup } from "@/lib/services/samples/refresh-hourly-rollup";
import type { ValueColumns } from "@/lib/ingest/value-buffer";
import { isMinFirst } from "@/lib/trends/minmax-points";
import { readMinMaxBuckets } from "@/lib/services/trends/query-trend-series";

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const B0 = Date.UTC(2026, 5, 14, 6); // an invented June morning: a 3-hour bucket starts at 06:00 UTC
const CASING = 1;
const TUBING = 2;
const INJECTION = 3;
const GAS = 4;
const LIQUID = 5;

let org: TestOrg;
let client: pg.Client;

interface BucketRow {
  /** Only read from samples_3h (not part of the definition). */
  extremes?: string;
  signal: number;
  bucket: number;
  n: number;
  vmin: number;
  vmax: number;
  vsum: number;
  vfirst: number;
  vlast: number;
  tmin: number;
  tmax: number;
  hfirst: number;
  hlast: number;
}

// Definition per 3-hour bucket, straight from the samples.
const DEFINITION_SQL = `
SELECT signal, date_part('epoch', date_bin('3 hours', t, timestamptz '2000-01-01Z')) * 1000 AS bucket,
       count(*)::int AS n, min(v) AS vmin, max(v) AS vmax, sum(v) AS vsum,
       (array_agg(v ORDER BY t))[1] AS vfirst, (array_agg(v ORDER BY t DESC))[1] AS vlast,
       date_part('epoch', date_bin('15 minutes', (array_agg(t ORDER BY v, t))[1], timestamptz '2000-01-01Z')) * 1000 AS tmin,
       date_part('epoch', date_bin('15 minutes', (array_agg(t ORDER BY v DESC, t))[1], timestamptz '2000-01-01Z')) * 1000 AS tmax,
       date_part('epoch', date_bin('1 hour', min(t), timestamptz '2000-01-01Z')) * 1000 AS hfirst,
       date_part('epoch', date_bin('1 hour', max(t), timestamptz '2000-01-01Z')) * 1000 AS hlast
FROM samples WHERE well_id = $1 GROUP BY 1, 2 ORDER BY 1, 2`;

const STORED_SQL = `
SELECT signal, date_part('epoch', bucket) * 1000 AS bucket, n, vmin, vmax, vsum, vfirst, vlast,
       date_part('epoch', tmin) * 1000 AS tmin, date_part('epoch', tmax) * 1000 AS tmax,
       date_part('epoch', hfirst) * 1000 AS hfirst, date_part('epoch', hlast) * 1000 AS hlast, extremes
FROM samples_3h WHERE well_id = $1 ORDER BY 1, 2`;

type Row = [signal: number, t: number, v: number];

function batchOf(rows: Row[]): ValueColumns<number> {
  return {
    length: rows.length,
    wellId: rows.map(() => org.wellId),
    signal: Uint8Array.from(rows.map((r) => r[0])),
    t: Float64Array.from(rows.map((r) => r[1])),
    v: Float64Array.from(rows.map((r) => r[2])),
  };
}

/** Minute values of one signal over [fromMin, toMin) minutes after B0. */
const minutes = (signal: number, fromMin: number, toMin: number, value: (m: number) => number): Row[] =>
  Array.from({ length: toMin - fromMin }, (_, k): Row => [signal, B0 + (fromMin + k) * MINUTE, value(fromMin + k)]);

/** Write through the ingest writer only: no refresh of our own afterwards. */
const write = (rows: Row[]) => writeSampleBatch(client, batchOf(rows));

async function readVersions(): Promise<Map<number, string>> {
  const r = await client.query<{ signal: number; version: string }>("SELECT signal, version FROM sample_series_versions WHERE well_id = $1", [org.wellId]);
  return new Map(r.rows.map((row) => [row.signal, row.version]));
}

const readStored = async () => (await client.query<BucketRow>(STORED_SQL, [org.wellId])).rows;
const find = (rows: BucketRow[], signal: number, bucket: number) => rows.find((r) => r.signal === signal && r.bucket === bucket);

/** Every stored 3-hour row equals the definition, and no bucket is missing or extra. */
async function compare(): Promise<BucketRow[]> {
  const expected = (await client.query<BucketRow>(DEFINITION_SQL, [org.wellId])).rows;
  const stored = await readStored();
  expect(stored.map((r) => [r.signal, r.bucket])).toEqual(expected.map((r) => [r.signal, r.bucket]));
  stored.forEach(({ extremes, ...row }, i) => {
    const want = expected[i];
    expect({ ...row, vsum: 0 }).toEqual({ ...want, vsum: 0 });
    // The generated column (migration 20261202000008): the extremes as float4, the earlier first.
    const drawn = isMinFirst(row.tmin, row.tmax, row.vfirst, row.vmin, row.vmax) ? [row.vmin, row.vmax] : [row.vmax, row.vmin];
    expect(extremes!.split(",").map((x) => Math.fround(Number(x)))).toEqual(drawn.map((v) => Math.fround(v)));
    // Sums of sums add in another order than the sum of the values: equal to rounding.
    expect(row.vsum).toBeCloseTo(want.vsum, 6);
  });
  return stored;
}

beforeAll(async () => {
  org = await makeOrg("three-hour-rollup");
  client = await openSampleClient();
}, 60_000);

afterAll(async () => {
  for (const table of ["sample_blocks", "samples_15m", "samples_1h", "samples_3h", "sample_series_versions"]) await client.query(`DELETE FROM ${table} WHERE well_id = $1`, [org.wellId]);
  await client.end();
  await getSamplePool().end();
  await closeDb();
});

describe("samples_3h kept by the sample writer", () => {
  it("stores one row per 3-hour bucket for a batch spanning several buckets and series (new-hours path)", async () => {
    // 07:00–14:40: casing every 7 minutes (hours split unevenly), tubing every minute
    // with the same lowest value at 07:10 and 08:40 (two hours of one bucket) and the
    // same highest value at 09:20 and 10:50.
    const rows: Row[] = [];
    for (let m = 60; m < 520; m += 7) rows.push([CASING, B0 + m * MINUTE, 980 + 12 * Math.sin(m / 9)]);
    for (let m = 60; m < 520; m++) {
      const v = m === 70 || m === 160 ? 120 : m === 200 || m === 290 ? 190 : 150 + 10 * Math.sin(m / 5);
      rows.push([TUBING, B0 + m * MINUTE, v]);
    }
    const before = await readVersions();
    await write(rows);
    const stored = await compare();
    // 06:00 (from 07:00, 120 values), 09:00 (180), 12:00 (to 14:40, 160).
    expect(stored.filter((r) => r.signal === TUBING).map((r) => [r.bucket, r.n])).toEqual([[B0, 120], [B0 + 3 * HOUR, 180], [B0 + 6 * HOUR, 160]]);
    // The ties: the earliest quarter hour holding the extreme.
    expect(find(stored, TUBING, B0)).toMatchObject({ vmin: 120, tmin: B0 + HOUR });
    expect(find(stored, TUBING, B0 + 3 * HOUR)).toMatchObject({ vmax: 190, tmax: B0 + 3 * HOUR + 15 * MINUTE });
    const after = await readVersions();
    expect(after.get(CASING)).toBeDefined();
    expect(after.get(CASING)).not.toBe(before.get(CASING));
    expect(after.get(TUBING)).not.toBe(before.get(TUBING));
  });

  it("recomputes a bucket from all its hours when they arrive one batch at a time, in any order", async () => {
    // Injection in bucket 15:00–18:00, hour by hour: 16:00, then 17:00, then 15:00 (out of order).
    const value = (m: number) => 450 + ((m * 37) % 23) - (m === 660 ? 100 : 0);
    const order = [16, 17, 15];
    for (const h of order) {
      const before = await readVersions();
      const m0 = (h - 6) * 60;
      await write(minutes(INJECTION, m0, m0 + 60, value));
      const stored = await compare();
      expect(find(stored, INJECTION, B0 + 9 * HOUR)?.n).toBe(60 * (order.indexOf(h) + 1));
      expect((await readVersions()).get(INJECTION)).not.toBe(before.get(INJECTION));
    }
    // The minimum (at 17:00) came in the second batch; the first value only with the last batch.
    expect(find(await readStored(), INJECTION, B0 + 9 * HOUR)).toMatchObject({ vmin: value(660), tmin: B0 + 11 * HOUR, vfirst: value(540) });
  });

  it("fills a bucket from parts of hours written in separate batches", async () => {
    // Gas 06:00–06:30, then 06:30–07:00 (the same hour, so the merge path), then 08:45–09:15 (two buckets).
    const value = (m: number) => 820 + 5 * Math.cos(m / 3);
    await write(minutes(GAS, 0, 30, value));
    await compare();
    await write(minutes(GAS, 30, 60, value));
    await compare();
    await write(minutes(GAS, 165, 195, value));
    const stored = await compare();
    expect(find(stored, GAS, B0)?.n).toBe(75);
    expect(find(stored, GAS, B0 + 3 * HOUR)?.n).toBe(15);
  });

  it("updates a bucket when a stored value is overwritten (merge path), and renews only that series' version", async () => {
    const before = await readVersions();
    const bucketBefore = find(await readStored(), CASING, B0 + 3 * HOUR)!;
    // Replace the stored 10:23 casing value with a new maximum and the 11:12 one with a new minimum.
    const r = await write([[CASING, B0 + (4 * 60 + 23) * MINUTE, 1500], [CASING, B0 + (5 * 60 + 12) * MINUTE, 700]]);
    expect(r).toEqual({ written: 2, unchanged: 0 });
    const stored = await compare();
    expect(find(stored, CASING, B0 + 3 * HOUR)).toMatchObject({ n: bucketBefore.n, vmax: 1500, tmax: B0 + 4 * HOUR + 15 * MINUTE, vmin: 700, tmin: B0 + 5 * HOUR });
    const after = await readVersions();
    expect(after.get(CASING)).not.toBe(before.get(CASING));
    expect(after.get(TUBING)).toBe(before.get(TUBING));
    // Writing the same values again changes nothing (as today: no rewrite, no new version).
    expect(await write([[CASING, B0 + (4 * 60 + 23) * MINUTE, 1500]])).toEqual({ written: 0, unchanged: 1 });
    expect((await readVersions()).get(CASING)).toBe(after.get(CASING));
  });

  it("handles a batch mixing stored and new hours across buckets and series", async () => {
    const before = await readVersions();
    const rows: Row[] = [
      ...minutes(TUBING, 500, 560, (m) => 140 + (m % 7)), // 14:20–15:20: overwrites stored 14:20–14:40, adds the rest, crosses 15:00
      ...minutes(CASING, 600, 605, () => 1010), // 16:00: new hour, new bucket for casing
      [INJECTION, B0 + (10 * 60 + 5) * MINUTE, 300], // a new minimum in a stored hour of a full bucket
      [GAS, B0 + 2 * HOUR, 900], // 08:00: a new hour in a bucket that holds 06:00–07:00 and 08:45–09:00
    ];
    await write(rows);
    const stored = await compare();
    expect(find(stored, INJECTION, B0 + 9 * HOUR)).toMatchObject({ vmin: 300, tmin: B0 + 10 * HOUR });
    expect(find(stored, GAS, B0)).toMatchObject({ n: 76, vmax: 900, tmax: B0 + 2 * HOUR });
    const after = await readVersions();
    for (const s of [CASING, TUBING, INJECTION, GAS]) expect(after.get(s)).not.toBe(before.get(s));
  });

  it("rebuilds the buckets and renews the version when a stray rollup row stands in the way (rebuild path)", async () => {
    // An hourly row without stored values (as a manual delete of samples would leave):
    // the writer's COPY of the new hour fails on it and the hour is rebuilt instead.
    const hour = B0 + 12 * HOUR; // 18:00, bucket 18:00–21:00
    await client.query(
      `INSERT INTO samples_1h (well_id, signal, bucket, n, vmin, vmax, vsum, vfirst, vlast, tmin, tmax)
       VALUES ($1, $2, to_timestamp($3 / 1000.0), 1, 1, 1, 1, 1, 1, to_timestamp($3 / 1000.0), to_timestamp($3 / 1000.0))`,
      [org.wellId, GAS, hour],
    );
    const before = await readVersions();
    await write(minutes(GAS, 12 * 60 + 10, 12 * 60 + 20, (m) => 800 + m / 100));
    const stored = await compare();
    expect(find(stored, GAS, hour)).toMatchObject({ n: 10, vmin: 800 + 730 / 100 });
    expect((await readVersions()).get(GAS)).not.toBe(before.get(GAS));
  });

  it("refreshHourlyRollup brings the 3-hour rows back in step and renews the versions", async () => {
    const first = await readStored();
    // Spoil one 3-hour row, then refresh over a range that reaches it twice (overlapping ranges are merged).
    await client.query("UPDATE samples_3h SET n = 0, vmax = -1 WHERE well_id = $1 AND signal = $2 AND bucket = to_timestamp($3 / 1000.0)", [org.wellId, TUBING, B0 + 3 * HOUR]);
    const before = await readVersions();
    await refreshHourlyRollup(client, {
      wellIds: [org.wellId, org.wellId],
      signals: [TUBING, TUBING],
      los: [new Date(B0 + 4 * HOUR), new Date(B0 + 3 * HOUR + 30 * MINUTE)],
      his: [new Date(B0 + 5 * HOUR), new Date(B0 + 4 * HOUR + 15 * MINUTE)],
    });
    expect(await readStored()).toEqual(first);
    expect((await readVersions()).get(TUBING)).not.toBe(before.get(TUBING));
    await compare();
  });

  it("reads the stored extremes back in bucket order when the buckets were stored out of time order", async () => {
    // Liquid in eight 3-hour buckets from 2026-06-16 00:00 UTC, written last bucket
    // first, then the second bucket rewritten (its row moves to the end of the table):
    // the list must still come back in time order (query-trend-series.ts relies on a
    // sorted subquery feeding string_agg; PostgreSQL manual §4.2.7).
    const day = (B0 - 6 * HOUR + 2 * 24 * HOUR - B0) / MINUTE; // minutes from B0 to 2026-06-16 00:00
    const value = (m: number) => 300 + ((m * 13) % 41);
    for (let b = 7; b >= 0; b--) await write(minutes(LIQUID, day + b * 180, day + b * 180 + 90, value));
    await write([[LIQUID, B0 + (day + 200) * MINUTE, 5]]);
    await compare();
    const from = B0 + day * MINUTE;
    const answer = await readMinMaxBuckets(client, { wellId: org.wellId, codes: [LIQUID], fromMs: from, toMs: from + 24 * HOUR - MINUTE }, 3 * HOUR, "three_hourly");
    const rows = (await readStored()).filter((r) => r.signal === LIQUID && r.bucket >= from);
    expect(rows.map((r) => r.bucket)).toEqual(Array.from({ length: 8 }, (_, b) => from + b * 3 * HOUR));
    const columns = answer.buckets.get(LIQUID)!;
    expect(columns.starts).toEqual(rows.map((r) => r.bucket));
    expect(columns.consecutive).toBe(true);
    expect(columns.values).toBe(rows.map((r) => r.extremes).join(","));
    expect(columns.values.split(",").slice(2, 4)).toContain("5");
  });
});
