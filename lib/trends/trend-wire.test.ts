// Round trip of the compact series encoding: regression checks of our own format,
// no outside source.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { fromWireSeries, toWireSeries } from "./trend-wire";
import type { TrendSeries } from "./trend-types";

const series = (t: number[], v: (number | null)[]): TrendSeries => ({ signal: "casing_pressure", unit: "psig", t, v });

describe("toWireSeries / fromWireSeries", () => {
  it("sends a start and small steps for min/max points, and gives the times back", () => {
    const t = [1_788_396_300_000, 1_788_401_700_000, 1_788_407_100_000, 1_788_409_800_000, 1_788_412_500_000];
    const w = toWireSeries(series(t, [1, 2, null, 3, 4]));
    expect(w.t0).toBe(t[0]);
    expect(w.dt).toEqual([0, 5_400_000, 5_400_000, 2_700_000, 2_700_000]);
    expect(fromWireSeries(w)).toEqual(series(t, [1, 2, null, 3, 4]));
  });

  it("sends evenly spaced times as one step, and gives them back", () => {
    const t = Array.from({ length: 1440 }, (_, i) => 1_788_396_300_000 + i * 5_400_000);
    const v = t.map((_, i) => i % 7);
    const w = toWireSeries(series(t, v));
    expect(w.dt).toBe(5_400_000);
    expect(fromWireSeries(JSON.parse(JSON.stringify(w)))).toEqual(series(t, v));
  });

  it("keeps the steps of two points, or of a series with a gap, as a list", () => {
    expect(toWireSeries(series([10, 20], [1, 2])).dt).toEqual([0, 10]);
    expect(toWireSeries(series([10, 20, 25, 30], [1, 2, null, 3])).dt).toEqual([0, 10, 5, 5]);
  });

  it("handles an empty series", () => {
    const w = toWireSeries(series([], []));
    expect(w).toMatchObject({ t0: 0, dt: [], v: [] });
    expect(fromWireSeries(w).t).toEqual([]);
  });

  it("gives back every time exactly, for increasing whole or half milliseconds (property)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 946_684_800_000, max: 4_102_444_800_000 }), fc.array(fc.integer({ min: 1, max: 2 * 86_400_000 }), { maxLength: 300 }), (start, steps) => {
        const t = [start];
        for (const s of steps) t.push(t[t.length - 1] + s / 2);
        const v = t.map((_, i) => i);
        expect(fromWireSeries(JSON.parse(JSON.stringify(toWireSeries(series(t, v)))))).toEqual(series(t, v));
      }),
    );
  });
});
