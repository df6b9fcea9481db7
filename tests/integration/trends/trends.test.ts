// The trend route's service against the real test database: reduction to at most
// ~2,000 points per signal with spikes kept, raw values when zoomed in, organization
// isolation, and the valve reference lines. Series are invented (trend-fixtures.ts);
// the expected figures are regression values of our own code, except the valve lines,
// which are checked against valveSurfacePressures (itself tested against DOMAIN.md's
// [published]/[computed] values in lib/gaslift).
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { FieldEvent, Issue, Mandrel } from "@/models";
import { closeDb, makeOrg, type TestOrg } from "../helpers";
import { getTrendData } from "@/lib/services/trends/get-trend-data";
import { getWell } from "@/lib/services/wells/get-well";
import { mandrelColumns } from "@/lib/services/wells/well-dto";
import { valveSurfacePressures } from "@/lib/gaslift/operating-point";
import { formatValveLabel } from "@/lib/trends/valve-label";
import { AppError } from "@/lib/errors";
import { readMinMaxBuckets, type MinMaxColumns } from "@/lib/services/trends/query-trend-series";
import { parseNumberList } from "@/lib/trends/number-list-text";
import { serializeTrendData } from "@/lib/trends/serialize-trend-data";
import { decodeTrendData, type WireTrendData } from "@/lib/trends/trend-wire";
import { readTrendContext } from "@/lib/services/trends/read-trend-context";
import { clearTrendSampleCache } from "@/lib/services/trends/trend-sample-cache";
import { clearLiveMedians } from "@/lib/services/trends/live-medians-cache";
import { getReadPool, getSamplePool, openSampleClient } from "@/lib/services/samples/sample-db";
import { writeSampleBatch } from "@/lib/services/samples/write-sample-batch";
import { refreshHourlyRollupOf } from "./trend-fixtures";
import { DAY, MINUTE, makeFixture, valueAt, writeFixture } from "./trend-fixtures";

let org: TestOrg;
let other: TestOrg;
const END = Date.UTC(2026, 9, 30); // 90 days: early August to the end of October 2026
const fixture = makeFixture(END - 90 * DAY, 90);

beforeAll(async () => {
  org = await makeOrg("trends");
  other = await makeOrg("trends-other");
  // An invented valve string: three IPO unloading valves and an orifice.
  const valves = [
    { position: 1, mdFt: 2600, tvdFt: 2600, kind: "ipo", portIn: 0.25, valveOdIn: 1.5, rRatio: null, tropsig: 1010 },
    { position: 2, mdFt: 4200, tvdFt: 4200, kind: "ipo", portIn: 0.25, valveOdIn: 1.5, rRatio: null, tropsig: 985 },
    { position: 3, mdFt: 5500, tvdFt: 5500, kind: "ipo", portIn: 0.25, valveOdIn: 1.5, rRatio: null, tropsig: 960 },
    { position: 4, mdFt: 6600, tvdFt: 6600, kind: "orifice", portIn: 0.25, valveOdIn: null, rRatio: null, tropsig: null },
  ] as const;
  await Mandrel.bulkCreate(valves.map((m) => ({ ...mandrelColumns(m), well_id: org.wellId, organization_id: org.organizationId })));
  await writeFixture(org.wellId, fixture);
  const mid = fixture.start + 45 * DAY;
  await Issue.create({
    organization_id: org.organizationId, well_id: org.wellId, rule: "heading", severity: 50, confidence: 0.8,
    started_at: new Date(mid), last_seen_at: new Date(mid + DAY), ended_at: null, summary: "Tubing swings with a 90-minute period",
  });
  await Issue.create({
    organization_id: org.organizationId, well_id: org.wellId, rule: "liquid_loading", status: "resolved", severity: 30, confidence: 0.6,
    started_at: new Date(fixture.start - 30 * DAY), last_seen_at: new Date(fixture.start - 20 * DAY), ended_at: null, summary: "older, outside the range",
  });
  await FieldEvent.create({
    organization_id: org.organizationId, pad_id: org.padId, kind: "injection_outage",
    started_at: new Date(mid + 2 * DAY), ended_at: new Date(mid + 2 * DAY + 4 * 3600_000), well_count: 3, summary: "pad lost injection",
  });
}, 300_000);

afterAll(async () => {
  // 90 days of minute values are ~0.5 M rows: leave the shared test database as it was.
  for (const table of ["sample_blocks", "samples_15m", "samples_1h", "samples_3h", "sample_series_versions"]) {
    await getSamplePool().query(`DELETE FROM ${table} WHERE well_id = ANY($1::int[])`, [[org.wellId, other.wellId]]);
  }
  await getSamplePool().end();
  await getReadPool().end();
  await closeDb();
});

