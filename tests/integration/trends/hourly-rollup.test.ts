// The hourly rollup (samples_1h) against its definition: for every hour, the count,
// minimum, maximum, sum, first and last value of the stored samples in that hour,
// and the 15-minute bucket holding the (earliest) minimum and maximum. The expected
// rows come from a direct aggregate of `samples` written independently of the
// implementation (array_agg … ORDER BY, not the rollup's min/max-of-pairs); this is
// the definition of min/max/count, not a regression value. Values are invented.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type pg from "pg";
import { closeDb, makeOrg, type TestOrg } from "../helpers";
import { getSamplePool, openSampleClient } from "@/lib/services/samples/sample-db";
import { writeSampleBatch } from "@/lib/services/samples/write-sample-batch";
import { refreshHourlyRollup } from "@/lib/services/samples/refresh-hourly-rollup";
import type { ValueColumns } from "@/lib/ingest/value-buffer";

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const START = Date.UTC(2026, 5, 14, 6); // an invented June morning
const CASING = 1;
const TUBING = 2;

let org: TestOrg;
let client: pg.Client;

interface HourRow {
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
}

// Definition of min/max/count per hour, straight from the samples.
const DEFINITION_SQL = `
SELECT signal, date_part('epoch', date_bin('1 hour', t, timestamptz '2000-01-01Z')) * 1000 AS bucket,
       count(*)::int AS n, min(v) AS vmin, max(v) AS vmax, sum(v) AS vsum,
       (array_agg(v ORDER BY t))[1] AS vfirst, (array_agg(v ORDER BY t DESC))[1] AS vlast,
       date_part('epoch', date_bin('15 minutes', (array_agg(t ORDER BY v, t))[1], timestamptz '2000-01-01Z')) * 1000 AS tmin,
       date_part('epoch', date_bin('15 minutes', (array_agg(t ORDER BY v DESC, t))[1], timestamptz '2000-01-01Z')) * 1000 AS tmax
FROM samples WHERE well_id = $1 GROUP BY 1, 2 ORDER BY 1, 2`;

const STORED_SQL = `
SELECT signal, date_part('epoch', bucket) * 1000 AS bucket, n, vmin, vmax, vsum, vfirst, vlast,
       date_part('epoch', tmin) * 1000 AS tmin, date_part('epoch', tmax) * 1000 AS tmax
FROM samples_1h WHERE well_id = $1 ORDER BY 1, 2`;

function batchOf(wellId: number, rows: [signal: number, t: number, v: number][]): ValueColumns<number> {
  return {
    length: rows.length,
    wellId: rows.map(() => wellId),
    signal: Uint8Array.from(rows.map((r) => r[0])),
    t: Float64Array.from(rows.map((r) => r[1])),
    v: Float64Array.from(rows.map((r) => r[2])),
  };
}

/** Write through the ingest writer, then refresh the hourly rollup over the batch's range, as the writer will. */
async function write(rows: [number, number, number][]): Promise<void> {
  await writeSampleBatch(client, batchOf(org.wellId, rows));
  const signals = [...new Set(rows.map((r) => r[0]))];
  const ts = rows.map((r) => r[1]);
  const q = 15 * MINUTE;
  const lo = new Date(Math.floor(Math.min(...ts) / q) * q);
  const hi = new Date(Math.floor(Math.max(...ts) / q) * q + q);
  await refreshHourlyRollup(client, { wellIds: signals.map(() => org.wellId), signals, los: signals.map(() => lo), his: signals.map(() => hi) });
}

async function readVersions(): Promise<Map<number, string>> {
  const r = await client.query<{ signal: number; version: string }>("SELECT signal, version FROM sample_series_versions WHERE well_id = $1", [org.wellId]);
  return new Map(r.rows.map((row) => [row.signal, row.version]));
}

async function compare(): Promise<HourRow[]> {
  const expected = (await client.query<HourRow>(DEFINITION_SQL, [org.wellId])).rows;
  const stored = (await client.query<HourRow>(STORED_SQL, [org.wellId])).rows;
  expect(stored.length).toBe(expected.length);
  stored.forEach((row, i) => {
    const want = expected[i];
    expect({ ...row, vsum: 0 }).toEqual({ ...want, vsum: 0 });
    // Sums of sums add in another order than the sum of the values: equal to rounding.
    expect(row.vsum).toBeCloseTo(want.vsum, 6);
  });
  return stored;
}

