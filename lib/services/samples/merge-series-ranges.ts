// The series ranges a rollup refresh recomputes, widened to whole buckets and merged.
// Why: the refresh is one INSERT … ON CONFLICT DO UPDATE, and PostgreSQL refuses a
// statement that reaches the same row twice ("cannot affect row a second time"), so
// two ranges of one series that reach the same bucket (two hours of one 3-hour
// bucket, say) must become one range. Merging also makes one index range scan out of
// many adjacent ones.

/** Time ranges [los[i], his[i]) in epoch ms of the series (wellIds[i], signals[i]), as parallel arrays. */
export interface SeriesRanges {
  wellIds: number[];
  signals: number[];
  los: number[];
  his: number[];
}

function isBefore(r: SeriesRanges, a: number, b: number): boolean {
  if (r.wellIds[a] !== r.wellIds[b]) return r.wellIds[a] < r.wellIds[b];
  if (r.signals[a] !== r.signals[b]) return r.signals[a] < r.signals[b];
  return r.los[a] < r.los[b];
}

/** Indexes of the ranges in (well, signal, lo) order; the writer's ranges already are, so no sort then. */
function orderOf(r: SeriesRanges): number[] {
  const order = Array.from({ length: r.wellIds.length }, (_, i) => i);
  for (let i = 1; i < order.length; i++) {
    if (isBefore(r, i, i - 1)) return order.sort((a, b) => (isBefore(r, a, b) ? -1 : isBefore(r, b, a) ? 1 : 0));
  }
  return order;
}

/**
 * Widen each range to whole buckets of stepMs (buckets bin from the Unix epoch, as
 * from 2000-01-01 UTC for any step dividing a day), then merge the ranges of one
 * series that overlap or touch. The result is in (well, signal, lo) order, and the
 * ranges of a series are disjoint and hold whole buckets. Every input series keeps at
 * least one range (the callers renew the version of each series they are given).
 */
export function mergeSeriesRanges(r: SeriesRanges, stepMs: number): SeriesRanges {
  const out: SeriesRanges = { wellIds: [], signals: [], los: [], his: [] };
  for (const i of orderOf(r)) {
    const lo = Math.floor(r.los[i] / stepMs) * stepMs;
    const hi = Math.max(lo, Math.ceil(r.his[i] / stepMs) * stepMs);
    const k = out.wellIds.length - 1;
    if (k >= 0 && out.wellIds[k] === r.wellIds[i] && out.signals[k] === r.signals[i] && lo <= out.his[k]) {
      if (hi > out.his[k]) out.his[k] = hi;
      continue;
    }
    out.wellIds.push(r.wellIds[i]);
    out.signals.push(r.signals[i]);
    out.los.push(lo);
    out.his.push(hi);
  }
  return out;
}
