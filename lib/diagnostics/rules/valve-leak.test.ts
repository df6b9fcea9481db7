// Valve stuck open / leaking: a step drop in casing pressure that stays, injection
// not down (DOMAIN.md §4). Thresholds are Bellows' own documented defaults.
import { describe, expect, it } from "vitest";
import { detectValveLeak } from "@/lib/diagnostics/rules/valve-leak";
import { addStep, makeSteadySeries, makeTestDesign, scaleRange, toInput } from "@/lib/diagnostics/make-test-series";

describe("valve leak rule", () => {
  it("a 60-psi step drop that stays, with injection up 8 %, is a leak from the step on", () => {
    const s = makeSteadySeries(5);
    const at = 3 * 1440;
    addStep(s.casing, at, -60, 8);
    scaleRange(s.injection, at, 1.08);
    scaleRange(s.liquid, at, 0.7);
    const f = detectValveLeak(toInput(s, makeTestDesign()));
    expect(f).toHaveLength(1);
    expect(Math.abs(f[0].start - s.t[at]) / 60_000).toBeLessThanOrEqual(20);
    expect(f[0].end).toBeNull();
    expect(f[0].productionAtRisk.unit).toBe("bbl/d");
    expect(f[0].productionAtRisk.value).toBeGreaterThan(90);
  });
  it.each([
    { name: "injection cut 20 % (a supply or setpoint change)", injection: 0.8, drop: -60 },
    { name: "a 20-psi dip (one kick-off transfer's size, common practice 10–25 psi)", injection: 1, drop: -20 },
  ])("no leak: $name", ({ injection, drop }) => {
    const s = makeSteadySeries(5);
    addStep(s.casing, 3 * 1440, drop, 8);
    scaleRange(s.injection, 3 * 1440, injection);
    expect(detectValveLeak(toInput(s, makeTestDesign()))).toEqual([]);
  });
  it("casing pressure coming back down from a high (after multipointing) is not a leak", () => {
    const s = makeSteadySeries(5);
    addStep(s.casing, 2 * 1440, 50, 30, 3 * 1440);
    expect(detectValveLeak(toInput(s, makeTestDesign()))).toEqual([]);
  });
});
