// Behaviour of the streaming reader: caps, batches, refusals. Expectations are our own
// contract (hand-counted from the inputs), not outside facts.
import { createReadStream, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { detectFile } from "./detect";
import { MappingSchema, type Mapping } from "./mapping";
import { readRows, type RowBatch } from "./read-rows";
import type { Detection } from "./types";

const WELLS: Record<string, number> = { "CF-12": 12, "CF-14": 14 };
const resolveWell = (k: string) => WELLS[k];

function detect(text: string): Detection {
  const r = detectFile(text.slice(0, 65_536), { isTruncated: text.length > 65_536 });
  if (!r.ok) throw new Error(r.error.message);
  return r.detection;
}

const LONG: Mapping = MappingSchema.parse({
  layout: "long",
  timeColumn: "Timestamp",
  timeFormat: "iso",
  timeZone: "UTC",
  long: {
    tagColumn: "Tag",
    valueColumn: "Value",
    tags: { mode: "pattern", pattern: "^(?<well>[^.]+)\\.(?<signal>.+)$", signalAliases: { csg: "casing_pressure", tbg: "tubing_pressure" }, units: { casing_pressure: "psig", tubing_pressure: "psig" } },
  },
});

async function* fromStrings(...chunks: string[]) {
  for (const c of chunks) yield c;
}

async function collect(input: AsyncIterable<string | Uint8Array>, d: Detection, m: Mapping, options = {}) {
  const batches: RowBatch<number>[] = [];
  const summary = await readRows(input, d, m, resolveWell, (b) => {
    batches.push({ ...b, rejections: [...b.rejections] });
  }, options);
  return { summary, batches, rejections: batches.flatMap((b) => b.rejections) };
}

function longFile(rows: string[]): string {
  return ["Timestamp,Tag,Value", ...rows].join("\n") + "\n";
}

describe("readRows", () => {
  const tmp = mkdtempSync(path.join(os.tmpdir(), "bellows-ingest-"));
  afterAll(() => rmSync(tmp, { recursive: true, force: true }));

  it("refuses a 10-million-character line as malformed without buffering it", async () => {
    const file = path.join(tmp, "huge-line.csv");
    const text = longFile([
      "2024-03-10T08:00:00Z,CF-12.CSG,812.5",
      `2024-03-10T08:05:00Z,CF-12.CSG,${"9".repeat(10_000_000)}`,
      "2024-03-10T08:10:00Z,CF-12.CSG,812.2",
    ]);
    writeFileSync(file, text);
    const d = detect(text);
    const { summary, rejections } = await collect(createReadStream(file), d, LONG);
    expect(summary.valuesAccepted).toBe(2);
    expect(summary.rejected.malformed_row).toBe(1);
    expect(rejections[0]).toMatchObject({ row: 3, column: "", reason: "malformed_row" });
    expect(rejections[0].message).toMatch(/too long/);
    expect(rejections[0].raw.length).toBeLessThanOrEqual(201);
  }, 20_000);

  it("batches values, with running counts, and merges duplicates only inside a batch", async () => {
    const rows: string[] = [];
    for (let i = 0; i < 25; i++) rows.push(`2024-03-10T08:${String(i).padStart(2, "0")}:00Z,CF-12.CSG,${800 + i}`);
    rows.push("2024-03-10T08:00:00Z,CF-12.CSG,1"); // same key as the first row, but in a later batch
    rows.push("2024-03-10T08:24:00Z,CF-12.CSG,2"); // same key as row 25, same batch
    const text = longFile(rows);
    const { summary, batches } = await collect(fromStrings(text), detect(text), LONG, { batchSize: 10 });
    expect(batches.map((b) => b.values.length)).toEqual([10, 10, 6]);
    expect(summary.valuesAccepted).toBe(26);
    expect(summary.duplicatesMerged).toBe(1);
    const last = batches[2].values;
    // In key order (08:00 first), the repeat of 08:24 replaced 824.
    expect([...last.v]).toEqual([1, 820, 821, 822, 823, 2]);
    // Upserting batches in order (last write wins) gives the file's last value for every key.
    const db = new Map<number, number>();
    for (const b of batches) for (let i = 0; i < b.values.length; i++) db.set(b.values.t[i], b.values.v[i]);
    expect(db.get(Date.UTC(2024, 2, 10, 8, 0))).toBe(1);
    expect(db.size).toBe(25);
  });

  it("keeps refusal details up to the limit but counts them all", async () => {
    const rows = Array.from({ length: 30 }, (_, i) => `2024-03-10T08:${String(i).padStart(2, "0")}:00Z,CF-12.CSG,Bad`);
    const text = longFile(rows);
    const { summary, rejections } = await collect(fromStrings(text), detect(text), LONG, { rejectionDetailLimit: 5 });
    expect(summary.rejected.status_text).toBe(30);
    expect(rejections).toHaveLength(5);
  });

  it("refuses the file when a mapped column is not in the header", async () => {
    const text = "Time,Tag,Value\n2024-03-10T08:00:00Z,CF-12.CSG,1\n";
    const { summary } = await collect(fromStrings(text), detect(text), LONG);
    expect(summary.refusal).toEqual({ row: 1, column: "Timestamp", message: 'column "Timestamp" named in the mapping is not in the header on line 1' });
    expect(summary.valuesAccepted).toBe(0);
  });

  it("refuses a wide file whose chosen well is unknown", async () => {
    const text = "Timestamp,CSG\n2024-03-10T08:00:00Z,1\n";
    const m = MappingSchema.parse({ layout: "wide", timeColumn: "Timestamp", timeFormat: "iso", timeZone: "UTC", wide: { wellKey: "XX-1", columns: [{ column: "CSG", signal: "casing_pressure", unit: "psig" }] } });
    const { summary } = await collect(fromStrings(text), detect(text), m);
    expect(summary.refusal?.message).toMatch(/well "XX-1"/);
  });

  it("refuses values whose quality is not in the good list", async () => {
    const text = "Timestamp,Tag,Value,Quality\n2024-03-10T08:00:00Z,CF-12.CSG,1,Good\n2024-03-10T08:05:00Z,CF-12.CSG,2,Uncertain\n2024-03-10T08:10:00Z,CF-12.CSG,3,192\n";
    const m = MappingSchema.parse({ ...LONG, long: { ...LONG.long, qualityColumn: "Quality", goodQualityValues: ["good", "192"] } });
    const { summary, rejections } = await collect(fromStrings(text), detect(text), m);
    expect(summary.valuesAccepted).toBe(2);
    expect(rejections).toEqual([expect.objectContaining({ row: 3, column: "Quality", reason: "status_text" })]);
  });

  it("decodes UTF-8 split across byte chunks, and strips the BOM", async () => {
    const text = "\ufeffTimestamp,Well,Temp (°F)\n2024-03-10T08:00:00Z,CF-12,88.5\n";
    const bytes = new TextEncoder().encode(text);
    async function* byteByByte() {
      for (let i = 0; i < bytes.length; i++) yield bytes.subarray(i, i + 1);
    }
    const m = MappingSchema.parse({ layout: "wide", timeColumn: "Timestamp", timeFormat: "iso", timeZone: "UTC", wide: { wellColumn: "Well", columns: [{ column: "Temp (°F)", signal: "tubing_temperature", unit: "degF" }] } });
    const { summary, batches } = await collect(byteByByte(), detect(text), m);
    expect(summary.refusal).toBeUndefined();
    expect(batches[0].values.v[0]).toBe(88.5);
  });

  it("accepts a trailing separator, refuses rows with the wrong field count", async () => {
    const text = "Timestamp,Tag,Value\n2024-03-10T08:00:00Z,CF-12.CSG,1,\n2024-03-10T08:05:00Z,CF-12.CSG\n2024-03-10T08:10:00Z,CF-12.CSG,3,x\n";
    const d = detect(longFile(["2024-03-10T08:00:00Z,CF-12.CSG,1"]));
    const { summary, rejections } = await collect(fromStrings(text), d, LONG);
    expect(summary.valuesAccepted).toBe(1);
    expect(rejections.map((r) => [r.row, r.reason])).toEqual([[3, "malformed_row"], [4, "malformed_row"]]);
  });

  it("stops when aborted", async () => {
    const text = longFile(["2024-03-10T08:00:00Z,CF-12.CSG,1"]);
    const ctl = new AbortController();
    ctl.abort();
    await expect(collect(fromStrings(text), detect(text), LONG, { signal: ctl.signal })).rejects.toThrow(/cancelled/);
  });
});
