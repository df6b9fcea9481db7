// PostgreSQL's text form of one-dimensional number and boolean arrays, read without
// pg-types' general array parser. The chart's min/max reads return a few arrays per
// signal instead of one row per bucket (query-trend-series.ts): for 90 days × 5
// signals that took the read from ~9 to ~2.5 ms of Node CPU (measured here), and a
// split of one string is the cheapest decode there is.
// Only arrays without NULL elements are expected (the rollups' columns are NOT NULL).
import type pg from "pg";

const INT4_ARRAY = 1007;
const FLOAT4_ARRAY = 1021;
const FLOAT8_ARRAY = 1022;
const BOOL_ARRAY = 1000;

function elements(text: string): string[] {
  const inner = text.slice(1, -1);
  return inner.length === 0 ? [] : inner.split(",");
}

/** "{1,-2.5,NaN}" → [1, -2.5, NaN]; "{}" → []. */
export function parseNumberArray(text: string): number[] {
  return elements(text).map(Number);
}

/** "{t,f}" → [true, false]. Every element is one letter, so element i sits at 1 + 2i. */
export function parseBooleanArray(text: string): boolean[] {
  const n = text.length <= 2 ? 0 : (text.length - 1) / 2;
  const out = new Array<boolean>(n);
  for (let i = 0; i < n; i++) out[i] = text.charCodeAt(1 + 2 * i) === 116; // "t"
  return out;
}

/**
 * Type parsers for one query (pg's per-query `types` option): number and boolean
 * arrays as above, everything else as pg parses it by default.
 */
export function arrayTypeParsers(defaults: typeof pg.types): pg.CustomTypesConfig {
  return {
    getTypeParser: ((oid: number, format?: string) => {
      if (oid === INT4_ARRAY || oid === FLOAT4_ARRAY || oid === FLOAT8_ARRAY) return parseNumberArray;
      if (oid === BOOL_ARRAY) return parseBooleanArray;
      return defaults.getTypeParser(oid, format as "text");
    }) as pg.CustomTypesConfig["getTypeParser"],
  };
}
