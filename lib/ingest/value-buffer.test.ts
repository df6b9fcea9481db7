import { describe, expect, it } from "vitest";
import { ValueBuffer } from "./value-buffer";

const rowsOf = (b: ReturnType<ValueBuffer<number>["take"]>) =>
  Array.from({ length: b.length }, (_, i) => [b.wellId[i], b.signal[i], b.t[i], b.v[i]]);

describe("ValueBuffer", () => {
  it("keeps the last value per (series, t), grows past its first size, and resets on take", () => {
    const b = new ValueBuffer<number>();
    for (let i = 0; i < 3000; i++) b.add(0, 12, 1, i, i);
    b.add(0, 12, 1, 5, -1);
    b.add(1, 12, 2, 5, 7); // another series at the same t is not a duplicate
    const out = b.take();
    expect(out.length).toBe(3001);
    expect(out.duplicates).toBe(1);
    expect(out.v[5]).toBe(-1);
    expect(out.signal[3000]).toBe(2);
    expect(b.take().length).toBe(0);
    b.add(0, 12, 1, 5, 1); // a new batch forgets the old keys
    expect(b.take().duplicates).toBe(0);
  });

  it("orders by (well, signal, t) whatever the order values came in, last value of a key wins", () => {
    const b = new ValueBuffer<number>();
    // series ids are the caller's: 0 = (9, 1), 1 = (3, 2), 2 = (3, 1)
    b.add(0, 9, 1, 20, 1);
    b.add(1, 3, 2, 10, 2);
    b.add(0, 9, 1, 10, 3);
    b.add(2, 3, 1, 30, 4);
    b.add(0, 9, 1, 20, 5); // repeats (9, 1, 20): replaces 1
    b.add(2, 3, 1, 5, 6);
    b.add(2, 3, 1, 30, 7); // repeats (3, 1, 30): replaces 4
    const out = b.take();
    expect(rowsOf(out)).toEqual([
      [3, 1, 5, 6], [3, 1, 30, 7],
      [3, 2, 10, 2],
      [9, 1, 10, 3], [9, 1, 20, 5],
    ]);
    expect(out.duplicates).toBe(2);
  });
});
