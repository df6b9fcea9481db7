// Data quality: flatlined tag, long gap, spikes and impossible values (DOMAIN.md §2, §4).
// Thresholds are Bellows' own documented defaults (settings.dataQuality).
import { describe, expect, it } from "vitest";
import { detectDataQuality } from "@/lib/diagnostics/rules/data-quality";
import { makeSteadySeries, makeTestDesign, toInput } from "@/lib/diagnostics/make-test-series";

describe("data quality rule", () => {
  it("a clean noisy well has no data findings", () => {
    expect(detectDataQuality(toInput(makeSteadySeries(2), makeTestDesign()))).toEqual([]);
  });
  it.each([
    { name: "tubing flatlined 6 h", edit: (s: ReturnType<typeof makeSteadySeries>) => s.tubing.fill(161.2, 600, 960), label: "Tubing pressure flatlined" },
    { name: "casing missing 3 h", edit: (s: ReturnType<typeof makeSteadySeries>) => s.casing.fill(NaN, 600, 780), label: "Casing pressure missing" },
    { name: "four impossible injection readings", edit: (s: ReturnType<typeof makeSteadySeries>) => [700, 760, 800, 900].forEach((i) => (s.injection[i] = i % 2 ? -50 : 6000)), label: "Injection rate spikes" },
  ])("$name", ({ edit, label }) => {
    const s = makeSteadySeries(2);
    edit(s);
    const f = detectDataQuality(toInput(s, makeTestDesign()));
    expect(f).toHaveLength(1);
    expect(f[0].evidence[0].label).toBe(label);
  });
  it("a rate at exactly zero for hours is a shut-in, not a flatline", () => {
    const s = makeSteadySeries(2);
    s.injection.fill(0, 600, 1200);
    expect(detectDataQuality(toInput(s, makeTestDesign()))).toEqual([]);
  });
  it("a step change is not a spike", () => {
    const s = makeSteadySeries(2);
    for (let i = 1000; i < s.t.length; i++) s.tubing[i] += 150;
    expect(detectDataQuality(toInput(s, makeTestDesign()))).toEqual([]);
  });
});
