// Find the time column and its timestamp format from sampled cells.
import { readWallTime } from "./parse-time";
import type { TimeFormat } from "./types";

export interface TimeColumnGuess {
  index: number;
  format: TimeFormat;
  hasOffset: boolean;
  /** Day/month order could not be told apart (no day above 12 in the sample). */
  isDayMonthAmbiguous: boolean;
}

const TIME_NAME = /time|date|stamp|epoch|^ts$|^t$/i;
const RE_NUMERIC_DATE = /^\s*(\d{1,2})[/.-](\d{1,2})[/.-](\d{4})/;
// Plausible spans (years 2000–2100) for bare numbers read as times.
const EPOCH_MS = [946_684_800_000, 4_102_444_800_000] as const;
const EPOCH_S = [946_684_800, 4_102_444_800] as const;
const EXCEL_DAYS = [36_526, 73_051] as const;

/** Share of cells that read as `format`. */
function shareParsed(cells: string[], format: TimeFormat): number {
  let ok = 0;
  for (const c of cells) if (readWallTime(c, format) !== null) ok++;
  return cells.length === 0 ? 0 : ok / cells.length;
}

function shareInRange(cells: string[], [lo, hi]: readonly [number, number], isIntegerOnly: boolean): number {
  let ok = 0;
  for (const c of cells) {
    const s = c.trim();
    if (!/^\d+(\.\d+)?$/.test(s)) continue;
    if (isIntegerOnly && s.includes(".")) continue;
    const n = Number(s);
    if (n >= lo && n <= hi) ok++;
  }
  return cells.length === 0 ? 0 : ok / cells.length;
}

/** Guess the format of one column's cells, or null when they are not timestamps. */
export function guessTimeFormat(cells: string[], isNamedLikeTime: boolean): Omit<TimeColumnGuess, "index"> | null {
  const filled = cells.filter((c) => c.trim().length > 0);
  if (filled.length === 0) return null;
  const MIN = 0.8;
  if (shareParsed(filled, "iso") >= MIN) {
    const withOffset = filled.filter((c) => readWallTime(c, "iso")?.offsetMin !== null).length;
    return { format: "iso", hasOffset: withOffset / filled.length > 0.5, isDayMonthAmbiguous: false };
  }
  if (shareParsed(filled, "d-mon-y") >= MIN) return { format: "d-mon-y", hasOffset: false, isDayMonthAmbiguous: false };
  const numericDates = filled.map((c) => RE_NUMERIC_DATE.exec(c)).filter((m) => m !== null);
  if (numericDates.length / filled.length >= MIN) {
    const isFirstOver12 = numericDates.some((m) => +m[1] > 12);
    const isSecondOver12 = numericDates.some((m) => +m[2] > 12);
    // Dots ("31.03.2024") are the European habit; slashes default to month first.
    const isDotted = filled.some((c) => /^\s*\d{1,2}\.\d{1,2}\./.test(c));
    const format: TimeFormat = isFirstOver12 ? "dmy" : isSecondOver12 ? "mdy" : isDotted ? "dmy" : "mdy";
    if (shareParsed(filled, format) < MIN) return null;
    return { format, hasOffset: false, isDayMonthAmbiguous: !isFirstOver12 && !isSecondOver12 };
  }
  if (!isNamedLikeTime) return null;
  if (shareInRange(filled, EPOCH_MS, true) >= MIN) return { format: "epoch_ms", hasOffset: true, isDayMonthAmbiguous: false };
  if (shareInRange(filled, EPOCH_S, false) >= MIN) return { format: "epoch_s", hasOffset: true, isDayMonthAmbiguous: false };
  if (shareInRange(filled, EXCEL_DAYS, false) >= MIN) return { format: "excel_days", hasOffset: false, isDayMonthAmbiguous: false };
  return null;
}

/** Pick the time column: a column named like time wins, then the leftmost that parses. */
export function findTimeColumn(columns: string[], rows: string[][]): TimeColumnGuess | null {
  const order = columns.map((_, i) => i).sort((a, b) => Number(TIME_NAME.test(columns[b])) - Number(TIME_NAME.test(columns[a])) || a - b);
  for (const i of order) {
    const cells = rows.map((r) => r[i] ?? "");
    // Bare numbers only count as times under a time-like name or in the first column.
    const guess = guessTimeFormat(cells, TIME_NAME.test(columns[i]) || i === 0);
    if (guess) return { index: i, ...guess };
  }
  return null;
}
