import { describe, expect, it } from "vitest";
import { alignSeries, convertValues } from "./align-series";

describe("alignSeries", () => {
  it("joins series on the union of their times", () => {
    const r = alignSeries([
      { t: [1, 3], v: [10, 30] },
      { t: [2, 3, 4], v: [null, 33, 44] },
    ]);
    expect(r.t).toEqual([1, 2, 3, 4]);
    expect(r.values).toEqual([
      [10, undefined, 30, undefined],
      [undefined, null, 33, 44],
    ]);
  });
  it("handles no series", () => expect(alignSeries([])).toEqual({ t: [], values: [] }));
});

describe("convertValues", () => {
  it("converts numbers and keeps gaps", () => {
    expect(convertValues([1, null, undefined, 2], (v) => v * 10)).toEqual([10, null, undefined, 20]);
  });
});