describe("getTrendData", () => {
  it("reduces 90 days to at most ~2,000 points per signal and keeps a one-minute spike (regression)", async () => {
    const t0 = performance.now();
    const d = await getTrendData(org.actors.engineer, org.wellId, { from: fixture.start, to: END, width: 1200 });
    const ms = performance.now() - t0;
    console.log(`[trends] 90 days × 5 signals, 1-minute data: ${ms.toFixed(0)} ms, bucket ${d.bucketMs / MINUTE} min`);
    expect(d.resolution).toBe("minmax");
    expect(d.series.map((s) => s.signal)).toEqual(["casing_pressure", "tubing_pressure", "injection_rate", "gas_rate", "liquid_rate"]);
    for (const s of d.series) {
      expect(s.t.length).toBeGreaterThan(100);
      expect(s.t.length).toBeLessThanOrEqual(2010);
      expect(s.v.length).toBe(s.t.length);
      for (let i = 1; i < s.t.length; i++) expect(s.t[i]).toBeGreaterThan(s.t[i - 1]);
    }
    const casing = d.series.find((s) => s.signal === "casing_pressure")!;
    const tubing = d.series.find((s) => s.signal === "tubing_pressure")!;
    expect(Math.max(...casing.v.map((v) => v ?? -Infinity))).toBe(fixture.spikeValue);
    expect(Math.min(...tubing.v.map((v) => v ?? Infinity))).toBe(fixture.dipValue);
    // The spike sits in the bucket that holds its minute.
    const i = casing.v.indexOf(fixture.spikeValue);
    expect(Math.abs(casing.t[i] - fixture.spikeAt)).toBeLessThan(d.bucketMs);
    expect(casing.unit).toBe("psig");
  });

  it("returns the stored values when zoomed in to two hours (regression)", async () => {
    const from = fixture.spikeAt - 60 * MINUTE;
    const to = fixture.spikeAt + 60 * MINUTE;
    const d = await getTrendData(org.actors.analyst, org.wellId, { from, to, width: 1200, signals: ["casing_pressure", "liquid_rate"] });
    expect(d.resolution).toBe("raw");
    expect(d.bucketMs).toBe(0);
    const casing = d.series[0];
    expect(casing.t.length).toBe(121);
    expect(casing.t[0]).toBe(from);
    casing.t.forEach((t, k) => expect(casing.v[k]).toBeCloseTo(valueAt(fixture, "casing_pressure", t), 9));
    expect(casing.v[60]).toBe(fixture.spikeValue);
    expect(d.series[1].signal).toBe("liquid_rate");
    expect(d.series[1].t.length).toBe(2); // hourly values at 12:00 and 13:00
  });

  it("uses min/max buckets from the samples for a medium range (regression)", async () => {
    const d = await getTrendData(org.actors.engineer, org.wellId, { from: fixture.spikeAt - DAY, to: fixture.spikeAt + DAY, width: 1200 });
    expect(d.resolution).toBe("minmax");
    expect(d.bucketMs).toBe(5 * MINUTE);
    const casing = d.series[0];
    expect(casing.t.length).toBeLessThanOrEqual(2000);
    expect(Math.max(...casing.v.map((v) => v ?? -Infinity))).toBe(fixture.spikeValue);
  });

  it("reads the same valve design and pad as the well page (getWell)", async () => {
    const full = await getWell(org.actors.engineer, org.wellId);
    const scope = { organizationId: org.organizationId, wellId: org.wellId, fromMs: fixture.start, toMs: END };
    const lean = await readTrendContext(getSamplePool(), scope);
    // getWell's mandrels also carry their row id and install date, which the design does not use.
    const mandrels = full.design.mandrels.map((m) => ({
      position: m.position, mdFt: m.mdFt, tvdFt: m.tvdFt, kind: m.kind, portIn: m.portIn, valveOdIn: m.valveOdIn, rRatio: m.rRatio, tropsig: m.tropsig,
    }));
    expect(lean).toMatchObject({ wellId: full.id, padId: full.padId, design: { ...full.design, mandrels } });
    await expect(readTrendContext(getSamplePool(), { ...scope, organizationId: other.organizationId })).rejects.toMatchObject({ code: "not_found" });
  });

  it("answers 404 for another organization's well", async () => {
    const p = getTrendData(other.actors.engineer, org.wellId, { from: fixture.start, to: END });
    await expect(p).rejects.toBeInstanceOf(AppError);
    await expect(p).rejects.toMatchObject({ code: "not_found" });
  });

  it("refuses a reversed range", async () => {
    await expect(getTrendData(org.actors.engineer, org.wellId, { from: END, to: END - DAY })).rejects.toMatchObject({ code: "invalid" });
  });

  it("draws the valve lines of valveSurfacePressures at the recent median tubing pressure", async () => {
    const d = await getTrendData(org.actors.operator, org.wellId, { from: END - 7 * DAY, to: END });
    const { tubingPsig, casingPsig } = d.overlays.recent;
    // The median of a full sine over 6 hours sits at its centre line (150 and 960 psig).
    expect(tubingPsig).toBeCloseTo(150, 0);
    expect(casingPsig).toBeCloseTo(960, 0);
    const design = (await getWell(org.actors.operator, org.wellId)).design;
    const expected = valveSurfacePressures(design, tubingPsig!);
    expect(d.overlays.valves.map((v) => [v.position, v.surfaceOpeningPsig, v.surfaceClosingPsig])).toEqual(
      expected.map((v) => [v.position, v.surfaceOpeningPsig, v.surfaceClosingPsig]),
    );
    const v1 = d.overlays.valves[0];
    expect(v1.surfaceOpeningPsig).not.toBeNull();
    expect(v1.openLabel).toBe(formatValveLabel(1, "open", v1.surfaceOpeningPsig!));
    expect(v1.openLabel).toMatch(/^V1 open [\d,]+ psig$/);
    expect(d.overlays.valves[3]).toMatchObject({ kind: "orifice", surfaceOpeningPsig: null, openLabel: null });
    expect(d.overlays.operatingPoint?.label).toMatch(/^Operating valve/);
  });

  it("lists the issues and pad field events overlapping the range", async () => {
    const d = await getTrendData(org.actors.engineer, org.wellId, { from: fixture.start, to: END });
    expect(d.overlays.issues.map((i) => [i.rule, i.label, i.end])).toEqual([["heading", "Heading", null]]);
    expect(d.overlays.fieldEvents.map((e) => e.label)).toEqual(["Pad-wide injection outage"]);
    const early = await getTrendData(org.actors.engineer, org.wellId, { from: fixture.start, to: fixture.start + DAY });
    expect(early.overlays.issues).toEqual([]);
    expect(early.overlays.fieldEvents).toEqual([]);
  });
});

