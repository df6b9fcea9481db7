// The recent medians behind a chart's valve lines (read-recent-medians.ts), kept per
// well while they cannot change. They are read over the hours before the latest
// pressure value at or before the range's end, so every range that ends at or after
// each pressure signal's latest value (and starts within the look-back of it) gets
// the same medians: the usual live view of a well, however it is zoomed or panned
// on the left, and every refresh of it. Reading them was ~0.75 ms of database CPU
// per chart request, about a sixth of an uncached 90-day chart (measured here).
//
// Kept only while the series' versions (trend-sample-cache.ts: renewed in the same
// transaction as any write, by any writer) are those read before the medians, so a
// new value, which may move the latest time, is never missed.
import { LOOK_BACK_MS, type RecentMedians, type RecentRead } from "./read-recent-medians";

/** One entry per well: a few hundred bytes each. */
const MAX_WELLS = 2000;

interface Entry {
  version: string;
  latestMs: (number | null)[];
  medians: RecentMedians;
}

const g = globalThis as unknown as { __bellowsLiveMedians?: Map<number, Entry> };
const entries = (g.__bellowsLiveMedians ??= new Map());

/** Whether [fromMs, toMs] reaches every pressure signal's latest value (a signal without values is no bound). */
export function reachesLatest(latestMs: readonly (number | null)[], fromMs: number, toMs: number): boolean {
  return latestMs.every((t) => t === null || (t <= toMs && t >= fromMs - LOOK_BACK_MS));
}

/**
 * The medians for a range: kept ones when the well's series are at `version` and
 * the range reaches the same latest values; otherwise `read()` them, and keep them
 * when the range reached the latest values. `version` must be read before `read()`
 * runs; null (a series never versioned) keeps nothing.
 */
export async function readLiveMedians(wellId: number, version: string | null, fromMs: number, toMs: number, read: () => Promise<RecentRead>): Promise<RecentMedians> {
  const hit = entries.get(wellId);
  if (version !== null && hit && hit.version === version && reachesLatest(hit.latestMs, fromMs, toMs)) return hit.medians;
  const r = await read();
  if (version !== null && reachesLatest(r.latestMs, fromMs, toMs)) {
    entries.delete(wellId);
    entries.set(wellId, { version, latestMs: r.latestMs, medians: Object.freeze({ ...r.medians }) });
    if (entries.size > MAX_WELLS) entries.delete(entries.keys().next().value as number);
    return entries.get(wellId)!.medians;
  }
  return r.medians;
}

/** For tests: forget every kept entry. */
export function clearLiveMedians(): void {
  entries.clear();
}
