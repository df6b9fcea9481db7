// Parse one value cell of a historian export into a canonical-unit number.
//
// Historians write status text where a value should be ("Bad", "I/O Timeout",
// "Shutdown", "#N/A", blank). These are counted and skipped, never fatal
// (DOMAIN.md §2). Anything with a letter or a leading "#" is status text; a cell
// that looks numeric but is malformed ("12.3.4") is "unparseable_value".
//
// Plausible ranges (canonical units) are our own defaults, wide on purpose: they
// only catch impossible readings, not unusual ones (common practice: a −15 psig
// floor is just below full vacuum, 14.7 psi, DOMAIN.md §2).
import type { Quantity } from "@/lib/signals";
import { toCanonical, type Unit } from "@/lib/units/units";

export const VALUE_RANGE: Record<Quantity, readonly [number, number]> = {
  pressure: [-15, 20_000], // psig
  gas_rate: [0, 1_000_000], // Mscf/d
  liquid_rate: [0, 1_000_000], // bbl/d
  temperature: [-60, 700], // degF
};

export interface NumberFormat {
  decimalComma: boolean;
  /** Thousands separator to strip, or null when numbers carry none. */
  thousandsSep: "," | "." | " " | "'" | null;
}

export type ValueOutcome =
  | { ok: true; v: number }
  | { ok: false; reason: "blank" | "status_text" | "unparseable_value" | "out_of_range"; message: string };

const PLAIN_NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/**
 * Parse the text of a number in the file's format. Returns NaN when the text is not a
 * number, so the hot loop allocates nothing. Blank and status text are told apart by
 * `classifyNonNumber`.
 */
export function parseNumber(raw: string, fmt: NumberFormat): number {
  let s = raw;
  // Fast path: most cells are already plain numbers.
  if (PLAIN_NUMBER.test(s)) {
    if (!fmt.decimalComma && fmt.thousandsSep !== "." ) return Number(s);
    if (fmt.decimalComma && s.indexOf(".") < 0) return Number(s);
    // A "." in a decimal-comma file is a thousands separator: "1.234" is 1234.
  }
  s = s.trim();
  if (s.length === 0) return NaN;
  const sep = fmt.thousandsSep;
  // No-break spaces (U+00A0, U+202F) are how spreadsheets write a space separator.
  if (sep === " ") s = s.replace(/[\u00a0\u202f]/g, " ");
  if (sep !== null && s.indexOf(sep) >= 0) {
    if (!hasValidGrouping(s, sep, fmt.decimalComma ? "," : ".")) return NaN;
    s = s.split(sep).join("");
  }
  if (fmt.decimalComma) {
    if (s.indexOf(".") >= 0) return NaN; // a stray point in a decimal-comma number
    s = s.replace(",", ".");
  }
  return PLAIN_NUMBER.test(s) ? Number(s) : NaN;
}

/** Thousands groups must be 3 digits after a 1–3 digit lead: "1,234,567.5". */
function hasValidGrouping(s: string, sep: string, decimal: string): boolean {
  const [intPart] = s.replace(/^[+-]/, "").split(decimal);
  const groups = intPart.split(sep);
  if (groups[0].length < 1 || groups[0].length > 3) return false;
  for (let i = 1; i < groups.length; i++) if (!/^\d{3}$/.test(groups[i])) return false;
  return true;
}

/** Explain why a cell that did not parse as a number was refused. */
export function classifyNonNumber(raw: string): "blank" | "status_text" | "unparseable_value" {
  const s = raw.trim();
  if (s.length === 0) return "blank";
  if (s[0] === "#" || /[A-Za-z\u00C0-\u024F]/.test(s) || !/\d/.test(s)) return "status_text";
  return "unparseable_value";
}

/** Full pipeline for one cell: number → canonical unit → range check. */
export function parseValueCell(raw: string, quantity: Quantity, unit: Unit, fmt: NumberFormat): ValueOutcome {
  const n = parseNumber(raw, fmt);
  if (Number.isNaN(n)) {
    const reason = classifyNonNumber(raw);
    return { ok: false, reason, message: describeNonNumber(raw, reason) };
  }
  const v = toCanonical(quantity, n, unit);
  if (!isInRange(quantity, v)) {
    return { ok: false, reason: "out_of_range", message: describeOutOfRange(quantity, v) };
  }
  return { ok: true, v };
}

export function describeNonNumber(raw: string, reason: "blank" | "status_text" | "unparseable_value"): string {
  if (reason === "blank") return "blank value";
  return reason === "status_text" ? `status text "${clip(raw)}" instead of a value` : `"${clip(raw)}" is not a number`;
}

export function isInRange(quantity: Quantity, canonical: number): boolean {
  const [lo, hi] = VALUE_RANGE[quantity];
  return canonical >= lo && canonical <= hi && Number.isFinite(canonical);
}

export function describeOutOfRange(quantity: Quantity, canonical: number): string {
  const [lo, hi] = VALUE_RANGE[quantity];
  return `${round(canonical)} is outside the plausible ${quantity.replace("_", " ")} range ${lo}..${hi}`;
}

function round(v: number): string {
  return Number.isFinite(v) ? String(Math.round(v * 1000) / 1000) : String(v);
}

export function clip(s: string, max = 60): string {
  return s.length > max ? `${s.slice(0, max)}…` : s;
}