/** Each bucket as [start, minimum, maximum], from the pairs in the order they happened. */
function extremes(c: MinMaxColumns): number[][] {
  const v = parseNumberList(c.values) as number[];
  return c.starts.map((start, i) => [start, Math.min(v[2 * i], v[2 * i + 1]), Math.max(v[2 * i], v[2 * i + 1])]);
}

/** The SQL text of a pool.query call: a string, or a named statement's config. */
const sqlOf = (arg: unknown) => (typeof arg === "string" ? arg : (arg as { text: string }).text);

describe("an outage in bucketed data", () => {
  it("breaks the line with a null inside the outage, in the service's answer and in the JSON sent", async () => {
    // Invented: 10-minute casing pressure for 30 days with no values for days 12 to 15.
    const start = END - 30 * DAY;
    const times = Array.from({ length: 30 * 144 }, (_, i) => start + i * 10 * MINUTE).filter((t) => t < start + 12 * DAY || t >= start + 15 * DAY);
    const client = await openSampleClient();
    try {
      await writeSampleBatch(client, {
        length: times.length,
        wellId: times.map(() => other.wellId),
        signal: new Uint8Array(times.length).fill(1),
        t: Float64Array.from(times),
        v: Float64Array.from(times, (t) => 900 + ((t / (10 * MINUTE)) % 7)),
      });
    } finally {
      await client.end();
    }
    // 30 days: hourly buckets; 90 days: the stored 3-hour buckets, whose numbers are sent only around a gap.
    for (const days of [30, 90]) {
      const d = await getTrendData(other.actors.engineer, other.wellId, { from: END - days * DAY, to: END, width: 1200 });
      expect(d.resolution).toBe("minmax");
      expect(d.bucketMs).toBe(days === 30 ? 60 * MINUTE : 180 * MINUTE);
      const casing = d.series[0];
      const gaps = casing.v.flatMap((v, i) => (v === null ? [i] : []));
      expect(gaps).toHaveLength(1);
      expect(casing.t[gaps[0]]).toBeGreaterThan(start + 12 * DAY);
      expect(casing.t[gaps[0]]).toBeLessThan(start + 15 * DAY);
      for (let i = 1; i < casing.t.length; i++) expect(casing.t[i]).toBeGreaterThan(casing.t[i - 1]);
      expect(casing.t[0]).toBeGreaterThanOrEqual(start);
      expect(casing.v.filter((v) => v !== null).every((v) => v >= 900 && v <= 906)).toBe(true);
      const sent = decodeTrendData(JSON.parse(new TextDecoder().decode(serializeTrendData(d))) as WireTrendData);
      expect(sent.series[0]).toEqual({ signal: casing.signal, unit: casing.unit, t: casing.t, v: [...casing.v] });
      expect(d.series[1]).toEqual({ signal: "tubing_pressure", unit: "psig", t: [], v: [] });
    }
  });
});

