// Regression values of our own point layout (not validation against an outside source).
import { describe, expect, it } from "vitest";
import { breakGaps, gapPositions, guessMinFirst, isMinFirst, medianStep, minMaxPointTimes, timesWithGaps } from "./minmax-points";

describe("minMaxPointTimes", () => {
  it("places each bucket's two points at a quarter and three quarters of it", () => {
    expect(minMaxPointTimes([0, 100], 100)).toEqual([25, 75, 125, 175]);
  });
  it("keeps times strictly increasing", () => {
    const t = minMaxPointTimes(Array.from({ length: 10 }, (_, i) => i * 60), 60);
    for (let i = 1; i < t.length; i++) expect(t[i]).toBeGreaterThan(t[i - 1]);
  });
});

describe("order of extremes", () => {
  it.each([
    ["minimum earlier", 10, 20, 5, 0, 10, true],
    ["maximum earlier", 20, 10, 5, 0, 10, false],
    ["same time, opened low", 10, 10, 1, 0, 10, true],
    ["same time, opened high", 10, 10, 9, 0, 10, false],
  ])("%s", (_n, tMin, tMax, vfirst, vmin, vmax, expected) => {
    expect(isMinFirst(tMin, tMax, vfirst, vmin, vmax)).toBe(expected);
  });
  it("guesses min first on a flat bucket", () => expect(guessMinFirst(3, 3, 3)).toBe(true));
});

describe("breakGaps", () => {
  it("inserts a null over an outage longer than five typical steps", () => {
    const r = breakGaps({ t: [0, 1, 2, 3, 20, 21], v: [1, 1, 1, 1, 2, 2] });
    expect(r.v).toEqual([1, 1, 1, 1, null, 2, 2]);
    expect(r.t[4]).toBe(11.5);
  });
  it("leaves a regular series alone", () => {
    const s = { t: [0, 1, 2, 3], v: [1, 2, 3, 4] };
    expect(breakGaps(s)).toEqual(s);
  });
  it("honours a minimum gap", () => {
    expect(breakGaps({ t: [0, 1, 2, 10], v: [1, 1, 1, 1] }, { minGapMs: 60 }).v).not.toContain(null);
  });
  it("finds the same gaps by position, for series held as text", () => {
    const t = [0, 1, 2, 3, 20, 21];
    expect(gapPositions(t)).toEqual([4]);
    expect(timesWithGaps(t, [4])).toEqual(breakGaps({ t, v: t }).t);
    expect(gapPositions([0, 1, 2, 10], { minGapMs: 60 })).toEqual([]);
  });
  it("median step", () => {
    expect(medianStep([0, 1, 2, 10])).toBe(1);
    expect(medianStep([5])).toBeNull();
  });
});
