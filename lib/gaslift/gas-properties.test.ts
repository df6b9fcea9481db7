import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { gasDensity, gasZ, suttonPseudoCritical, zFactorDak as zDak, zFactorHallYarborough as zHallYarborough } from "./gas-properties";

describe("Z factor check values (DOMAIN.md §3)", () => {
  it.each([
    // [computed] from the published DAK / H-Y equations; matches pyResToolbox to 1e-7.
    ["DAK at Tpr 1.5, Ppr 2.0 [computed, matches pyResToolbox]", () => zDak(1.5, 2.0), 0.8215, 5e-5],
    ["Hall–Yarborough at Tpr 1.5, Ppr 2.0 [computed]", () => zHallYarborough(1.5, 2.0), 0.8208, 5e-5],
    // [memory] Standing–Katz chart reading, from memory: a chart is read to about ±0.01.
    ["DAK against the Standing–Katz chart, from memory", () => zDak(1.5, 2.0), 0.82, 0.01],
    ["Hall–Yarborough against the Standing–Katz chart, from memory", () => zHallYarborough(1.5, 2.0), 0.82, 0.01],
  ])("%s", (_label, f, expected, tol) => {
    expect(Math.abs(f() - expected)).toBeLessThanOrEqual(tol);
  });

  // [published] pyResToolbox documentation: gas_z(p=2350 psia, sg=0.68, 180 °F, DAK) = 0.87854.
  // pyResToolbox's pseudo-critical method is not Sutton's, which we use, so the same DAK
  // lands ~1.2 % lower here; the bound says the two stay within 1.5 %.
  it("pyResToolbox's published 2350 psia / 0.68 / 180 °F case agrees within 1.5 % (different pseudo-criticals)", () => {
    const z = gasZ({ pPsia: 2350, tF: 180, sg: 0.68, method: "dak" });
    expect(Math.abs(z - 0.87854) / 0.87854).toBeLessThanOrEqual(0.015);
  });

  // [published] Sutton (1985) SPE 14265 correlations evaluated at γ 0.65: direct arithmetic.
  it("Sutton pseudo-criticals at γ 0.65 [computed from the published formula]", () => {
    const { tpcR, ppcPsia } = suttonPseudoCritical(0.65);
    expect(tpcR).toBeCloseTo(169.2 + 349.5 * 0.65 - 74.0 * 0.65 ** 2, 10);
    expect(tpcR).toBeCloseTo(365.1, 1);
    expect(ppcPsia).toBeCloseTo(670.1, 1);
  });
});

describe("Z factor behaviour", () => {
  it("tends to 1 as pressure tends to 0 (ideal-gas limit)", () => {
    expect(zDak(1.5, 0)).toBe(1);
    expect(zHallYarborough(1.5, 0)).toBe(1);
    expect(zDak(1.5, 1e-4)).toBeCloseTo(1, 4);
    expect(zHallYarborough(1.5, 1e-4)).toBeCloseTo(1, 4);
  });

  it("DAK and Hall–Yarborough agree within 2 % over injection-gas conditions", () => {
    fc.assert(
      fc.property(fc.double({ min: 1.3, max: 2.5, noNaN: true }), fc.double({ min: 0.2, max: 5, noNaN: true }), (tpr, ppr) => {
        const a = zDak(tpr, ppr);
        const b = zHallYarborough(tpr, ppr);
        return Math.abs(a - b) / a < 0.02;
      }),
    );
  });

  it("DAK stays finite and physical over its published range", () => {
    fc.assert(
      fc.property(fc.double({ min: 1.05, max: 3, noNaN: true }), fc.double({ min: 0.2, max: 15, noNaN: true }), (tpr, ppr) => {
        const z = zDak(tpr, ppr);
        return z > 0.2 && z < 2 && Number.isFinite(z);
      }),
    );
  });

  it("rejects impossible inputs", () => {
    expect(() => gasZ({ pPsia: -1, tF: 100, sg: 0.65 })).toThrow(RangeError);
    expect(() => gasZ({ pPsia: 500, tF: 100, sg: 0.2 })).toThrow(RangeError);
    expect(() => zDak(0, 1)).toThrow(RangeError);
  });

  // [computed] Real-gas law with Z = 1: air (γ 1) at 14.696 psia and 60 °F is
  // 28.9625·14.696/(10.7316·519.67) = 0.07632 lbm/ft³, the familiar 0.0763 of air tables.
  it("gas density of air at standard conditions is 0.0763 lbm/ft³ [computed]", () => {
    expect(Math.abs(gasDensity(14.696, 60, 1, 1) - 0.0763)).toBeLessThan(1e-4);
  });
});