describe("which table a trend is read from", () => {
  /** The tables named in FROM clauses of the sample queries one getTrendData call runs. */
  async function tablesRead(from: number, to: number): Promise<Set<string>> {
    clearTrendSampleCache();
    clearLiveMedians();
    const pool = getReadPool();
    const spy = vi.spyOn(pool, "query");
    try {
      await getTrendData(org.actors.engineer, org.wellId, { from, to, width: 1200 });
      const texts = spy.mock.calls.map((c) => sqlOf(c[0]));
      return new Set(texts.flatMap((t) => [...t.matchAll(/FROM (samples\w*)/g)].map((m) => m[1])));
    } finally {
      spy.mockRestore();
    }
  }

  it("reads 90 days (3-hour buckets) from the 3-hour rollup, and samples only for the recent medians", async () => {
    const tables = await tablesRead(fixture.start, END);
    expect([...tables].sort()).toEqual(["samples", "samples_3h"]);
  });

  it("reads 30 days (1-hour buckets) from the hourly rollup", async () => {
    const tables = await tablesRead(END - 30 * DAY, END);
    expect([...tables].sort()).toEqual(["samples", "samples_1h"]);
  });

  it("reads 7 days (15-minute buckets) from the 15-minute rollup", async () => {
    const tables = await tablesRead(END - 7 * DAY, END);
    expect(tables.has("samples_15m")).toBe(true);
    expect(tables.has("samples_1h")).toBe(false);
  });

  it("reads 2 days (5-minute buckets) from the samples, counting from the 15-minute rollup first", async () => {
    const tables = await tablesRead(fixture.spikeAt - DAY, fixture.spikeAt + DAY);
    expect([...tables].sort()).toEqual(["samples", "samples_15m"]);
  });

  it("gives the same 3-hour buckets and counts from the 3-hour, hourly and 15-minute rollups (regression)", async () => {
    const q = { wellId: org.wellId, codes: [1, 2, 3, 4, 5], fromMs: fixture.start, toMs: END };
    const threeHourly = await readMinMaxBuckets(getSamplePool(), q, 3 * 60 * MINUTE, "three_hourly");
    const hourly = await readMinMaxBuckets(getSamplePool(), q, 3 * 60 * MINUTE, "hourly");
    const quarter = await readMinMaxBuckets(getSamplePool(), q, 3 * 60 * MINUTE, "rollup");
    expect(hourly.buckets.get(1)!.starts.length).toBe(90 * 8);
    expect(threeHourly).toEqual(hourly);
    expect(hourly).toEqual(quarter);
    // And the extremes agree with the samples themselves (the order may differ inside a quarter hour).
    const exact = await readMinMaxBuckets(getSamplePool(), q, 3 * 60 * MINUTE, "samples");
    expect(hourly.counts).toEqual(exact.counts);
    for (const [code, columns] of exact.buckets) {
      expect(extremes(hourly.buckets.get(code)!)).toEqual(extremes(columns));
    }
  });
});

