// Hour-block storage (sample_blocks) against the contract of the sample store:
// each (well, signal, t) stored once, the later value of a time wins, identical
// values are not rewritten, and the 15-minute rollup equals a recompute from the
// stored values (definitions of count, min, max, sum, first and last by time).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type pg from "pg";
import { closeDb, makeOrg, type TestOrg } from "../helpers";
import { openSampleClient } from "@/lib/services/samples/sample-db";
import { writeSampleBatch } from "@/lib/services/samples/write-sample-batch";
import { ensureSamplePartitions, forgetKnownPartitions } from "@/lib/services/samples/ensure-partitions";
import type { ValueColumns } from "@/lib/ingest/value-buffer";
import { addWell, sql } from "./ingest-fixtures";

const M = 60_000;
const H0 = Date.UTC(2026, 6, 14, 9); // a whole UTC hour
let org: TestOrg;
let wellId = 0;
let client: pg.Client;

const batch = (rows: [number, number, number][]): ValueColumns<number> => ({
  length: rows.length,
  wellId: rows.map(() => wellId),
  signal: Uint8Array.from(rows.map((r) => r[0])),
  t: Float64Array.from(rows.map((r) => r[1])),
  v: Float64Array.from(rows.map((r) => r[2])),
});
const minutes = (signal: number, from: number, to: number, value: (m: number) => number) =>
  Array.from({ length: to - from }, (_, k): [number, number, number] => [signal, H0 + (from + k) * M, value(from + k)]);

async function stored(): Promise<Map<number, number>> {
  const rows = await sql<{ ms: string; v: number }>(`SELECT (extract(epoch FROM t) * 1000)::bigint AS ms, v FROM samples WHERE well_id = $1 AND signal = 1 ORDER BY t`, [wellId]);
  return new Map(rows.map((r) => [Number(r.ms), r.v]));
}

async function rollupMismatches(): Promise<number> {
  const [r] = await sql<{ bad: string }>(
    `SELECT count(*) AS bad FROM (
       SELECT well_id, signal, date_bin('15 minutes', t, timestamptz '2000-01-01Z') AS bucket, count(*) n, min(v) lo, max(v) hi, sum(v) s,
              min(t) tf, max(t) tl, (array_agg(v ORDER BY t))[1] vf, (array_agg(v ORDER BY t DESC))[1] vl
       FROM samples WHERE well_id = $1 GROUP BY 1, 2, 3) x
     FULL JOIN (SELECT * FROM samples_15m WHERE well_id = $1) r USING (well_id, signal, bucket)
     WHERE r.n IS DISTINCT FROM x.n OR r.vmin IS DISTINCT FROM x.lo OR r.vmax IS DISTINCT FROM x.hi OR abs(r.vsum - x.s) > 1e-6
        OR r.tfirst IS DISTINCT FROM x.tf OR r.tlast IS DISTINCT FROM x.tl OR r.vfirst IS DISTINCT FROM x.vf OR r.vlast IS DISTINCT FROM x.vl`,
    [wellId],
  );
  return Number(r.bad);
}

beforeAll(async () => {
  org = await makeOrg("blocks");
  wellId = await addWell(org, `BLK-${org.organizationId}`, `Block Test ${org.organizationId}`);
  client = await openSampleClient();
});
afterAll(async () => {
  await client.end();
  await closeDb();
});

describe("sample hour blocks", () => {
  it("stores new hours as one block per (well, signal, hour) with times ascending", async () => {
    const r = await writeSampleBatch(client, batch([...minutes(1, 0, 30, (m) => 100 + m), ...minutes(1, 60, 75, (m) => 200 + m)]));
    expect(r).toEqual({ written: 45, unchanged: 0 });
    const blocks = await sql<{ hour: Date; n: number; ascending: boolean }>(
      `SELECT hour, cardinality(ts) AS n, ts = (SELECT array_agg(x ORDER BY x) FROM unnest(ts) x) AS ascending
       FROM sample_blocks WHERE well_id = $1 ORDER BY hour`,
      [wellId],
    );
    expect(blocks.map((b) => [b.hour.getTime(), b.n, b.ascending])).toEqual([[H0, 30, true], [H0 + 60 * M, 15, true]]);
    expect(await rollupMismatches()).toBe(0);
  });

  it("merges into a stored hour by time: new times added, the later value wins, identical values unchanged", async () => {
    // Minutes 20–39: 20–24 identical, 25–29 changed, 30–39 new.
    const r = await writeSampleBatch(client, batch(minutes(1, 20, 40, (m) => (m < 25 ? 100 + m : 500 + m))));
    expect(r).toEqual({ written: 15, unchanged: 5 });
    const s = await stored();
    expect(s.size).toBe(55);
    expect(s.get(H0 + 22 * M)).toBe(122);
    expect(s.get(H0 + 27 * M)).toBe(527);
    expect(s.get(H0 + 35 * M)).toBe(535);
    expect(s.get(H0 + 3 * M)).toBe(103);
    expect(await rollupMismatches()).toBe(0);
  });

  it("the same values again write nothing", async () => {
    const r = await writeSampleBatch(client, batch(minutes(1, 20, 40, (m) => (m < 25 ? 100 + m : 500 + m))));
    expect(r).toEqual({ written: 0, unchanged: 20 });
  });

  it("a stray rollup row in a new hour is rebuilt from the stored values", async () => {
    await sql(`INSERT INTO samples_15m (well_id, signal, bucket, n, vmin, vmax, vsum, vfirst, vlast, tfirst, tlast)
               VALUES ($1, 2, $2, 99, 0, 0, 0, 0, 0, $2, $2)`, [wellId, new Date(H0)]);
    const r = await writeSampleBatch(client, batch(minutes(2, 0, 20, (m) => 40 + m)));
    expect(r.written).toBe(20);
    expect(await rollupMismatches()).toBe(0);
  });

  it("several sessions creating the same new month at once all succeed", async () => {
    const month = Date.UTC(2027, 5, 10); // within the year ahead that gets partitions
    const clients = await Promise.all(Array.from({ length: 6 }, () => openSampleClient()));
    try {
      for (let round = 0; round < 3; round++) {
        await sql(`DROP TABLE IF EXISTS sample_blocks_2027m06`);
        forgetKnownPartitions();
        await Promise.all(clients.map((c) => ensureSamplePartitions(c, month, month)));
        const [r] = await sql<{ name: string | null }>(`SELECT to_regclass('sample_blocks_2027m06')::text AS name`);
        expect(r.name).toBe("sample_blocks_2027m06");
      }
    } finally {
      await sql(`DROP TABLE IF EXISTS sample_blocks_2027m06`);
      forgetKnownPartitions();
      await Promise.all(clients.map((c) => c.end()));
    }
  });
});
