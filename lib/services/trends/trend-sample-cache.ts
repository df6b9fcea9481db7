// Recently drawn chart answers (the reduced series), kept in this process's memory.
// An answer is reused only while every series it was read from still has the
// version it had before the read (sample_series_versions, renewed in the same
// transaction as any write to the series, by whichever process writes), so it can
// never show data older than the database holds. Checking costs one primary-key
// read, which the chart makes on every request (the live medians,
// live-medians-cache.ts, are kept on the same versions). Issues, field events and
// the well's valve design are not cached: they change through other paths and are
// cheap to read.
//
// An answer is kept only when its key is asked for a second time (the first time
// only the key is remembered): most ranges are drawn once, as every drag-zoom or pan
// asks for a new one, and keeping each of those answers promotes ~200 kB of arrays
// per request to the old generation, to be collected there. Under the dashboard
// bench's uncached chart run this left throughput unchanged but lowered p95 (390
// against 487 ms and 328 against 370 ms in two A/B runs here).
import type pg from "pg";

/** About 64 charts of five signals at 2,000 points: a few tens of MB at most. */
const MAX_ENTRIES = 64;

interface Entry<T> {
  version: string;
  value: T;
}

/** Keys asked for once, so a second request is recognised; forgotten all at once when full. */
const MAX_SEEN = 4096;

const g = globalThis as unknown as { __bellowsTrendSampleCache?: Map<string, Entry<unknown>>; __bellowsTrendSeenKeys?: Set<string> };
const entries = (g.__bellowsTrendSampleCache ??= new Map());
const seen = (g.__bellowsTrendSeenKeys ??= new Set());

/**
 * The series' versions as one string, or null when a series has none (never written
 * since the version table exists): such an answer is not cached.
 */
export async function readSeriesVersions(db: pg.Pool | pg.ClientBase, wellId: number, codes: readonly number[]): Promise<string | null> {
  const r = await db.query<{ signal: number; version: string }>({
    name: "bellows-trend-versions",
    text: "SELECT signal, version FROM sample_series_versions WHERE well_id = $1 AND signal = ANY($2::smallint[]) ORDER BY signal",
    values: [wellId, codes],
  });
  const distinct = new Set(codes);
  if (r.rows.length < distinct.size) return null;
  return r.rows.map((row) => `${row.signal}:${row.version}`).join(",");
}

/**
 * The cached value for `key` if it was read at `version`, the series' current
 * versions; otherwise `read()` it, and keep it if `key` was asked for before. The
 * version must be read before `read()` runs, so a write landing in between leaves an
 * entry that the next request finds out of date (never the reverse). A null version
 * (a series never versioned) keeps nothing.
 */
export async function readThroughCache<T>(key: string, version: string | null, read: () => Promise<T>): Promise<T> {
  if (!entries.has(key) && !seen.has(key)) {
    if (seen.size >= MAX_SEEN) seen.clear();
    seen.add(key);
    return read();
  }
  if (version !== null) {
    const hit = entries.get(key) as Entry<T> | undefined;
    if (hit && hit.version === version) {
      // Map keeps insertion order: re-inserting marks the entry as recently used.
      entries.delete(key);
      entries.set(key, hit);
      return hit.value;
    }
  }
  const value = await read();
  if (version !== null) {
    entries.delete(key);
    entries.set(key, { version, value });
    while (entries.size > MAX_ENTRIES) entries.delete(entries.keys().next().value as string);
  }
  return value;
}

/** For tests: forget every cached answer. */
export function clearTrendSampleCache(): void {
  entries.clear();
  seen.clear();
}