describe("the in-memory chart cache", () => {
  const range = () => ({ from: fixture.start, to: END, width: 1200 });

  it("answers a repeated request without reading the samples again, with the same series", async () => {
    clearTrendSampleCache();
    // Kept from the second request on (the first only marks the range as asked for).
    await getTrendData(org.actors.engineer, org.wellId, range());
    const first = await getTrendData(org.actors.engineer, org.wellId, range());
    const spy = vi.spyOn(getReadPool(), "query");
    try {
      const again = await getTrendData(org.actors.engineer, org.wellId, range());
      // The version check and the overlays (issues, field events, valve design), no samples.
      const texts = spy.mock.calls.map((c) => sqlOf(c[0]));
      expect(texts).toHaveLength(2);
      expect(texts.some((t) => t.includes("sample_series_versions"))).toBe(true);
      expect(texts.filter((t) => /FROM samples/.test(t))).toEqual([]);
      expect(again.series).toEqual(first.series);
    } finally {
      spy.mockRestore();
    }
  });

  it("never shows a cached answer after a value in its range is rewritten (by any writer)", async () => {
    const before = await getTrendData(org.actors.engineer, org.wellId, range());
    const at = fixture.start + 10 * DAY + 33 * MINUTE;
    const casing = () => before.series[0];
    expect(Math.max(...casing().v.map((v) => v ?? -Infinity))).toBe(fixture.spikeValue);
    // Another writer (its own connection, as the ingest worker is its own process) stores a higher spike.
    const client = await openSampleClient();
    try {
      const b = { length: 1, wellId: [org.wellId], signal: Uint8Array.of(1), t: Float64Array.of(at), v: Float64Array.of(1600) };
      await writeSampleBatch(client, b);
      await refreshHourlyRollupOf(client, org.wellId, at - 15 * MINUTE, at + 15 * MINUTE);
      const after = await getTrendData(org.actors.engineer, org.wellId, range());
      expect(Math.max(...after.series[0].v.map((v) => v ?? -Infinity))).toBe(1600);
      // Put the fixture value back for the other tests (and the cache follows again).
      b.v[0] = valueAt(fixture, "casing_pressure", at);
      await writeSampleBatch(client, b);
      await refreshHourlyRollupOf(client, org.wellId, at - 15 * MINUTE, at + 15 * MINUTE);
      const restored = await getTrendData(org.actors.engineer, org.wellId, range());
      expect(Math.max(...restored.series[0].v.map((v) => v ?? -Infinity))).toBe(fixture.spikeValue);
    } finally {
      await client.end();
    }
  });
});

describe("the live medians (valve lines of a chart that reaches the latest values)", () => {
  /** The chart answer, and how many times the recent medians were read from the samples for it. */
  async function withMedianReads(from: number, to: number) {
    const spy = vi.spyOn(getReadPool(), "query");
    try {
      const d = await getTrendData(org.actors.engineer, org.wellId, { from, to, width: 1200 });
      return { d, reads: spy.mock.calls.filter((c) => sqlOf(c[0]).includes("percentile_cont")).length };
    } finally {
      spy.mockRestore();
    }
  }

  it("reads them once for every range that reaches the latest values, and afresh for one that ends before them", async () => {
    clearLiveMedians();
    const live = await withMedianReads(fixture.start, END);
    expect(live.reads).toBe(1);
    expect(live.d.overlays.recent.windowEnd).toBe(END - MINUTE);
    // Panned and zoomed, still reaching the latest values: kept.
    const panned = await withMedianReads(fixture.start + 3 * DAY, END + DAY);
    expect(panned.reads).toBe(0);
    expect(panned.d.overlays.recent).toEqual(live.d.overlays.recent);
    // Ending ten days earlier: read for that end, and not kept in place of the live ones.
    const earlier = await withMedianReads(fixture.start, END - 10 * DAY);
    expect(earlier.reads).toBe(1);
    expect(earlier.d.overlays.recent.windowEnd).toBeLessThanOrEqual(END - 10 * DAY);
    expect((await withMedianReads(fixture.start + DAY, END)).reads).toBe(0);
    // What was kept is what a fresh read gives.
    clearLiveMedians();
    const fresh = await withMedianReads(fixture.start + DAY, END);
    expect(fresh.reads).toBe(1);
    expect(fresh.d.overlays.recent).toEqual(live.d.overlays.recent);
  });

  it("reads them again after a write to the well's pressure or injection series, by any writer", async () => {
    const before = await withMedianReads(fixture.start, END);
    const at = END - 2 * MINUTE;
    const client = await openSampleClient();
    try {
      const b = { length: 1, wellId: [org.wellId], signal: Uint8Array.of(3), t: Float64Array.of(at), v: Float64Array.of(5000) };
      await writeSampleBatch(client, b);
      const after = await withMedianReads(fixture.start, END);
      expect(after.reads).toBe(1);
      // Put the fixture value back: read again, and the same medians as before.
      b.v[0] = valueAt(fixture, "injection_rate", at);
      await writeSampleBatch(client, b);
      const restored = await withMedianReads(fixture.start, END);
      expect(restored.reads).toBe(1);
      expect(restored.d.overlays.recent).toEqual(before.d.overlays.recent);
    } finally {
      await client.end();
    }
  });
});
