// Liquid loading: produced gas below the Turner critical rate (Turner et al., JPT
// 1969, via lib/gaslift) with liquid falling (DOMAIN.md §4). Thresholds are ours.
import { describe, expect, it } from "vitest";
import { detectLiquidLoading } from "@/lib/diagnostics/rules/liquid-loading";
import { makeSteadySeries, makeTestDesign, scaleRange, toInput } from "@/lib/diagnostics/make-test-series";
import { computeCriticalGasRate } from "@/lib/diagnostics/critical-gas-rate";

const design = makeTestDesign();
const qc = computeCriticalGasRate(design, 160);

describe("liquid loading rule", () => {
  it("gas at 60 % of the critical rate with liquid down 40 % is loading", () => {
    const s = makeSteadySeries(4);
    const at = 2 * 1440;
    scaleRange(s.gas, at, (0.6 * qc) / 850);
    scaleRange(s.injection, at, (0.5 * qc) / 700);
    scaleRange(s.liquid, at, 0.6);
    const f = detectLiquidLoading(toInput(s, design));
    expect(f).toHaveLength(1);
    expect(Math.abs(f[0].start - s.t[at]) / 60_000).toBeLessThanOrEqual(90);
    expect(f[0].evidence[0].value).toBeLessThan(1);
  });
  it("gas above the critical rate is not loading even with liquid down", () => {
    const s = makeSteadySeries(4);
    scaleRange(s.liquid, 2 * 1440, 0.6);
    expect(detectLiquidLoading(toInput(s, design))).toEqual([]);
  });
});
