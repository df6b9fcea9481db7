// The fixture corpus (tests/fixtures/ingest/): every awkward file a historian export
// can be, with the outcome we promise for it. Counts are hand-derived from the
// fixture text (each row is visible in the file); they are expectations of our own
// rules, not outside facts. Files are streamed 7 bytes at a time so that CRLF pairs,
// quotes and multi-byte characters are split across chunks.
import { createReadStream, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { detectFile, HEAD_CHARS } from "./detect";
import { MappingSchema } from "./mapping";
import { readRows, type ReadSummary } from "./read-rows";
import { suggestMapping } from "./suggest-mapping";
import type { DetectionFailure, Layout, RejectReason, Rejection } from "./types";

const DIR = path.resolve(__dirname, "../../tests/fixtures/ingest");
const WELLS: Record<string, number> = { "CF-12": 12, "CF-14": 14, "Cinder Flats 12-3": 123, "EMBER-7": 7 };
const resolveWell = (key: string) => WELLS[key];

interface Refused {
  file: string;
  code: DetectionFailure["code"];
  message: RegExp;
}

interface Accepted {
  file: string;
  timeZone?: string;
  wellKey?: string;
  layout: Layout;
  rowsRead: number;
  valuesAccepted: number;
  duplicatesMerged?: number;
  rejected?: Partial<Record<RejectReason, number>>;
  /** Spot checks of individual refusals: row (1-based line), column, reason. */
  rejections?: Pick<Rejection, "row" | "column" | "reason">[];
  /** Spot check of the refusal message text. */
  messageLike?: RegExp;
  detection?: Record<string, unknown>;
}

const REFUSED: Refused[] = [
  { file: "empty.csv", code: "empty", message: /empty/ },
  { file: "blank-lines-only.csv", code: "empty", message: /empty/ },
  { file: "header-only.csv", code: "header_only", message: /header \(line 1\) but no data rows/ },
  { file: "binary-image.csv", code: "binary", message: /not UTF-8 text/ },
  { file: "not-csv.json", code: "not_csv", message: /JSON/ },
  { file: "not-csv.html", code: "not_csv", message: /HTML/ },
  { file: "space-separated.txt", code: "no_delimiter", message: /comma, semicolon, tab or pipe/ },
  { file: "no-time-column.csv", code: "no_time_column", message: /Well, CSG_PRESS, TBG_PRESS/ },
];

const ACCEPTED: Accepted[] = [
  {
    file: "good-long.csv", layout: "long", rowsRead: 14, valuesAccepted: 14,
    detection: { headerRowIndex: 2, tagColumn: "Tag", valueColumn: "Value", qualityColumn: "Quality", timeFormat: "iso", hasTimeOffset: true },
  },
  {
    file: "good-wide-wells.csv", timeZone: "America/Chicago", layout: "wide", rowsRead: 6, valuesAccepted: 24,
    detection: { wellColumn: "Well", timeFormat: "iso", hasTimeOffset: false },
  },
  { file: "bom-tab.tsv", wellKey: "CF-12", layout: "wide", rowsRead: 3, valuesAccepted: 9, detection: { hasBom: true, delimiter: "\t" } },
  {
    file: "decimal-comma-crlf.csv", timeZone: "Europe/Berlin", wellKey: "CF-12", layout: "wide", rowsRead: 4, valuesAccepted: 12,
    detection: { delimiter: ";", lineEnding: "CRLF", decimalComma: true, thousandsSep: ".", timeFormat: "dmy" },
  },
  {
    file: "cr-only-pipe.csv", timeZone: "America/Chicago", layout: "long", rowsRead: 4, valuesAccepted: 4,
    detection: { delimiter: "|", lineEnding: "CR", tagColumn: "Point", timeFormat: "mdy" },
  },
  {
    file: "quoted-fields.csv", layout: "wide", rowsRead: 4, valuesAccepted: 7, rejected: { status_text: 1 },
    // The second record spans lines 3–4, so the "Shutdown" record starts on line 5.
    rejections: [{ row: 5, column: "CSG_PRESS", reason: "status_text" }],
  },
  {
    file: "thousands-quoted.csv", layout: "long", rowsRead: 4, valuesAccepted: 3, rejected: { unparseable_value: 1 },
    rejections: [{ row: 4, column: "Value", reason: "unparseable_value" }], detection: { thousandsSep: ",", decimalComma: false },
  },
  {
    file: "unknown-unit.csv", wellKey: "CF-12", layout: "wide", rowsRead: 3, valuesAccepted: 3, rejected: { unknown_unit: 3 },
    rejections: [{ row: 2, column: "Casing Pressure (furlongs)", reason: "unknown_unit" }],
  },
  {
    file: "mixed-delimiter.csv", layout: "long", rowsRead: 6, valuesAccepted: 4, rejected: { malformed_row: 2 },
    rejections: [{ row: 3, column: "", reason: "malformed_row" }, { row: 5, column: "", reason: "malformed_row" }],
    messageLike: /wrong or mixed separator/, detection: { delimiter: "," },
  },
  { file: "time-mdy-ampm.csv", wellKey: "CF-14", layout: "wide", rowsRead: 3, valuesAccepted: 6, detection: { timeFormat: "mdy" } },
  { file: "time-dmy.csv", wellKey: "CF-12", layout: "wide", rowsRead: 3, valuesAccepted: 6, detection: { timeFormat: "dmy" } },
  { file: "time-dmon.csv", layout: "long", rowsRead: 3, valuesAccepted: 3, detection: { timeFormat: "d-mon-y" } },
  { file: "time-iso-offsets.csv", layout: "long", rowsRead: 4, valuesAccepted: 4, detection: { timeFormat: "iso", hasTimeOffset: true } },
  { file: "epoch-seconds.csv", wellKey: "CF-12", layout: "wide", rowsRead: 3, valuesAccepted: 6, detection: { timeFormat: "epoch_s" } },
  { file: "epoch-milliseconds.csv", layout: "long", rowsRead: 3, valuesAccepted: 3, detection: { timeFormat: "epoch_ms", delimiter: ";" } },
  { file: "excel-serial.csv", wellKey: "CF-12", layout: "wide", rowsRead: 3, valuesAccepted: 3, detection: { timeFormat: "excel_days" } },
  { file: "unsorted.csv", layout: "long", rowsRead: 5, valuesAccepted: 5 },
  { file: "duplicates.csv", layout: "long", rowsRead: 6, valuesAccepted: 3, duplicatesMerged: 3 },
  {
    file: "status-text.csv", layout: "long", rowsRead: 9, valuesAccepted: 2, rejected: { status_text: 6, unparseable_value: 1 },
    rejections: [{ row: 3, column: "Value", reason: "status_text" }, { row: 9, column: "Value", reason: "unparseable_value" }],
  },
  {
    file: "blank-values.csv", wellKey: "CF-12", layout: "wide", rowsRead: 4, valuesAccepted: 6, rejected: { blank: 4 },
    rejections: [{ row: 2, column: "TBG_PRESS", reason: "blank" }, { row: 5, column: "Timestamp", reason: "blank" }],
  },
  {
    file: "absurd-values.csv", wellKey: "CF-12", layout: "wide", rowsRead: 4, valuesAccepted: 7, rejected: { out_of_range: 5 },
    rejections: [{ row: 3, column: "CSG_PRESS", reason: "out_of_range" }], messageLike: /outside the plausible pressure range -15\.\.20000/,
  },
  {
    file: "truncated-mid-row.csv", layout: "long", rowsRead: 3, valuesAccepted: 2, rejected: { malformed_row: 1 },
    rejections: [{ row: 4, column: "", reason: "malformed_row" }], messageLike: /cut off/,
  },
  {
    file: "truncated-open-quote.csv", layout: "wide", rowsRead: 2, valuesAccepted: 1, rejected: { malformed_row: 1 },
    rejections: [{ row: 3, column: "", reason: "malformed_row" }], messageLike: /ends inside a quoted field/,
  },
  {
    file: "unknown-tags-wells.csv", layout: "long", rowsRead: 5, valuesAccepted: 2, rejected: { unknown_tag: 2, unknown_well: 1 },
    rejections: [{ row: 3, column: "Tag", reason: "unknown_tag" }, { row: 4, column: "Tag", reason: "unknown_well" }],
  },
  { file: "dst-chicago-fall-back.csv", timeZone: "America/Chicago", wellKey: "CF-12", layout: "wide", rowsRead: 6, valuesAccepted: 6 },
  {
    file: "dst-berlin-spring-forward.csv", timeZone: "Europe/Berlin", wellKey: "CF-12", layout: "wide", rowsRead: 4, valuesAccepted: 2,
    rejected: { nonexistent_local_time: 2 }, rejections: [{ row: 3, column: "Zeit", reason: "nonexistent_local_time" }],
  },
];

/** Detect, suggest, validate and stream one fixture file. */
export async function ingestFixture(file: string, opts: { timeZone?: string; wellKey?: string } = {}) {
  const full = path.join(DIR, file);
  const head = readFileSync(full, "utf8").slice(0, HEAD_CHARS);
  const detected = detectFile(head);
  if (!detected.ok) return { detected, summary: null, rejections: [] as Rejection[], values: [] as [number, number, number, number][] };
  const suggestion = suggestMapping(detected.detection, opts);
  const mapping = MappingSchema.parse(suggestion.mapping);
  const rejections: Rejection[] = [];
  const values: [number, number, number, number][] = [];
  const summary: ReadSummary<number> = await readRows(
    createReadStream(full, { highWaterMark: 7 }),
    detected.detection,
    mapping,
    resolveWell,
    (b) => {
      rejections.push(...b.rejections);
      for (let i = 0; i < b.values.length; i++) values.push([b.values.wellId[i], b.values.signal[i], b.values.t[i], b.values.v[i]]);
    },
  );
  return { detected, summary, rejections, values, suggestion };
}

describe("fixture corpus: refused files", () => {
  it.each(REFUSED)("$file is refused ($code)", ({ file, code, message }) => {
    const head = readFileSync(path.join(DIR, file), "utf8");
    const r = detectFile(head);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.code).toBe(code);
    expect(r.error.message).toMatch(message);
  });
});

