// Over-injection: more gas buys no more liquid and casing pressure rises (DOMAIN.md §4).
// Thresholds (rise ≥ 20 %, elasticity < 0.1) are Bellows' own documented defaults.
import { describe, expect, it } from "vitest";
import { detectOverInjection } from "@/lib/diagnostics/rules/over-injection";
import { addStep, makeSteadySeries, makeTestDesign, scaleRange, toInput } from "@/lib/diagnostics/make-test-series";

describe("over-injection rule", () => {
  it("injection +45 % with flat liquid is over-injection; production at risk is the wasted gas", () => {
    const s = makeSteadySeries(4);
    const at = 2 * 1440;
    scaleRange(s.injection, at, 1.45);
    addStep(s.casing, at, 25, 30);
    const f = detectOverInjection(toInput(s, makeTestDesign()));
    expect(f).toHaveLength(1);
    expect(Math.abs(f[0].start - s.t[at]) / 60_000).toBeLessThanOrEqual(20);
    expect(f[0].productionAtRisk.unit).toBe("Mscf/d");
    expect(f[0].productionAtRisk.value).toBeGreaterThan(250);
  });
  it("injection +45 % that lifts 15 % more liquid is a good change, not over-injection", () => {
    const s = makeSteadySeries(4);
    scaleRange(s.injection, 2 * 1440, 1.45);
    scaleRange(s.liquid, 2 * 1440 + 30, 1.15);
    expect(detectOverInjection(toInput(s, makeTestDesign()))).toEqual([]);
  });
});
