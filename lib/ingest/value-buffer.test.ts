import { describe, expect, it } from "vitest";
import { ValueBuffer } from "./value-buffer";

describe("ValueBuffer", () => {
  it("keeps the last value per (series, t), grows past its first size, and resets on take", () => {
    const b = new ValueBuffer<number>();
    for (let i = 0; i < 3000; i++) expect(b.add(0, 12, 1, i, i)).toBe(true);
    expect(b.add(0, 12, 1, 5, -1)).toBe(false);
    expect(b.add(1, 12, 2, 5, 7)).toBe(true); // another series at the same t is not a duplicate
    const out = b.take();
    expect(out.length).toBe(3001);
    expect(out.v[5]).toBe(-1);
    expect(out.signal[3000]).toBe(2);
    expect(b.take().length).toBe(0);
    expect(b.add(0, 12, 1, 5, 1)).toBe(true); // a new batch forgets the old keys
  });
});
