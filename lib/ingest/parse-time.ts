// Timestamps → epoch milliseconds (UTC).
//
// Zone rules come from luxon's IANA zone (`IANAZone.offset`), looked up once per
// local hour and cached, so a million rows cost a few thousand zone look-ups.
//
// DST POLICY for naive local timestamps (no Z / offset in the cell):
// - Spring forward (a local time that never happened, e.g. 02:30 on the US change
//   day in America/Chicago, or 02:30 on the last Sunday of March in Europe/Berlin):
//   REJECTED with reason "nonexistent_local_time". Shifting it would invent a reading
//   at a time the historian cannot have written; refusing is the honest choice.
// - Fall back (a local time that happened twice, 01:00–01:59 in Chicago, 02:00–02:59
//   in Berlin): resolved to the FIRST occurrence (the earlier, daylight-time instant),
//   unless the rows of the same series are in time order and go backwards (or repeat)
//   inside that repeated hour; from that row on, that series' times in that hour map
//   to the SECOND occurrence (standard time). A "series" is whatever key the caller
//   passes: the tag in a long file, the well (or the whole row) in a wide file.
//   Rows that are not in time order near the change may therefore be placed in the
//   second pass; files exported in UTC or with offsets avoid the question entirely.
// Epoch seconds and milliseconds are UTC by definition and ignore the zone.
import { IANAZone } from "luxon";
import type { TimeFormat } from "./types";

/** Returned instead of a time when the local time fell in a spring-forward gap. */
export const TIME_NONEXISTENT = Number.NEGATIVE_INFINITY;
/** Returned when the text is not a timestamp of the format (NaN: test with Number.isNaN). */
export const TIME_UNPARSEABLE = Number.NaN;

const HOUR = 3_600_000;
const DAY = 86_400_000;
// Spreadsheet serial day 25569 is 1970-01-01 (day 0 is 1899-12-30).
const EXCEL_EPOCH_DAYS = 25_569;

