// Regression values of our own reduction choices (not validation against an outside
// source): two points per pixel column, at most 2,000 per signal.
import { describe, expect, it } from "vitest";
import { MINUTE_MS, ROLLUP_BUCKET_MS, chooseBucketMs, planBuckets, pointCap } from "./bucket-plan";

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

describe("planBuckets", () => {
  const from = Date.UTC(2026, 0, 1);
  it("returns raw values when the densest signal fits under the cap", () => {
    expect(planBuckets({ fromMs: from, toMs: from + 2 * 3600_000, widthPx: 1200, maxRawCount: 120 })).toEqual({ resolution: "raw", bucketMs: 0, source: null, cap: 2000 });
  });
  it("reads long ranges from the 15-minute rollup", () => {
    const p = planBuckets({ fromMs: from, toMs: from + 90 * DAY, widthPx: 1200, maxRawCount: 129_600 });
    expect(p.resolution).toBe("minmax");
    expect(p.source).toBe("rollup");
    expect(p.bucketMs % ROLLUP_BUCKET_MS).toBe(0);
  });
  it("reads medium ranges from the samples themselves", () => {
    const p = planBuckets({ fromMs: from, toMs: from + 2 * DAY, widthPx: 1200, maxRawCount: 2880 });
    expect(p).toMatchObject({ resolution: "minmax", source: "samples", bucketMs: 5 * MINUTE_MS });
  });
});
