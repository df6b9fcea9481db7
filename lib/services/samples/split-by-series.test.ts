import { describe, expect, it } from "vitest";
import type { ValueColumns } from "@/lib/ingest/value-buffer";
import { partOfSeries, splitBySeries } from "./split-by-series";

const batch = (rows: [number, number, number, number][]) => ({
  length: rows.length,
  wellId: rows.map((r) => r[0]),
  signal: Uint8Array.from(rows.map((r) => r[1])),
  t: Float64Array.from(rows.map((r) => r[2])),
  v: Float64Array.from(rows.map((r) => r[3])),
});
const rowsOf = (b: ValueColumns<number>) => Array.from({ length: b.length }, (_, i) => [b.wellId[i], b.signal[i], b.t[i], b.v[i]]);

describe("splitBySeries", () => {
  const rows: [number, number, number, number][] = [];
  for (let w = 1; w <= 7; w++) for (let s = 1; s <= 5; s++) for (let t = 0; t < 3; t++) rows.push([w, s, t, w * 100 + s * 10 + t]);

  it("keeps every value once, each series whole in one part, in the input order", () => {
    const parts = splitBySeries(batch(rows), 3);
    expect(parts.reduce((n, p) => n + p.length, 0)).toBe(rows.length);
    const seen = new Map<string, number>();
    parts.forEach((p, k) => {
      const got = rowsOf(p);
      expect(got).toEqual([...got].sort((a, b) => a[0] - b[0] || a[1] - b[1] || a[2] - b[2]));
      for (const [w, s] of got) {
        const key = `${w}:${s}`;
        expect(seen.get(key) ?? k).toBe(k);
        seen.set(key, k);
        expect(partOfSeries(w, s, 3)).toBe(k);
      }
    });
    expect(seen.size).toBe(35);
  });

  it("spreads series over the parts", () => {
    const sizes = splitBySeries(batch(rows), 2).map((p) => p.length);
    expect(Math.min(...sizes)).toBeGreaterThan(rows.length / 4);
  });

  it("returns the batch itself for one part", () => {
    const b = batch(rows);
    expect(splitBySeries(b, 1)[0]).toBe(b);
  });
});
