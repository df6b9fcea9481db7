import { describe, expect, it } from "vitest";
import { summarizeBuckets, summarizeHours, summarizeThreeHours } from "./summarize-buckets";

const MIN = 60_000;
const T0 = Date.UTC(2026, 0, 5, 6, 0); // a bucket boundary (whole quarter hour)

function batch(rows: [number, number, number, number][]) {
  return {
    length: rows.length,
    wellId: rows.map((r) => r[0]),
    signal: Uint8Array.from(rows.map((r) => r[1])),
    t: Float64Array.from(rows.map((r) => r[2])),
    v: Float64Array.from(rows.map((r) => r[3])),
  };
}

// Expected values are the definitions of count, min, max, sum, first and last by time
// over each 15-minute bin (common practice for time-series rollups), worked by hand.
describe("summarizeBuckets", () => {
  it("splits a series at quarter-hour boundaries and keeps first/last by time", () => {
    const s = summarizeBuckets(batch([
      [7, 1, T0, 10],
      [7, 1, T0 + 5 * MIN, 4],
      [7, 1, T0 + 14 * MIN, 12],
      [7, 1, T0 + 15 * MIN, 3],
      [7, 2, T0 + 1 * MIN, 100],
      [8, 1, T0 + 1 * MIN, 50],
    ]));
    expect(s.length).toBe(4);
    expect([...s.wellId]).toEqual([7, 7, 7, 8]);
    expect([...s.signal]).toEqual([1, 1, 2, 1]);
    expect([...s.bucket]).toEqual([T0, T0 + 15 * MIN, T0, T0]);
    expect([...s.n]).toEqual([3, 1, 1, 1]);
    expect([...s.vmin]).toEqual([4, 3, 100, 50]);
    expect([...s.vmax]).toEqual([12, 3, 100, 50]);
    expect([...s.vsum]).toEqual([26, 3, 100, 50]);
    expect([...s.tfirst]).toEqual([T0, T0 + 15 * MIN, T0 + MIN, T0 + MIN]);
    expect([...s.vfirst]).toEqual([10, 3, 100, 50]);
    expect([...s.tlast]).toEqual([T0 + 14 * MIN, T0 + 15 * MIN, T0 + MIN, T0 + MIN]);
    expect([...s.vlast]).toEqual([12, 3, 100, 50]);
  });

  it("bins times before 1970 and between minutes the same way (floor to the quarter hour)", () => {
    const t = Date.UTC(1969, 11, 31, 23, 59, 30);
    const s = summarizeBuckets(batch([[1, 1, t, 1]]));
    expect([...s.bucket]).toEqual([Date.UTC(1969, 11, 31, 23, 45)]);
  });

  it("returns no rows for an empty batch", () => {
    expect(summarizeBuckets(batch([])).length).toBe(0);
  });
});

// Hourly rows from quarter-hour rows: sums of counts and sums, least minimum and
// greatest maximum with the earliest quarter holding each, first value of the first
// quarter and last value of the last (definitions; worked by hand).
describe("summarizeHours", () => {
  it("combines the quarters of each hour", () => {
    const q = summarizeBuckets(batch([
      [7, 1, T0, 10], [7, 1, T0 + 20 * MIN, 3], [7, 1, T0 + 40 * MIN, 12], [7, 1, T0 + 50 * MIN, 3],
      [7, 1, T0 + 60 * MIN, 5],
      [7, 2, T0 + 5 * MIN, 9],
    ]));
    const h = summarizeHours(q);
    expect(h.length).toBe(3);
    expect([...h.bucket]).toEqual([T0, T0 + 60 * MIN, T0]);
    expect([...h.n]).toEqual([4, 1, 1]);
    expect([...h.vsum]).toEqual([28, 5, 9]);
    expect([...h.vmin]).toEqual([3, 5, 9]);
    expect([...h.tmin]).toEqual([T0 + 15 * MIN, T0 + 60 * MIN, T0]); // 3 first seen in the 06:15 quarter
    expect([...h.vmax]).toEqual([12, 5, 9]);
    expect([...h.tmax]).toEqual([T0 + 30 * MIN, T0 + 60 * MIN, T0]);
    expect([...h.vfirst]).toEqual([10, 5, 9]);
    expect([...h.vlast]).toEqual([3, 5, 9]);
  });
});

// 3-hour rows from hourly rows: the same definitions over each 3-hour bin (bins from
// 2000-01-01 UTC; 06:00 UTC starts one), worked by hand; the time of an extreme is the
// earliest on a tie, first/last come from the earliest/latest hour.
describe("summarizeThreeHours", () => {
  const H = 60 * MIN;
  it("combines the hours of each 3-hour bin and records its first and last hour", () => {
    const s = summarizeThreeHours(summarizeHours(summarizeBuckets(batch([
      [7, 1, T0, 10],
      [7, 1, T0 + H + 20 * MIN, 2],
      [7, 1, T0 + 2 * H + 40 * MIN, 2],
      [7, 1, T0 + 2 * H + 50 * MIN, 30],
      [7, 1, T0 + 3 * H, 5],
      [8, 1, T0 + H, 9],
    ]))));
    expect(s.length).toBe(3);
    expect([...s.wellId]).toEqual([7, 7, 8]);
    expect([...s.bucket]).toEqual([T0, T0 + 3 * H, T0]);
    expect([...s.n]).toEqual([4, 1, 1]);
    expect([...s.vmin]).toEqual([2, 5, 9]);
    expect([...s.vmax]).toEqual([30, 5, 9]);
    expect([...s.vsum]).toEqual([44, 5, 9]);
    expect([...s.vfirst]).toEqual([10, 5, 9]);
    expect([...s.vlast]).toEqual([30, 5, 9]);
    // The minimum 2 appears twice: the earlier quarter (01:15) wins.
    expect([...s.tmin]).toEqual([T0 + H + 15 * MIN, T0 + 3 * H, T0 + H]);
    expect([...s.tmax]).toEqual([T0 + 2 * H + 45 * MIN, T0 + 3 * H, T0 + H]);
    expect([...s.hfirst]).toEqual([T0, T0 + 3 * H, T0 + H]);
    expect([...s.hlast]).toEqual([T0 + 2 * H, T0 + 3 * H, T0 + H]);
  });
});
