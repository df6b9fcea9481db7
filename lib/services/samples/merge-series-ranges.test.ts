// Range arithmetic only (no engineering value): the expected ranges are worked out by
// hand from the definition (widen to whole steps, merge overlapping or touching
// ranges of one series).
import { describe, expect, it } from "vitest";
import { mergeSeriesRanges } from "./merge-series-ranges";

const H = 3_600_000;
const STEP = 3 * H;
const T0 = Date.UTC(2026, 5, 14); // an invented day; a whole number of 3-hour steps from the epoch

type Range = [well: number, signal: number, lo: number, hi: number];

const toRanges = (rows: readonly Range[]) => ({
  wellIds: rows.map((r) => r[0]),
  signals: rows.map((r) => r[1]),
  los: rows.map((r) => r[2]),
  his: rows.map((r) => r[3]),
});

const fromRanges = (r: ReturnType<typeof toRanges>): Range[] => r.wellIds.map((w, i) => [w, r.signals[i], r.los[i], r.his[i]]);

describe("mergeSeriesRanges", () => {
  it.each<[string, Range[], Range[]]>([
    ["nothing", [], []],
    ["one hour widens to its 3-hour bucket", [[1, 1, T0 + 4 * H, T0 + 5 * H]], [[1, 1, T0 + 3 * H, T0 + 6 * H]]],
    ["three hours of one bucket become one range", [[1, 1, T0, T0 + H], [1, 1, T0 + H, T0 + 2 * H], [1, 1, T0 + 2 * H, T0 + 3 * H]], [[1, 1, T0, T0 + 3 * H]]],
    ["hours in touching buckets merge", [[1, 1, T0 + 2 * H, T0 + 3 * H], [1, 1, T0 + 3 * H, T0 + 4 * H]], [[1, 1, T0, T0 + 6 * H]]],
    ["a bucket apart stays apart", [[1, 1, T0, T0 + H], [1, 1, T0 + 7 * H, T0 + 8 * H]], [[1, 1, T0, T0 + 3 * H], [1, 1, T0 + 6 * H, T0 + 9 * H]]],
    ["a range spanning several buckets", [[1, 1, T0 + H + 15 * 60_000, T0 + 7 * H]], [[1, 1, T0, T0 + 9 * H]]],
    ["a range inside another", [[1, 1, T0, T0 + 9 * H], [1, 1, T0 + 4 * H, T0 + 5 * H]], [[1, 1, T0, T0 + 9 * H]]],
    ["other series never merge", [[1, 1, T0, T0 + H], [1, 2, T0, T0 + H], [2, 1, T0 + H, T0 + 2 * H]], [[1, 1, T0, T0 + STEP], [1, 2, T0, T0 + STEP], [2, 1, T0, T0 + STEP]]],
    [
      "out of order input (an out-of-order write) comes out ordered and merged",
      [[2, 1, T0 + 4 * H, T0 + 5 * H], [1, 3, T0 + 10 * H, T0 + 11 * H], [2, 1, T0, T0 + H], [1, 3, T0 + 9 * H, T0 + 10 * H], [2, 1, T0 + 5 * H, T0 + 6 * H]],
      [[1, 3, T0 + 9 * H, T0 + 12 * H], [2, 1, T0, T0 + 6 * H]],
    ],
    ["an empty range keeps its series (its version is still renewed)", [[1, 1, T0 + 3 * H, T0 + 3 * H]], [[1, 1, T0 + 3 * H, T0 + 3 * H]]],
  ])("%s", (_name, input, want) => {
    expect(fromRanges(mergeSeriesRanges(toRanges(input), STEP))).toEqual(want);
  });

  it("leaves the input as it was", () => {
    const input = toRanges([[2, 1, T0 + H, T0 + 2 * H], [1, 1, T0, T0 + H]]);
    const copy = structuredClone(input);
    mergeSeriesRanges(input, STEP);
    expect(input).toEqual(copy);
  });

  it("gives disjoint whole-bucket ranges per series for any input (random invented ranges)", () => {
    let seed = 7;
    const next = () => (seed = (seed * 48271) % 2147483647) / 2147483647;
    const rows: Range[] = Array.from({ length: 200 }, () => {
      const lo = T0 + Math.floor(next() * 96) * 15 * 60_000;
      return [1 + Math.floor(next() * 3), 1 + Math.floor(next() * 2), lo, lo + Math.ceil(next() * 8) * 15 * 60_000];
    });
    const out = fromRanges(mergeSeriesRanges(toRanges(rows), STEP));
    for (let i = 0; i < out.length; i++) {
      expect(out[i][2] % STEP).toBe(0);
      expect(out[i][3] % STEP).toBe(0);
      const prev = out[i - 1];
      if (prev && prev[0] === out[i][0] && prev[1] === out[i][1]) expect(out[i][2]).toBeGreaterThan(prev[3]);
    }
    // Every input range is covered by an output range of its series.
    for (const [w, s, lo, hi] of rows) expect(out.some((o) => o[0] === w && o[1] === s && o[2] <= lo && o[3] >= hi)).toBe(true);
  });
});