describe("fixture corpus: accepted files (hand-counted expectations)", () => {
  it.each(ACCEPTED)("$file: $valuesAccepted values from $rowsRead rows", async (c) => {
    const { detected, summary, rejections } = await ingestFixture(c.file, { timeZone: c.timeZone, wellKey: c.wellKey });
    expect(detected.ok).toBe(true);
    if (!detected.ok || !summary) return;
    expect(detected.detection.layout).toBe(c.layout);
    if (c.detection) expect(detected.detection).toMatchObject(c.detection);
    expect(summary.refusal).toBeUndefined();
    expect(summary.rowsRead).toBe(c.rowsRead);
    expect(summary.valuesAccepted).toBe(c.valuesAccepted);
    expect(summary.duplicatesMerged).toBe(c.duplicatesMerged ?? 0);
    const nonZero = Object.fromEntries(Object.entries(summary.rejected).filter(([, n]) => n > 0));
    expect(nonZero).toEqual(c.rejected ?? {});
    for (const want of c.rejections ?? []) {
      expect(rejections).toContainEqual(expect.objectContaining(want));
    }
    if (c.messageLike) expect(rejections.map((r) => r.message).join("\n")).toMatch(c.messageLike);
  });
});

describe("fixture corpus: values and times", () => {
  it("decimal comma, thousands point and barg convert to psig (NIST SP 811: 1 bar = 100 kPa, 1 psi = 6.894757 kPa)", async () => {
    const { values } = await ingestFixture("decimal-comma-crlf.csv", { timeZone: "Europe/Berlin", wellKey: "CF-12" });
    const casing = values.filter((v) => v[1] === 1).map((v) => v[3]);
    expect(casing[0]).toBeCloseTo((56.02 * 100) / 6.894757, 6);
    expect(casing[3]).toBeCloseTo((1056.1 * 100) / 6.894757, 6);
    // 10.03.2024 08:00 in Berlin is CET (UTC+1) (EU Directive 2000/84/EC: summer time starts the last Sunday of March).
    expect(values[0][2]).toBe(Date.UTC(2024, 2, 10, 7, 0));
  });

  it("duplicates keep the LAST value for (well, signal, t)", async () => {
    const { values } = await ingestFixture("duplicates.csv");
    const at0800 = values.filter((v) => v[1] === 1 && v[2] === Date.UTC(2024, 2, 10, 8, 0));
    expect(at0800).toEqual([[12, 1, Date.UTC(2024, 2, 10, 8, 0), 812.7]]);
  });

  it("ISO offsets (Z, -05:00, +01:00, fractional seconds) give the same UTC instants", async () => {
    const { values } = await ingestFixture("time-iso-offsets.csv");
    expect(values.map((v) => v[2])).toEqual([0, 5, 10, 15].map((m) => Date.UTC(2024, 2, 10, 8, m) + (m === 15 ? 250 : 0)));
  });

  it("epoch seconds, epoch ms, DD-Mon-YYYY and spreadsheet serial days agree on 2024-03-10 08:00 UTC", async () => {
    const t0 = Date.UTC(2024, 2, 10, 8, 0);
    for (const [file, wellKey] of [["epoch-seconds.csv", "CF-12"], ["epoch-milliseconds.csv", undefined], ["time-dmon.csv", undefined], ["excel-serial.csv", "CF-12"]] as const) {
      const { values } = await ingestFixture(file, { wellKey });
      expect(values[0][2], file).toBe(t0);
    }
  });

  it("12:00 AM is midnight in month/day files with AM/PM", async () => {
    const { values } = await ingestFixture("time-mdy-ampm.csv", { wellKey: "CF-14" });
    expect([...new Set(values.map((v) => v[2]))]).toEqual([Date.UTC(2024, 2, 14, 23, 55), Date.UTC(2024, 2, 15, 0, 0), Date.UTC(2024, 2, 15, 0, 5)]);
  });

  // US rules (15 U.S.C. §260a as amended by the Energy Policy Act of 2005 §110): daylight
  // time ends the first Sunday of November at 02:00 local: 2024-11-03 in America/Chicago,
  // CDT = UTC−5, CST = UTC−6. In-order rows that step back in the repeated hour map to CST.
  it("Chicago fall-back: the repeated hour maps first to CDT, then (after stepping back) to CST", async () => {
    const { values } = await ingestFixture("dst-chicago-fall-back.csv", { timeZone: "America/Chicago", wellKey: "CF-12" });
    const h = (hh: number, mm: number) => Date.UTC(2024, 10, 3, hh, mm);
    expect(values.map((v) => v[2])).toEqual([h(5, 30), h(6, 0), h(6, 30), h(7, 0), h(7, 30), h(8, 0)]);
  });

  it("the unsorted file spans 08:00–08:20 for its well", async () => {
    const { summary } = await ingestFixture("unsorted.csv");
    expect(summary?.wells.get(12)).toEqual({ first: Date.UTC(2024, 2, 10, 8, 0), last: Date.UTC(2024, 2, 10, 8, 20), values: 5 });
  });

  it("quoted cells keep commas, newlines and doubled quotes out of the way", async () => {
    const { values } = await ingestFixture("quoted-fields.csv");
    expect(values.filter((v) => v[0] === 123 && v[1] === 1).map((v) => v[3])).toEqual([812.5, 811.9, 812.0]);
  });

  it("unknown-unit suggestion names the unit and the column", async () => {
    const { suggestion } = await ingestFixture("unknown-unit.csv", { wellKey: "CF-12" });
    expect(suggestion?.notes.join("\n")).toMatch(/Casing Pressure \(furlongs\).*"furlongs" is not a known pressure unit/);
  });
});