beforeAll(async () => {
  org = await makeOrg("hourly-rollup");
  client = await openSampleClient();
  // 3 h 40 min of invented casing (every 7 minutes, so hours split unevenly) and
  // tubing (every minute) with a minimum repeated in two quarter hours of one hour.
  const rows: [number, number, number][] = [];
  for (let m = 0; m < 220; m += 7) rows.push([CASING, START + m * MINUTE, 980 + 12 * Math.sin(m / 9)]);
  for (let m = 0; m < 220; m++) {
    const isTie = m === 70 || m === 100; // same lowest value at 07:10 and 07:40
    rows.push([TUBING, START + m * MINUTE, isTie ? 120 : 150 + 10 * Math.sin(m / 5)]);
  }
  await write(rows);
}, 60_000);

afterAll(async () => {
  for (const table of ["sample_blocks", "samples_15m", "samples_1h", "samples_3h", "sample_series_versions"]) await client.query(`DELETE FROM ${table} WHERE well_id = $1`, [org.wellId]);
  await client.end();
  await getSamplePool().end();
  await closeDb();
});

describe("refreshHourlyRollup", () => {
  it("stores per hour the count, min, max, sum, first and last value of the samples (definition of min/max/count)", async () => {
    const stored = await compare();
    expect(stored.filter((r) => r.signal === TUBING).map((r) => r.n)).toEqual([60, 60, 60, 40]);
    // The tie: the earliest quarter hour holding the minimum (07:00–07:15 holds 07:10).
    const tubing7 = stored.find((r) => r.signal === TUBING && r.bucket === START + HOUR)!;
    expect(tubing7.vmin).toBe(120);
    expect(tubing7.tmin).toBe(START + HOUR);
  });

  it("updates an hour when one of its values is rewritten, and adds a new hour", async () => {
    const versionBefore = await readVersions();
    const before = (await client.query<HourRow>(STORED_SQL, [org.wellId])).rows.find((r) => r.signal === CASING && r.bucket === START + 2 * HOUR)!;
    // Replace the 08:20 casing value with a new maximum (the writer's merge path), and add 10:05.
    await write([[CASING, START + 2 * HOUR + 20 * MINUTE, 1500]]);
    await write([[CASING, START + 4 * HOUR + 5 * MINUTE, 990]]);
    const stored = await compare();
    const after = stored.find((r) => r.signal === CASING && r.bucket === START + 2 * HOUR)!;
    expect(after.n).toBe(before.n);
    expect(after.vmax).toBe(1500);
    expect(after.tmax).toBe(START + 2 * HOUR + 15 * MINUTE);
    expect(stored.find((r) => r.signal === CASING && r.bucket === START + 4 * HOUR)).toMatchObject({ n: 1, vmin: 990, vmax: 990, vfirst: 990, vlast: 990 });
    // The written series has a new version (chart answers cached on the old one are dropped); the other does not.
    const versionAfter = await readVersions();
    expect(versionAfter.get(CASING)).not.toBe(versionBefore.get(CASING));
    expect(versionAfter.get(TUBING)).toBe(versionBefore.get(TUBING));
  });

  it("is idempotent: refreshing again over the same range changes nothing", async () => {
    const first = (await client.query<HourRow>(STORED_SQL, [org.wellId])).rows;
    await refreshHourlyRollup(client, { wellIds: [org.wellId, org.wellId], signals: [CASING, TUBING], los: [new Date(START), new Date(START)], his: [new Date(START + 5 * HOUR), new Date(START + 5 * HOUR)] });
    expect((await client.query<HourRow>(STORED_SQL, [org.wellId])).rows).toEqual(first);
  });

  it("does nothing for an empty batch", async () => {
    await expect(refreshHourlyRollup(client, { wellIds: [], signals: [], los: [], his: [] })).resolves.toBeUndefined();
  });
});
