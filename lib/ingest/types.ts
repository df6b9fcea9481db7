// Shared types of the ingest layer. Plain data only: the database, worker and
// UI layers build on these without importing anything else from here.
import type { Signal } from "@/lib/signals";

export type Delimiter = "," | ";" | "\t" | "|";
export type LineEnding = "LF" | "CRLF" | "CR";
export type Layout = "long" | "wide";

/**
 * Timestamp layouts we accept.
 * - "iso": YYYY-MM-DD[T| ]HH:mm[:ss[.fff]] with an optional "Z" or ±hh[:mm] offset
 *   (also YYYY/MM/DD). Without an offset the time is local to the mapping's zone.
 * - "mdy": MM/DD/YYYY HH:mm[:ss] with optional AM/PM.
 * - "dmy": DD/MM/YYYY HH:mm[:ss] (also DD.MM.YYYY and DD-MM-YYYY).
 * - "d-mon-y": DD-Mon-YYYY HH:mm[:ss] (English month abbreviations).
 * - "epoch_s" / "epoch_ms": Unix time, always UTC.
 * - "excel_days": spreadsheet serial days since 1899-12-30, local to the zone.
 */
export type TimeFormat = "iso" | "mdy" | "dmy" | "d-mon-y" | "epoch_s" | "epoch_ms" | "excel_days";

export const TIME_FORMATS = ["iso", "mdy", "dmy", "d-mon-y", "epoch_s", "epoch_ms", "excel_days"] as const;

/** What `detectFile` learned from the head of a file. */
export interface Detection {
  delimiter: Delimiter;
  lineEnding: LineEnding;
  hasBom: boolean;
  /** 0-based index of the header record among the file's CSV records (preamble lines come before it). */
  headerRowIndex: number;
  columns: string[];
  layout: Layout;
  timeColumn: string;
  tagColumn?: string;
  valueColumn?: string;
  qualityColumn?: string;
  wellColumn?: string;
  timeFormat: TimeFormat;
  /** True when the sampled timestamps carry a Z or ±hh:mm offset (then the zone is not needed). */
  hasTimeOffset: boolean;
  decimalComma: boolean;
  /** Thousands separator seen in numbers, or null when none was seen. */
  thousandsSep: "," | "." | " " | "'" | null;
  /** Distinct values of the tag column seen in the head (long layout, at most 2000). */
  tagValues?: string[];
  /** First 20 data rows after the header, as split cells. */
  preview: string[][];
  /** Stable fingerprint of the normalised header names; equal shapes can reuse a saved mapping. */
  headerShape: string;
  /** Warnings a person should see before importing (ambiguous dates, assumptions). */
  notes: string[];
}

/** Why `detectFile` refused a file. The message is meant for the person who uploaded it. */
export interface DetectionFailure {
  code: "empty" | "binary" | "not_csv" | "header_only" | "no_delimiter" | "no_time_column";
  message: string;
}

export type DetectResult = { ok: true; detection: Detection } | { ok: false; error: DetectionFailure };

export const REJECT_REASONS = [
  "status_text",
  "blank",
  "unparseable_time",
  "nonexistent_local_time",
  "out_of_range",
  "unknown_tag",
  "unknown_well",
  "unparseable_value",
  "malformed_row",
  "unknown_unit",
] as const;

export type RejectReason = (typeof REJECT_REASONS)[number];

/** One refused cell or row. `row` is the 1-based physical line number where the record starts. */
export interface Rejection {
  row: number;
  column: string;
  raw: string;
  reason: RejectReason;
  message: string;
}

export type { Signal };
