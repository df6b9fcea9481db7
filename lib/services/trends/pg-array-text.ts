// PostgreSQL's text form of the arrays the chart's min/max read returns
// (query-trend-series.ts), read without pg-types' general array parser: bucket
// numbers (int4[]) by one split of the string, and the values (float4[], pairs in
// drawing order) kept as the text itself, passed on to the browser as written
// (lib/trends/number-list-text.ts). One row of arrays per signal instead of one row
// per bucket took the read from ~9 to ~2.5 ms of Node CPU for 90 days × 5 signals,
// and keeping the values as text from ~3.3 to ~1.5 ms (measured here).
// Only arrays without NULL elements are expected (the rollups' columns are NOT NULL).
import type pg from "pg";

const INT4_ARRAY = 1007;
const FLOAT4_ARRAY = 1021;

/** "{1,-2,30000}" → [1, -2, 30000]; "{}" → []. */
export function parseNumberArray(text: string): number[] {
  const inner = text.slice(1, -1);
  return inner.length === 0 ? [] : inner.split(",").map(Number);
}

const keepText = (text: string) => text;

/**
 * Type parsers for one query (pg's per-query `types` option): int4[] as numbers,
 * float4[] as its text, everything else as pg parses it by default.
 */
export function minMaxTypeParsers(defaults: typeof pg.types): pg.CustomTypesConfig {
  return {
    getTypeParser: ((oid: number, format?: string) => {
      if (oid === INT4_ARRAY) return parseNumberArray;
      if (oid === FLOAT4_ARRAY) return keepText;
      return defaults.getTypeParser(oid, format as "text");
    }) as pg.CustomTypesConfig["getTypeParser"],
  };
}
