import { describe, expect, it } from "vitest";
import { createRng, deriveSeed } from "@/lib/scenario/prng";
import { mean, standardDeviation } from "simple-statistics";

describe("seeded PRNG", () => {
  it("repeats for the same seed and differs for another", () => {
    const a = createRng(7), b = createRng(7), c = createRng(8);
    const xs = [a.next(), a.next(), a.next()];
    expect([b.next(), b.next(), b.next()]).toEqual(xs);
    expect(c.next()).not.toBe(xs[0]);
  });

  it("normal deviates have mean ≈ 0 and sd ≈ 1 (regression value on 20,000 draws)", () => {
    const r = createRng(1);
    const xs = Array.from({ length: 20000 }, () => r.normal());
    expect(Math.abs(mean(xs))).toBeLessThan(0.03);
    expect(standardDeviation(xs)).toBeCloseTo(1, 1);
  });

  it("derived seeds differ per label", () => {
    expect(deriveSeed(1, "a")).not.toBe(deriveSeed(1, "b"));
  });
});
