// Write rows to CSV text (RFC 4180 quoting). Used by the property test, the ingest
// benchmark and the synthetic demo-file export, so it writes what readRows reads.
import type { Delimiter } from "./types";

export type Cell = string | number | null | undefined;

export interface CsvWriteOptions {
  delimiter?: Delimiter;
  lineEnding?: "\n" | "\r\n" | "\r";
  /** Write numbers with a decimal comma ("12,5"); the delimiter must then not be ",". */
  decimalComma?: boolean;
  /** Add a final line end (default true). */
  hasFinalNewline?: boolean;
}

/** Quote a cell when it holds the delimiter, a quote or a line end. */
export function quoteCell(text: string, delimiter: string): string {
  if (text.includes(delimiter) || text.includes('"') || text.includes("\n") || text.includes("\r")) {
    return `"${text.replace(/"/g, '""')}"`;
  }
  return text;
}

export function formatCell(cell: Cell, decimalComma: boolean): string {
  if (cell === null || cell === undefined) return "";
  if (typeof cell === "number") {
    const s = String(cell);
    return decimalComma ? s.replace(".", ",") : s;
  }
  return cell;
}

/** Header plus rows to CSV text. */
export function writeCsv(header: string[], rows: Iterable<Cell[]>, options: CsvWriteOptions = {}): string {
  const d = options.delimiter ?? ",";
  const eol = options.lineEnding ?? "\n";
  const decimalComma = options.decimalComma ?? false;
  if (decimalComma && d === ",") throw new Error("a decimal comma needs a delimiter other than comma");
  const lines = [header.map((h) => quoteCell(h, d)).join(d)];
  for (const row of rows) lines.push(row.map((c) => quoteCell(formatCell(c, decimalComma), d)).join(d));
  return lines.join(eol) + (options.hasFinalNewline === false ? "" : eol);
}

/** ISO 8601 UTC with milliseconds, e.g. 2024-03-10T08:00:00.000Z. */
export function formatIsoUtc(t: number): string {
  return new Date(t).toISOString();
}

export interface LongRow {
  t: number;
  tag: string;
  value: Cell;
  quality?: string;
}

/** Long layout: one row per (time, tag, value). */
export function writeLongCsv(
  rows: Iterable<LongRow>,
  options: CsvWriteOptions & { formatTime?: (t: number) => string; header?: [string, string, string, string?] } = {},
): string {
  const fmt = options.formatTime ?? formatIsoUtc;
  const [timeName, tagName, valueName, qualityName] = options.header ?? ["Timestamp", "Tag", "Value"];
  const header = qualityName ? [timeName, tagName, valueName, qualityName] : [timeName, tagName, valueName];
  function* cells(): Generator<Cell[]> {
    for (const r of rows) yield qualityName ? [fmt(r.t), r.tag, r.value, r.quality ?? ""] : [fmt(r.t), r.tag, r.value];
  }
  return writeCsv(header, cells(), options);
}

export interface WideRow {
  t: number;
  well?: string;
  values: Cell[];
}

/** Wide layout: one row per time (and well), one column per signal. */
export function writeWideCsv(
  columns: string[],
  rows: Iterable<WideRow>,
  options: CsvWriteOptions & { formatTime?: (t: number) => string; timeColumn?: string; wellColumn?: string } = {},
): string {
  const fmt = options.formatTime ?? formatIsoUtc;
  const timeName = options.timeColumn ?? "Timestamp";
  const header = options.wellColumn ? [timeName, options.wellColumn, ...columns] : [timeName, ...columns];
  function* cells(): Generator<Cell[]> {
    for (const r of rows) yield options.wellColumn ? [fmt(r.t), r.well ?? "", ...r.values] : [fmt(r.t), ...r.values];
  }
  return writeCsv(header, cells(), options);
}
