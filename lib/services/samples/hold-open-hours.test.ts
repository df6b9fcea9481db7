import { describe, expect, it } from "vitest";
import type { ValueColumns } from "@/lib/ingest/value-buffer";
import { OpenHourHolder } from "./hold-open-hours";

const H = 3_600_000;
const M = 60_000;
const T0 = Date.UTC(2026, 2, 1, 6); // a whole UTC hour

const batch = (rows: [number, number, number, number][]): ValueColumns<number> => ({
  length: rows.length,
  wellId: rows.map((r) => r[0]),
  signal: Uint8Array.from(rows.map((r) => r[1])),
  t: Float64Array.from(rows.map((r) => r[2])),
  v: Float64Array.from(rows.map((r) => r[3])),
});
const rowsOf = (b: ValueColumns<number>) => Array.from({ length: b.length }, (_, i) => [b.wellId[i], b.signal[i], b.t[i], b.v[i]]);

describe("OpenHourHolder", () => {
  it("releases each series' earlier hours and holds its latest hour until a later one comes", () => {
    const h = new OpenHourHolder();
    const first = h.next(batch([
      [1, 1, T0, 1], [1, 1, T0 + H, 2], [1, 1, T0 + H + M, 3],
      [2, 1, T0 + 5 * M, 4],
    ]));
    expect(rowsOf(first.ready)).toEqual([[1, 1, T0, 1]]);
    const second = h.next(batch([[1, 1, T0 + H + 2 * M, 5], [1, 1, T0 + 2 * H, 6], [2, 1, T0 + 6 * M, 7]]));
    expect(rowsOf(second.ready)).toEqual([[1, 1, T0 + H, 2], [1, 1, T0 + H + M, 3], [1, 1, T0 + H + 2 * M, 5]]);
    expect(rowsOf(h.flush())).toEqual([[1, 1, T0 + 2 * H, 6], [2, 1, T0 + 5 * M, 4], [2, 1, T0 + 6 * M, 7]]);
    expect(h.flush().length).toBe(0);
  });

  it("lets a later batch's value of the same time win, counted as a duplicate", () => {
    const h = new OpenHourHolder();
    h.next(batch([[1, 1, T0, 1]]));
    const r = h.next(batch([[1, 1, T0, 9], [1, 1, T0 + H, 2]]));
    expect(r.duplicates).toBe(1);
    expect(rowsOf(r.ready)).toEqual([[1, 1, T0, 9]]);
  });

  it("loses and adds nothing over a whole file (every value out once, in key order per release)", () => {
    const h = new OpenHourHolder();
    const all: number[][] = [];
    let n = 0;
    for (let b = 0; b < 5; b++) {
      const rows: [number, number, number, number][] = [];
      for (let w = 1; w <= 3; w++) for (let m = 0; m < 50; m++) rows.push([w, 2, T0 + (b * 50 + m) * M, n++]);
      all.push(...rowsOf(h.next(batch(rows)).ready));
    }
    all.push(...rowsOf(h.flush()));
    expect(all.length).toBe(n);
    expect(new Set(all.map((r) => `${r[0]}:${r[2]}`)).size).toBe(n);
  });
});
