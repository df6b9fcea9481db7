// Heading: the physics (periodic TP/gas swings, CP smaller and lagged) is DOMAIN.md §4;
// the detection thresholds are Bellows' own documented defaults (settings.heading).
import { describe, expect, it } from "vitest";
import { detectHeading } from "@/lib/diagnostics/rules/heading";
import { makeSteadySeries, makeTestDesign, toInput } from "@/lib/diagnostics/make-test-series";

function withSine(periodMin: number, amplitude: number) {
  const s = makeSteadySeries(3);
  const from = 1440, to = 1440 + 720;
  for (let i = from; i < to; i++) {
    const w = Math.sin((2 * Math.PI * (i - from)) / periodMin);
    s.tubing[i] *= 1 + amplitude * w;
    s.gas[i] *= 1 + 0.8 * amplitude * w;
    s.casing[i] += 2 * Math.sin((2 * Math.PI * (i - from)) / periodMin - Math.PI / 2);
  }
  return { s, from, to };
}

describe("heading rule", () => {
  it.each([{ period: 45 }, { period: 90 }])("a $period-min sine in tubing pressure (20 %) is heading with that period", ({ period }) => {
    const { s, from, to } = withSine(period, 0.2);
    const f = detectHeading(toInput(s, makeTestDesign()));
    expect(f).toHaveLength(1);
    const periodEvidence = f[0].evidence.find((e) => e.label === "Dominant period")!;
    expect(Math.abs(periodEvidence.value - period)).toBeLessThanOrEqual(10);
    expect(Math.abs(f[0].start - s.t[from]) / 60_000).toBeLessThan(60);
    expect(Math.abs((f[0].end as number) - s.t[to]) / 60_000).toBeLessThan(90);
  });
  it("a steady well, or a small swing (2 %), is not heading", () => {
    expect(detectHeading(toInput(makeSteadySeries(3), makeTestDesign()))).toEqual([]);
    expect(detectHeading(toInput(withSine(60, 0.02).s, makeTestDesign()))).toEqual([]);
  });
  it("a one-off tubing-pressure step is not heading (no oscillation in the autocorrelation)", () => {
    const s = makeSteadySeries(3);
    for (let i = 2000; i < s.t.length; i++) s.tubing[i] += 60;
    expect(detectHeading(toInput(s, makeTestDesign()))).toEqual([]);
  });
});
