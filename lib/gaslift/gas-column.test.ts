import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  gasColumnPressure, gasColumnPressurePsig, gasColumnRuleOfThumb, surfacePressureForDepth, surfacePressureForDepthPsig,
} from "./gas-column";
import { gasZ } from "./gas-properties";

describe("static gas column check values (DOMAIN.md §3)", () => {
  it.each([
    // [published] PressureDrop.jl test suite (casing calcs): 300 psia, γ 0.7, 4,500 ft,
    // 100→180 °F gives ≈332.7 psia, ±1 psi. (That code uses another Z correlation.)
    ["PressureDrop.jl casing case, DAK [published]", 300, 0.7, 4500, 100, 180, "dak", 332.7, 1],
    ["PressureDrop.jl casing case, Hall–Yarborough [published]", 300, 0.7, 4500, 100, 180, "hall-yarborough", 332.7, 1],
    // [computed from the published formula] 1,000 psia, γ 0.65, 8,000 ft, 100→200 °F gives 1,194.5 psia.
    ["1,000 psia, 8,000 ft [computed]", 1000, 0.65, 8000, 100, 200, "dak", 1194.5, 0.1],
    // [computed from the published formula] DOMAIN.md worked valve design: 1,000 psig at
    // surface, 6,000 ft, 80→180 °F gives 1,152.4 psig at depth.
    ["worked design, 1,014.7 psia to 6,000 ft [computed]", 1014.7, 0.65, 6000, 80, 180, "dak", 1152.4 + 14.7, 0.1],
  ] as const)("%s", (_label, surfacePsia, sg, depthFt, surfaceTempF, depthTempF, method, expected, tol) => {
    const p = gasColumnPressure({ surfacePsia, sg, depthFt, surfaceTempF, depthTempF, method });
    expect(Math.abs(p - expected)).toBeLessThanOrEqual(tol);
  });

  // [computed] DOMAIN.md: Z̄ ≈ 0.90 for the 8,000 ft case.
  it("the 8,000 ft case settles at Z̄ ≈ 0.90 [computed]", () => {
    const bottom = gasColumnPressure({ surfacePsia: 1000, sg: 0.65, depthFt: 8000, surfaceTempF: 100, depthTempF: 200 });
    expect(gasZ({ pPsia: (1000 + bottom) / 2, tF: 150, sg: 0.65 })).toBeCloseTo(0.9, 2);
  });

  it("the psig form is the psia form shifted by 14.7 psi [computed]", () => {
    const p = gasColumnPressurePsig({ surfacePsig: 1000, sg: 0.65, depthFt: 6000, surfaceTempF: 80, depthTempF: 180 });
    expect(Math.abs(p - 1152.4)).toBeLessThanOrEqual(0.1);
  });

  // [published] Hand rule P_D ≈ P_s(1 + D/40,000). A rule of thumb, so the bound is ours:
  // the full calculation stays within 3 % of it at ordinary injection pressures and depths.
  it.each([
    [500, 4000], [1000, 6000], [1200, 9000], [800, 3000],
  ])("stays within 3 %% of the hand rule at %s psia, %s ft [published rule of thumb]", (surfacePsia, depthFt) => {
    const p = gasColumnPressure({ surfacePsia, sg: 0.65, depthFt, surfaceTempF: 80, depthTempF: 80 + depthFt * 0.015 });
    const rule = gasColumnRuleOfThumb(surfacePsia, depthFt);
    expect(Math.abs(p - rule) / rule).toBeLessThanOrEqual(0.03);
  });
});

describe("gas column behaviour", () => {
  const base = { sg: 0.7, surfaceTempF: 90, depthTempF: 190 } as const;

  it("adds nothing over zero depth", () => {
    expect(gasColumnPressure({ ...base, surfacePsia: 900, depthFt: 0 })).toBe(900);
  });

  it("surface and depth pressures invert each other", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 50, max: 2500, noNaN: true }),
        fc.double({ min: 0, max: 12000, noNaN: true }),
        fc.integer({ min: 1, max: 8 }),
        (surfacePsia, depthFt, segments) => {
          const column = { ...base, depthFt, segments };
          const back = surfacePressureForDepth({ ...column, depthPsia: gasColumnPressure({ ...column, surfacePsia }) });
          return Math.abs(back - surfacePsia) < 1e-4;
        },
      ),
    );
    const column = { ...base, depthFt: 5000 };
    const atDepth = gasColumnPressurePsig({ ...column, surfacePsig: 950 });
    expect(surfacePressureForDepthPsig({ ...column, depthPsig: atDepth })).toBeCloseTo(950, 6);
  });

  it("rises with depth, surface pressure and gas gravity", () => {
    fc.assert(
      fc.property(fc.double({ min: 100, max: 2000, noNaN: true }), fc.double({ min: 500, max: 10000, noNaN: true }), (surfacePsia, depthFt) => {
        const p = gasColumnPressure({ ...base, surfacePsia, depthFt });
        return (
          p > surfacePsia &&
          gasColumnPressure({ ...base, surfacePsia, depthFt: depthFt + 100 }) > p &&
          gasColumnPressure({ ...base, surfacePsia: surfacePsia + 10, depthFt }) > p &&
          gasColumnPressure({ ...base, sg: 0.8, surfacePsia, depthFt }) > p
        );
      }),
    );
  });

  it("converges as the column is split finer (20 vs 40 segments within 0.05 psi)", () => {
    const column = { surfacePsia: 1200, sg: 0.65, depthFt: 10000, surfaceTempF: 80, depthTempF: 230 };
    const a = gasColumnPressure({ ...column, segments: 20 });
    const b = gasColumnPressure({ ...column, segments: 40 });
    expect(Math.abs(a - b)).toBeLessThan(0.05);
  });

  it("rejects impossible inputs", () => {
    expect(() => gasColumnPressure({ ...base, surfacePsia: -5, depthFt: 1000 })).toThrow(RangeError);
    expect(() => gasColumnPressure({ ...base, surfacePsia: 500, depthFt: -1 })).toThrow(RangeError);
    expect(() => gasColumnPressure({ ...base, surfacePsia: 500, depthFt: 1000, segments: 0 })).toThrow(RangeError);
  });
});
