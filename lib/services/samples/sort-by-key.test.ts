import { describe, expect, it } from "vitest";
import { isSortedByKey, sortByKey } from "./sort-by-key";

const batch = (rows: [number, number, number, number][]) => ({
  length: rows.length,
  wellId: rows.map((r) => r[0]),
  signal: Uint8Array.from(rows.map((r) => r[1])),
  t: Float64Array.from(rows.map((r) => r[2])),
  v: Float64Array.from(rows.map((r) => r[3])),
});

describe("sortByKey", () => {
  it.each([
    ["time-major file order", [[2, 1, 10, 1], [1, 1, 10, 2], [2, 1, 20, 3], [1, 1, 20, 4]]],
    ["a series out of time order", [[1, 2, 30, 1], [1, 2, 10, 2], [1, 1, 20, 3]]],
    ["already sorted", [[1, 1, 1, 1], [1, 2, 1, 2], [3, 1, 1, 3]]],
  ] as const)("orders rows by (well, signal, t) and keeps each value with its key: %s", (_name, rows) => {
    const out = sortByKey(batch(rows.map((r) => [...r] as [number, number, number, number])));
    const got = Array.from({ length: out.length }, (_, i) => [out.wellId[i], out.signal[i], out.t[i], out.v[i]]);
    const want = [...rows].map((r) => [...r]).sort((a, b) => a[0] - b[0] || a[1] - b[1] || a[2] - b[2]);
    expect(got).toEqual(want);
  });
});

describe("isSortedByKey", () => {
  it.each([
    ["sorted", [[1, 1, 1, 0], [1, 1, 2, 0], [1, 2, 0, 0], [2, 1, 0, 0]], true],
    ["empty", [], true],
    ["time goes back inside a series", [[1, 1, 2, 0], [1, 1, 1, 0]], false],
    ["a repeated key", [[1, 1, 2, 0], [1, 1, 2, 5]], false],
    ["signals out of order", [[1, 2, 0, 0], [1, 1, 5, 0]], false],
    ["wells out of order", [[2, 1, 0, 0], [1, 1, 5, 0]], false],
  ] as const)("%s", (_name, rows, want) => {
    expect(isSortedByKey(batch(rows.map((r) => [...r] as [number, number, number, number])))).toBe(want);
  });
});
