// Helpers simple-statistics lacks. Expected values are exact arithmetic or
// textbook properties (a sine's autocorrelation peaks at its period), not field data.
import { describe, expect, it } from "vitest";
import { autocorrelation, findDominantPeriod } from "@/lib/diagnostics/stats/autocorrelation";
import { binSeries, medianOfRange, quantileOfRange } from "@/lib/diagnostics/stats/bins";
import { rollingMean, rollingMedian, rollingRms } from "@/lib/diagnostics/stats/rolling";
import { findRuns } from "@/lib/diagnostics/stats/runs";
import { findCusumChangePoint, levelShiftAt } from "@/lib/diagnostics/stats/change-point";
import { robustZ, MAD_TO_SIGMA } from "@/lib/diagnostics/stats/robust-z";
import { alignToMinutes, isMinuteGrid } from "@/lib/diagnostics/stats/resample";
import { toFloat64 } from "@/lib/diagnostics/stats/series-prep";

const f64 = (xs: number[]) => Float64Array.from(xs);

describe("bins", () => {
  it("median, min, max, mean and count per bin, NaN-aware", () => {
    const b = binSeries(f64([1, 5, 3, NaN, 10, 20, NaN, NaN]), 4);
    expect(Array.from(b.median)).toEqual([3, 15]);
    expect(Array.from(b.min)).toEqual([1, 10]);
    expect(Array.from(b.max)).toEqual([5, 20]);
    expect(Array.from(b.count)).toEqual([3, 2]);
    expect(b.mean[1]).toBe(15);
  });
  it("range median and quantile ignore gaps", () => {
    const x = f64([4, NaN, 1, 3, 2]);
    expect(medianOfRange(x, 0, 5)).toBe(2.5);
    expect(quantileOfRange(x, 0, 5, 0)).toBe(1);
    expect(quantileOfRange(x, 0, 5, 1)).toBe(4);
    expect(medianOfRange(x, 1, 2)).toBeNaN();
  });
});

describe("rolling windows", () => {
  it.each([
    { name: "mean of a ramp is the ramp inside", fn: () => rollingMean(f64([0, 1, 2, 3, 4]), 3), want: [0.5, 1, 2, 3, 3.5] },
    { name: "median shrugs off a spike", fn: () => rollingMedian(f64([1, 1, 100, 1, 1]), 3), want: [1, 1, 1, 1, 1] },
    { name: "RMS about a reference", fn: () => rollingRms(f64([1, -1, 1, -1]), f64([0, 0, 0, 0]), 2), want: [1, 1, 1, 1] },
  ])("$name", ({ fn, want }) => {
    expect(Array.from(fn())).toEqual(want);
  });
});

describe("autocorrelation and dominant period", () => {
  it("finds the period of a sine (60 samples)", () => {
    const x = Float64Array.from({ length: 240 }, (_, i) => 100 + 10 * Math.sin((2 * Math.PI * i) / 60));
    const acf = autocorrelation(x, 0, 240, 100);
    expect(acf[0]).toBeCloseTo(1, 6);
    const p = findDominantPeriod(acf, 10, 100);
    expect(p?.lag).toBe(60);
    expect(p?.value).toBeGreaterThan(0.7);
  });
  it("a step or a trend has no dominant period", () => {
    const step = Float64Array.from({ length: 200 }, (_, i) => (i < 100 ? 0 : 10));
    expect(findDominantPeriod(autocorrelation(step, 0, 200, 80), 5, 80)).toBeNull();
  });
});

describe("change points", () => {
  it("level shift and CUSUM locate a step at index 50", () => {
    const x = Float64Array.from({ length: 100 }, (_, i) => (i < 50 ? 10 : 4));
    expect(levelShiftAt(x, 50, 10, 0)).toBe(-6);
    expect(findCusumChangePoint(x, 0, 100)).toBe(50);
  });
});

describe("runs", () => {
  it("bridges short holes and drops short runs", () => {
    const flags = Uint8Array.from([1, 1, 0, 1, 1, 0, 0, 0, 1]);
    expect(findRuns(flags, 3, 1)).toEqual([{ from: 0, to: 5 }]);
    expect(findRuns(flags, 1, 0)).toEqual([{ from: 0, to: 2 }, { from: 3, to: 5 }, { from: 8, to: 9 }]);
  });
});

describe("robust z and resampling", () => {
  it("robust z uses 1.4826 × MAD (Rousseeuw & Croux 1993)", () => {
    expect(robustZ(10 + MAD_TO_SIGMA * 2 * 3, 10, 2)).toBeCloseTo(3, 9);
  });
  it("irregular samples land on a minute grid; nulls become NaN", () => {
    const t = [0, 30_000, 130_000, 240_000];
    const v = toFloat64([1, null, 3, 4], 4);
    expect(isMinuteGrid(t)).toBe(false);
    const out = alignToMinutes(t, [v]);
    expect(Array.from(out.t)).toEqual([0, 60_000, 120_000, 180_000, 240_000]);
    expect(Array.from(out.signals[0])).toEqual([1, NaN, 3, NaN, 4]);
  });
});

describe("median by selection (Hoare 1961 quickselect) agrees with sorting", () => {
  it.each([25, 26, 60, 61, 144])("n = %i random values", (n) => {
    let seed = n;
    const rand = () => ((seed = (seed * 16807) % 2147483647) / 2147483647);
    const xs = Array.from({ length: n }, () => Math.round(rand() * 50));
    const sorted = [...xs].sort((a, b) => a - b);
    const want = n % 2 ? sorted[n >> 1] : (sorted[n / 2 - 1] + sorted[n / 2]) / 2;
    expect(medianOfRange(Float64Array.from(xs), 0, n)).toBe(want);
  });
});
