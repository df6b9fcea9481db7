// Plain words for what the file check found.
import type { Delimiter, Layout, TimeFormat } from "@/lib/ingest/types";

export const DELIMITER_LABEL: Record<Delimiter, string> = {
  ",": "comma",
  ";": "semicolon",
  "\t": "tab",
  "|": "vertical bar",
};

export const LAYOUT_LABEL: Record<Layout, string> = {
  long: "Long: one row per reading, with a tag column",
  wide: "Wide: one column per signal",
};

export const TIME_FORMAT_LABEL: Record<TimeFormat, string> = {
  iso: "Year-month-day (2026-03-04 14:05)",
  mdy: "Month/day/year (03/04/2026 2:05 PM)",
  dmy: "Day/month/year (04/03/2026 14:05)",
  "d-mon-y": "Day-month name-year (04-Mar-2026 14:05)",
  epoch_s: "Unix seconds (UTC)",
  epoch_ms: "Unix milliseconds (UTC)",
  excel_days: "Spreadsheet day numbers",
};