const RE_ISO =
  /^\s*(\d{4})[-/](\d{1,2})[-/](\d{1,2})(?:[T ]+(\d{1,2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?)?\s*(Z|UTC|[+-]\d{2}(?::?\d{2})?)?\s*$/i;
const RE_NUMERIC_DATE =
  /^\s*(\d{1,2})[/.-](\d{1,2})[/.-](\d{4})(?:[ T]+(\d{1,2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?\s*([AP]M)?)?\s*$/i;
const RE_D_MON_Y =
  /^\s*(\d{1,2})[- ]([A-Za-z]{3})[A-Za-z]*[- ](\d{2}|\d{4})(?:[ :]+(\d{1,2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?)?\s*$/;
const RE_NUMBER = /^\s*-?\d+(?:\.\d+)?\s*$/;

const MONTHS: Record<string, number> = {
  jan: 1, feb: 2, mar: 3, apr: 4, may: 5, jun: 6, jul: 7, aug: 8, sep: 9, oct: 10, nov: 11, dec: 12,
};

/** Wall-clock reading of a cell: `wall` is the local time written as if it were UTC. */
export interface WallTime {
  wall: number;
  /** Offset written in the cell, in minutes east of UTC, or null when the time is naive. */
  offsetMin: number | null;
}

/** Read a cell's wall-clock time per format, without any zone. Null when it does not parse. */
export function readWallTime(raw: string, format: TimeFormat): WallTime | null {
  switch (format) {
    case "iso": {
      const m = RE_ISO.exec(raw);
      if (!m) return null;
      const wall = composeWall(+m[1], +m[2], +m[3], m[4], m[5], m[6], m[7], undefined);
      return Number.isNaN(wall) ? null : { wall, offsetMin: readOffset(m[8]) };
    }
    case "mdy":
    case "dmy": {
      const m = RE_NUMERIC_DATE.exec(raw);
      if (!m) return null;
      const [mo, d] = format === "mdy" ? [+m[1], +m[2]] : [+m[2], +m[1]];
      const wall = composeWall(+m[3], mo, d, m[4], m[5], m[6], m[7], m[8]);
      return Number.isNaN(wall) ? null : { wall, offsetMin: null };
    }
    case "d-mon-y": {
      const m = RE_D_MON_Y.exec(raw);
      if (!m) return null;
      const mo = MONTHS[m[2].toLowerCase()];
      if (!mo) return null;
      const y = m[3].length === 2 ? 2000 + +m[3] : +m[3];
      const wall = composeWall(y, mo, +m[1], m[4], m[5], m[6], m[7], undefined);
      return Number.isNaN(wall) ? null : { wall, offsetMin: null };
    }
    case "epoch_s":
    case "epoch_ms": {
      if (!RE_NUMBER.test(raw)) return null;
      const n = Number(raw);
      const ms = format === "epoch_s" ? Math.round(n * 1000) : Math.round(n);
      return { wall: ms, offsetMin: 0 };
    }
    case "excel_days": {
      if (!RE_NUMBER.test(raw)) return null;
      const n = Number(raw);
      if (n < 1) return null;
      return { wall: Math.round((n - EXCEL_EPOCH_DAYS) * DAY), offsetMin: null };
    }
  }
}

function composeWall(
  y: number, mo: number, d: number,
  hs: string | undefined, mis: string | undefined, ss: string | undefined, frac: string | undefined,
  ampm: string | undefined,
): number {
  let h = hs === undefined ? 0 : +hs;
  const mi = mis === undefined ? 0 : +mis;
  const s = ss === undefined ? 0 : +ss;
  if (mo < 1 || mo > 12 || d < 1 || d > daysInMonth(y, mo)) return NaN;
  if (ampm !== undefined) {
    if (h < 1 || h > 12) return NaN;
    const isPm = ampm.toUpperCase() === "PM";
    h = (h % 12) + (isPm ? 12 : 0);
  }
  // 24:00:00 is how some historians write the end of a day.
  if (h > 24 || (h === 24 && (mi > 0 || s > 0)) || mi > 59 || s > 59) return NaN;
  const ms = frac === undefined ? 0 : Math.floor(Number(`0.${frac}`) * 1000 + 1e-6);
  return Date.UTC(y, mo - 1, d, h, mi, s, ms);
}

function daysInMonth(y: number, mo: number): number {
  return new Date(Date.UTC(y, mo, 0)).getUTCDate();
}

function readOffset(s: string | undefined): number | null {
  if (s === undefined) return null;
  const u = s.toUpperCase();
  if (u === "Z" || u === "UTC") return 0;
  const sign = s[0] === "-" ? -1 : 1;
  const digits = s.slice(1).replace(":", "");
  const h = +digits.slice(0, 2);
  const m = digits.length > 2 ? +digits.slice(2, 4) : 0;
  return sign * (h * 60 + m);
}

/** How one local wall time maps to instants in a zone. */
export type ZoneLookup =
  | { kind: "unique"; t: number }
  | { kind: "ambiguous"; earlier: number; later: number }
  | { kind: "nonexistent" };

/** True when luxon knows the IANA zone name. */
export function isValidTimeZone(zone: string): boolean {
  return IANAZone.isValidZone(zone);
}

/** Resolves local wall times in one zone, caching per local hour. */
export class ZoneResolver {
  private readonly zone: IANAZone;
  private readonly isUtc: boolean;
  // hour index → offset in minutes for hours with one offset throughout; NaN = has a change.
  private readonly hourCache = new Map<number, number>();

  constructor(timeZone: string) {
    if (!IANAZone.isValidZone(timeZone)) throw new Error(`unknown time zone "${timeZone}"`);
    this.zone = IANAZone.create(timeZone);
    this.isUtc = timeZone === "UTC" || timeZone === "Etc/UTC";
  }

  lookup(wall: number): ZoneLookup {
    if (this.isUtc) return { kind: "unique", t: wall };
    const hour = Math.floor(wall / HOUR);
    let off = this.hourCache.get(hour);
    if (off === undefined) {
      off = this.computeUniformOffset(hour);
      if (this.hourCache.size > 100_000) this.hourCache.clear(); // bound memory on long spans
      this.hourCache.set(hour, off);
    }
    if (!Number.isNaN(off)) return { kind: "unique", t: wall - off * 60_000 };
    return this.lookupExact(wall);
  }

  private computeUniformOffset(hour: number): number {
    const a = this.lookupExact(hour * HOUR);
    const b = this.lookupExact(hour * HOUR + HOUR - 1);
    if (a.kind === "unique" && b.kind === "unique" && b.t - a.t === HOUR - 1) {
      return (hour * HOUR - a.t) / 60_000;
    }
    return NaN;
  }

  /** Solve t + offset(t) = wall using the offsets a day either side (covers one change). */
  lookupExact(wall: number): ZoneLookup {
    const zone = this.zone;
    const candidates = new Set<number>([zone.offset(wall - DAY), zone.offset(wall + DAY)]);
    const valid: number[] = [];
    for (const o of candidates) {
      const t = wall - o * 60_000;
      if (zone.offset(t) === o) valid.push(t);
    }
    if (valid.length === 0) return { kind: "nonexistent" };
    if (valid.length === 1) return { kind: "unique", t: valid[0] };
    return { kind: "ambiguous", earlier: Math.min(...valid), later: Math.max(...valid) };
  }
}

/**
 * Parse one timestamp with the first-occurrence policy and no series memory.
 * Returns epoch ms, TIME_NONEXISTENT, or NaN (unparseable).
 */
export function parseTimestamp(raw: string, format: TimeFormat, timeZone: string): number {
  return createTimeParser(format, timeZone)(raw, "");
}

export type TimeParser = (raw: string, seriesKey: string) => number;

/**
 * A stateful parser for one file: it remembers, per series, whether the series has
 * entered the second pass of a repeated (fall-back) hour. See the DST policy above.
 */
export function createTimeParser(format: TimeFormat, timeZone: string): TimeParser {
  const resolver = new ZoneResolver(timeZone);
  // Only ambiguous rows touch this map, so it stays tiny.
  const ambiguousState = new Map<string, { day: number; lastWall: number; isSecondPass: boolean }>();
  // The last text and its time: a long-layout export repeats one timestamp for every
  // tag of that minute. Only answers that do not depend on the series are kept
  // (ambiguous fall-back times are not).
  let lastRaw = "";
  let lastT = TIME_UNPARSEABLE;
  const remember = (raw: string, t: number): number => {
    lastRaw = raw;
    lastT = t;
    return t;
  };
  return (raw, seriesKey) => {
    if (raw === lastRaw && lastRaw !== "") return lastT;
    const w = readWallTime(raw, format);
    if (w === null) return remember(raw, TIME_UNPARSEABLE);
    if (w.offsetMin !== null) return remember(raw, w.wall - w.offsetMin * 60_000);
    const r = resolver.lookup(w.wall);
    if (r.kind === "unique") return remember(raw, r.t);
    if (r.kind === "nonexistent") return remember(raw, TIME_NONEXISTENT);
    const day = Math.floor(w.wall / DAY);
    const st = ambiguousState.get(seriesKey);
    if (st === undefined || st.day !== day) {
      if (ambiguousState.size > 10_000) ambiguousState.clear();
      ambiguousState.set(seriesKey, { day, lastWall: w.wall, isSecondPass: false });
      return r.earlier;
    }
    if (!st.isSecondPass && w.wall <= st.lastWall) st.isSecondPass = true;
    st.lastWall = w.wall;
    return st.isSecondPass ? r.later : r.earlier;
  };
}
