// Frac hit: abrupt tubing-pressure rise, formation gas lost, recovery later
// (DOMAIN.md §1, §4). Thresholds are Bellows' own documented defaults.
import { describe, expect, it } from "vitest";
import { detectFracHit } from "@/lib/diagnostics/rules/frac-hit";
import { addStep, makeSteadySeries, makeTestDesign, toInput } from "@/lib/diagnostics/make-test-series";

describe("frac hit rule", () => {
  it("tubing pressure +120 psi for 20 h, then back: one frac hit with an end", () => {
    const s = makeSteadySeries(4);
    const at = 1.5 * 1440, back = at + 20 * 60;
    addStep(s.tubing, at, 120, 8, back);
    for (let i = at; i < back; i++) s.gas[i] -= 140;
    const f = detectFracHit(toInput(s, makeTestDesign()));
    expect(f).toHaveLength(1);
    expect(Math.abs(f[0].start - s.t[at]) / 60_000).toBeLessThanOrEqual(20);
    expect(Math.abs((f[0].end as number) - s.t[back]) / 60_000).toBeLessThanOrEqual(60);
    expect(f[0].evidence.some((e) => e.label === "Formation gas lost" && e.value > 100)).toBe(true);
  });
  it("a 20-psi rise is not a frac hit", () => {
    const s = makeSteadySeries(4);
    addStep(s.tubing, 1.5 * 1440, 20, 8);
    expect(detectFracHit(toInput(s, makeTestDesign()))).toEqual([]);
  });
});
