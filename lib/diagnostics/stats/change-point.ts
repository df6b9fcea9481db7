// Step (level-shift) detection on bin medians. A step is "abrupt" when the
// level before and the level after, each a median over `compare` bins, differ by
// more than a threshold while the transition itself takes at most `gap` bins.
import { medianOfRange } from "@/lib/diagnostics/stats/bins";

/** Level after minus level before bin i: median(values[i+gap, i+gap+compare)) − median(values[i-compare, i)). */
export function levelShiftAt(values: Float64Array, i: number, compare: number, gap: number): number {
  const before = medianOfRange(values, i - compare, i);
  const after = medianOfRange(values, i + gap, i + gap + compare);
  return after - before;
}

/**
 * CUSUM change point of values[from, to): the index that splits the segment into
 * the two parts whose means differ most (Page 1954 cumulative-sum form, single change).
 */
export function findCusumChangePoint(values: Float64Array, from: number, to: number): number {
  let sum = 0, c = 0;
  for (let i = from; i < to; i++) if (values[i] === values[i]) { sum += values[i]; c++; }
  if (c < 2) return from;
  const mean = sum / c;
  let s = 0, bestAbs = -1, best = from;
  for (let i = from; i < to; i++) {
    const v = values[i];
    if (v === v) s += v - mean;
    if (Math.abs(s) > bestAbs) { bestAbs = Math.abs(s); best = i + 1; }
  }
  return Math.min(best, to - 1);
}
