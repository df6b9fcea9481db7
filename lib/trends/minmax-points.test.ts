// Regression values of our own point layout (not validation against an outside source).
import { describe, expect, it } from "vitest";
import { breakGaps, guessMinFirst, isMinFirst, medianStep, toMinMaxPoints } from "./minmax-points";

describe("toMinMaxPoints", () => {
  it("gives each bucket its extremes in the order they happened", () => {
    const r = toMinMaxPoints(
      [
        { bucket: 0, vmin: 1, vmax: 9, isMinFirst: true },
        { bucket: 100, vmin: 2, vmax: 8, isMinFirst: false },
      ],
      100,
    );
    expect(r).toEqual({ t: [25, 75, 125, 175], v: [1, 9, 8, 2] });
  });
  it("keeps times strictly increasing", () => {
    const r = toMinMaxPoints(Array.from({ length: 10 }, (_, i) => ({ bucket: i * 60, vmin: 0, vmax: 1, isMinFirst: i % 2 === 0 })), 60);
    for (let i = 1; i < r.t.length; i++) expect(r.t[i]).toBeGreaterThan(r.t[i - 1]);
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
  it("median step", () => {
    expect(medianStep([0, 1, 2, 10])).toBe(1);
    expect(medianStep([5])).toBeNull();
  });
});
