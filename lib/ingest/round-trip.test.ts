// Property: values written to CSV (either layout, any supported separator, line end
// and decimal mark) come back through detectFile + suggestMapping + readRows with the
// same (well, signal, t, v), duplicates resolved last-wins, whatever the batch size.
// Values carry at most 2 decimals so that no number is ambiguous between a decimal
// and a thousands mark ("1,234"), which no reader can settle from the text alone.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { SIGNAL_CODE, type Signal } from "@/lib/signals";
import { detectFile } from "./detect";
import { MappingSchema } from "./mapping";
import { readRows } from "./read-rows";
import { suggestMapping } from "./suggest-mapping";
import type { Delimiter } from "./types";
import { writeLongCsv, writeWideCsv, type CsvWriteOptions } from "./write-csv";

const WELLS = ["CF-12", "CF-14", "Cinder Flats 12-3", "EMBER-7"];
const WELL_ID: Record<string, number> = { "CF-12": 12, "CF-14": 14, "Cinder Flats 12-3": 123, "EMBER-7": 7 };
const COLUMNS: { name: string; signal: Signal; max: number; min: number }[] = [
  { name: "CSG_PRESS", signal: "casing_pressure", min: -15, max: 20_000 },
  { name: "TBG_PRESS", signal: "tubing_pressure", min: -15, max: 20_000 },
  { name: "INJ_RATE", signal: "injection_rate", min: 0, max: 1_000_000 },
  { name: "GAS_RATE", signal: "gas_rate", min: 0, max: 1_000_000 },
  { name: "LIQ_RATE", signal: "liquid_rate", min: 0, max: 1_000_000 },
];
const T0 = Date.UTC(2024, 0, 1);

const arbValue = (min: number, max: number) => fc.integer({ min: min * 100, max: max * 100 }).map((n) => n / 100);
const arbTime = fc.integer({ min: 0, max: 5000 }).map((k) => T0 + k * 60_000);
const arbFormat = fc.record({
  delimiter: fc.constantFrom<Delimiter>(",", ";", "\t", "|"),
  lineEnding: fc.constantFrom<"\n" | "\r\n" | "\r">("\n", "\r\n", "\r"),
  isDecimalComma: fc.boolean(),
  batchSize: fc.constantFrom(3, 50_000),
  isEpochMs: fc.boolean(),
});

type Key = string;
const keyOf = (well: number, code: number, t: number): Key => `${well}|${code}|${t}`;

async function readBack(text: string, wellKey?: string, batchSize = 50_000) {
  const detected = detectFile(text);
  if (!detected.ok) throw new Error(detected.error.message);
  const { mapping } = suggestMapping(detected.detection, { wellKey });
  const m = MappingSchema.parse(mapping);
  const db = new Map<Key, number>(); // upsert in batch order: last write wins, as the database does
  async function* once() {
    yield text;
  }
  const summary = await readRows(once(), detected.detection, m, (k) => WELL_ID[k], (b) => {
    for (let i = 0; i < b.values.length; i++) db.set(keyOf(b.values.wellId[i], b.values.signal[i], b.values.t[i]), b.values.v[i]);
  }, { batchSize });
  return { db, summary };
}

function csvOptions(f: { delimiter: Delimiter; lineEnding: "\n" | "\r\n" | "\r"; isDecimalComma: boolean }): CsvWriteOptions {
  return { delimiter: f.delimiter, lineEnding: f.lineEnding, decimalComma: f.isDecimalComma && f.delimiter !== "," };
}

const formatTime = (isEpochMs: boolean) => (t: number) => (isEpochMs ? String(t) : new Date(t).toISOString());

describe("round trip: write-csv → detect → read-rows (property, fast-check)", () => {
  it("long layout", async () => {
    const arbRow = fc.record({ t: arbTime, well: fc.constantFrom(...WELLS), col: fc.integer({ min: 0, max: COLUMNS.length - 1 }) })
      .chain((r) => arbValue(COLUMNS[r.col].min, COLUMNS[r.col].max).map((v) => ({ ...r, v })));
    await fc.assert(
      fc.asyncProperty(fc.array(arbRow, { minLength: 1, maxLength: 60 }), arbFormat, async (rows, f) => {
        const text = writeLongCsv(
          rows.map((r) => ({ t: r.t, tag: `${r.well}.${COLUMNS[r.col].name}`, value: r.v })),
          { ...csvOptions(f), formatTime: formatTime(f.isEpochMs), header: [f.isEpochMs ? "time_ms" : "Timestamp", "Tag", "Value"] },
        );
        const want = new Map<Key, number>();
        for (const r of rows) want.set(keyOf(WELL_ID[r.well], SIGNAL_CODE[COLUMNS[r.col].signal], r.t), r.v);
        const { db, summary } = await readBack(text, undefined, f.batchSize);
        expect(summary.refusal).toBeUndefined();
        expect(summary.rowsRead).toBe(rows.length);
        expect(db).toEqual(want);
      }),
      { numRuns: 150 },
    );
  });

  it("wide layout with a well column and blanks", async () => {
    const arbRow = fc.record({
      t: arbTime,
      well: fc.constantFrom(...WELLS),
      values: fc.tuple(...COLUMNS.map((c) => fc.option(arbValue(c.min, c.max), { freq: 5 }))),
    });
    await fc.assert(
      fc.asyncProperty(fc.array(arbRow, { minLength: 1, maxLength: 40 }), arbFormat, async (rows, f) => {
        const text = writeWideCsv(
          COLUMNS.map((c) => c.name),
          rows.map((r) => ({ t: r.t, well: r.well, values: r.values })),
          { ...csvOptions(f), formatTime: formatTime(f.isEpochMs), wellColumn: "Well", timeColumn: f.isEpochMs ? "time_ms" : "Timestamp" },
        );
        const want = new Map<Key, number>();
        let blanks = 0;
        for (const r of rows) {
          r.values.forEach((v, i) => {
            if (v === null) blanks++;
            else want.set(keyOf(WELL_ID[r.well], SIGNAL_CODE[COLUMNS[i].signal], r.t), v);
          });
        }
        const { db, summary } = await readBack(text, undefined, f.batchSize);
        expect(summary.refusal).toBeUndefined();
        expect(summary.rejected.blank).toBe(blanks);
        expect(db).toEqual(want);
      }),
      { numRuns: 150 },
    );
  });
});
