// The parse thread gives exactly what parsing on the main thread gives: the same
// batches of values in the same order, the same refusals with their lines, the same
// counts. Checked on awkward files of the fixture corpus and on a generated file of
// several batches.
import { createReadStream, readFileSync } from "node:fs";
import path from "node:path";
import { Readable } from "node:stream";
import { afterEach, describe, expect, it, vi } from "vitest";
import { detectFile, HEAD_CHARS } from "@/lib/ingest/detect";
import { MappingSchema } from "@/lib/ingest/mapping";
import { readRows, type ReadSummary, type RowBatch } from "@/lib/ingest/read-rows";
import { suggestMapping } from "@/lib/ingest/suggest-mapping";
import { createWellKeyResolver, normaliseWellKey, type WellKeyTable } from "@/lib/ingest/well-keys";
import { readRowsInThread } from "@/lib/services/uploads/read-rows-in-thread";
import { makeLongFile } from "./ingest-fixtures";

const DIR = path.resolve(__dirname, "../../fixtures/ingest");
const WELLS: WellKeyTable = {
  byKey: [["CF-12", 12], ["CF-14", 14], ["Cinder Flats 12-3", 123], ["EMBER-7", 7], ["GEN-1", 1], ["GEN-2", 2]].map(([k, id]) => [normaliseWellKey(k as string), id as number]),
  explicit: [],
};

afterEach(() => vi.restoreAllMocks());

async function both(input: () => AsyncIterable<Uint8Array>, text: string, opts: { timeZone?: string; wellKey?: string; batchSize?: number } = {}) {
  const detected = detectFile(text.slice(0, HEAD_CHARS));
  if (!detected.ok) throw new Error(detected.error.message);
  const mapping = MappingSchema.parse(suggestMapping(detected.detection, opts).mapping);
  const collect = () => {
    const rows: number[][] = [];
    const rejections: unknown[] = [];
    const onBatch = (b: RowBatch<number>) => {
      rejections.push(...b.rejections);
      for (let i = 0; i < b.values.length; i++) rows.push([b.values.wellId[i], b.values.signal[i], b.values.t[i], b.values.v[i]]);
    };
    return { rows, rejections, onBatch };
  };
  const here = collect();
  const there = collect();
  const options = { batchSize: opts.batchSize ?? 1000 };
  const a: ReadSummary<number> = await readRows<number>(input(), detected.detection, mapping, createWellKeyResolver(WELLS), here.onBatch, options);
  const b: ReadSummary<number> = await readRowsInThread(input(), detected.detection, mapping, WELLS, there.onBatch, options);
  return { here, there, a, b };
}

describe("parse thread", () => {
  it.each([
    ["good-long.csv", {}],
    ["status-text.csv", {}],
    ["unsorted.csv", {}],
    ["duplicates.csv", {}],
    ["quoted-fields.csv", {}],
    ["truncated-mid-row.csv", {}],
    ["dst-chicago-fall-back.csv", { timeZone: "America/Chicago", wellKey: "CF-12" }],
  ] as const)("%s: same values, refusals and counts as the main thread", async (file, opts) => {
    const warn = vi.spyOn(console, "warn");
    const full = path.join(DIR, file);
    const { here, there, a, b } = await both(() => createReadStream(full, { highWaterMark: 61 }), readFileSync(full, "utf8"), opts);
    expect(there.rows).toEqual(here.rows);
    expect(there.rejections).toEqual(here.rejections);
    expect(b).toEqual(a);
    expect(warn).not.toHaveBeenCalled(); // the thread ran (no fallback)
  });

  it("a generated file of many batches", async () => {
    const { text } = makeLongFile(["GEN-1", "GEN-2"], Date.UTC(2026, 4, 1), 2000, { withNoise: true });
    const bytes = Buffer.from(text);
    const { here, there, a, b } = await both(() => Readable.from([bytes.subarray(0, 5000), bytes.subarray(5000)]), text, { batchSize: 999 });
    expect(here.rows.length).toBeGreaterThan(5000); // several batches of 999
    expect(there.rows).toEqual(here.rows);
    expect(b).toEqual(a);
  });
});
