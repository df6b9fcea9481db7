// Regression values of our own reduction choices (not validation against an outside
// source): two points per pixel column, at most 2,000 per signal.
import { describe, expect, it } from "vitest";
import { HOURLY_BUCKET_MS, MINUTE_MS, ROLLUP_BUCKET_MS, SOURCE_ROW_MS, THREE_HOUR_BUCKET_MS, chooseBucketMs, chooseBucketSource, planBuckets, pointCap } from "./bucket-plan";

const DAY = 1440 * MINUTE_MS;

describe("pointCap", () => {
  it.each([
    [1200, 2000],
    [600, 1200],
    [0, 2000],
    [Number.NaN, 2000],
    [5000, 2000],
    [1, 2],
  ])("width %s px → %s points", (w, cap) => expect(pointCap(w)).toBe(cap));
});

describe("chooseBucketMs", () => {
  it.each([
    ["90 days at 2,000 points → 3 h", 90 * DAY, 2000, 180 * MINUTE_MS],
    ["30 days at 2,000 points → 1 h", 30 * DAY, 2000, 60 * MINUTE_MS],
    ["7 days at 2,000 points → 15 min", 7 * DAY, 2000, 15 * MINUTE_MS],
    ["2 days at 2,000 points → 5 min", 2 * DAY, 2000, 5 * MINUTE_MS],
    ["6 hours at 1,200 points → 1 min", 6 * 60 * MINUTE_MS, 1200, MINUTE_MS],
    ["2 years at 2,000 points → 1 day", 730 * DAY, 2000, DAY],
    ["5 years at 2,000 points → whole days", 1826 * DAY, 2000, 2 * DAY],
  ])("%s", (_name, range, cap, expected) => {
    const b = chooseBucketMs(range, cap);
    expect(b).toBe(expected);
    expect(2 * Math.ceil(range / b)).toBeLessThanOrEqual(cap + 2);
  });
});

describe("chooseBucketSource", () => {
  // The coarsest table whose buckets divide the chart bucket (fewest rows read).
  it.each([
    [10_000, "samples"],
    [5 * MINUTE_MS, "samples"],
    [15 * MINUTE_MS, "rollup"],
    [30 * MINUTE_MS, "rollup"],
    [60 * MINUTE_MS, "hourly"],
    [120 * MINUTE_MS, "hourly"],
    [180 * MINUTE_MS, "three_hourly"],
    [360 * MINUTE_MS, "three_hourly"],
    [1440 * MINUTE_MS, "three_hourly"],
    [2 * DAY, "three_hourly"],
  ] as const)("a %s ms bucket → %s", (bucketMs, source) => expect(chooseBucketSource(bucketMs)).toBe(source));
  it("names a table for every bucket length we use, never a coarser one than the bucket", () => {
    for (const range of [3600_000, DAY, 7 * DAY, 90 * DAY, 730 * DAY]) {
      const b = chooseBucketMs(range, 2000);
      const rowMs = SOURCE_ROW_MS[chooseBucketSource(b)];
      expect(b % rowMs).toBe(0);
    }
  });
});

describe("planBuckets", () => {
  const from = Date.UTC(2026, 0, 1);
  it("returns raw values when the densest signal fits under the cap", () => {
    expect(planBuckets({ fromMs: from, toMs: from + 2 * 3600_000, widthPx: 1200, maxRawCount: 120 })).toEqual({ resolution: "raw", bucketMs: 0, source: null, cap: 2000 });
  });
  it("reads 90 days from the 3-hour rollup, one stored row per bucket", () => {
    const p = planBuckets({ fromMs: from, toMs: from + 90 * DAY, widthPx: 1200, maxRawCount: 129_600 });
    expect(p).toMatchObject({ resolution: "minmax", source: "three_hourly", bucketMs: THREE_HOUR_BUCKET_MS });
  });
  it("reads 30 days from the hourly rollup", () => {
    const p = planBuckets({ fromMs: from, toMs: from + 30 * DAY, widthPx: 1200, maxRawCount: 43_200 });
    expect(p).toMatchObject({ resolution: "minmax", source: "hourly", bucketMs: HOURLY_BUCKET_MS });
  });
  it("reads a week from the 15-minute rollup", () => {
    const p = planBuckets({ fromMs: from, toMs: from + 7 * DAY, widthPx: 1200, maxRawCount: 10_080 });
    expect(p).toMatchObject({ resolution: "minmax", source: "rollup", bucketMs: ROLLUP_BUCKET_MS });
  });
  it("reads medium ranges from the samples themselves", () => {
    const p = planBuckets({ fromMs: from, toMs: from + 2 * DAY, widthPx: 1200, maxRawCount: 2880 });
    expect(p).toMatchObject({ resolution: "minmax", source: "samples", bucketMs: 5 * MINUTE_MS });
  });
});
