import { describe, expect, it } from "vitest";
import {
  criticalRateMscfd, criticalVelocity, FIELD_LIQUID, fieldCriticalVelocity, fieldGasDensity, flowAreaFt2,
  gasRateAtVelocityMmscfd, loadingLiquidFor, loadingRatio,
} from "./liquid-loading";

describe("liquid loading check values (DOMAIN.md §3)", () => {
  // [computed] Worked example: 400 psia, 120 °F, Z 0.9, 1.995" ID. Turner (water) gives
  // v_c 13.6 ft/s and q_c 0.694 MMscf/d; Coleman (water) 0.578 MMscf/d. We compute
  // 0.6931 for Turner: the bound is the example's rounding, 0.3 %.
  const example = { pressurePsia: 400, tempF: 120, z: 0.9, tubingIdIn: 1.995, liquid: "water" } as const;

  it("Turner critical velocity with water is 13.6 ft/s [computed]", () => {
    expect(fieldCriticalVelocity(400, "water")).toBeCloseTo(13.6, 1);
  });

  it.each([
    ["turner", 694],
    ["coleman", 578],
  ] as const)("%s critical rate is ≈%s Mscf/d [computed]", (model, expected) => {
    const q = criticalRateMscfd({ ...example, model });
    expect(Math.abs(q - expected) / expected).toBeLessThanOrEqual(0.003);
  });

  // [memory] Lea et al., Gas Well Deliquification, 2nd ed., from memory: field constants
  // 5.321 (water) and 4.043 (condensate) equal 1.912·σ^¼ at σ 60 and 20 dyn/cm.
  it.each([
    ["water", 5.321, 67],
    ["condensate", 4.043, 45],
  ] as const)("the general Turner form reproduces the %s field form (Lea et al., from memory)", (liquid, c, rhoL) => {
    for (const p of [100, 400, 1000]) {
      const field = (c * (rhoL - 0.0031 * p) ** 0.25) / Math.sqrt(0.0031 * p);
      expect(fieldCriticalVelocity(p, liquid)).toBeCloseTo(field, 2);
    }
  });

  // [published] Turner (JPT 1969) with the 20 % adjustment is 1.912; Coleman (JPT 1991)
  // is 1.593 without it: the ratio is 1.2.
  it("Turner is Coleman plus 20 % [published]", () => {
    const props = { surfaceTensionDynCm: 60, liquidDensityLbmFt3: 67, gasDensityLbmFt3: 1.5 };
    const ratio = criticalVelocity({ ...props, model: "turner" }) / criticalVelocity({ ...props, model: "coleman" });
    expect(ratio).toBeCloseTo(1.912 / 1.593, 12);
    expect(ratio).toBeCloseTo(1.2, 2);
  });
});

describe("liquid loading behaviour", () => {
  it("gas rate is linear in velocity and in area", () => {
    const area = flowAreaFt2(2.441);
    expect(gasRateAtVelocityMmscfd(20, 500, 100, 0.9, area)).toBeCloseTo(2 * gasRateAtVelocityMmscfd(10, 500, 100, 0.9, area), 12);
    expect(flowAreaFt2(1.995)).toBeCloseTo(0.021708, 6);
  });

  it("critical velocity falls and critical rate rises with pressure", () => {
    expect(fieldCriticalVelocity(800, "water")).toBeLessThan(fieldCriticalVelocity(200, "water"));
    const q = (p: number) => criticalRateMscfd({ pressurePsia: p, tempF: 120, z: 0.9, tubingIdIn: 2.441, liquid: "water" });
    expect(q(800)).toBeGreaterThan(q(200));
  });

  it("water needs more gas than condensate", () => {
    expect(fieldCriticalVelocity(400, "water")).toBeGreaterThan(fieldCriticalVelocity(400, "condensate"));
  });

  it("loading ratio below 1 means below the critical rate", () => {
    expect(loadingRatio(500, 694)).toBeLessThan(1);
    expect(() => loadingRatio(500, 0)).toThrow(RangeError);
  });

  it("rejects liquid no denser than the gas", () => {
    expect(() => criticalVelocity({ surfaceTensionDynCm: 20, liquidDensityLbmFt3: 5, gasDensityLbmFt3: fieldGasDensity(2000) })).toThrow(RangeError);
    expect(FIELD_LIQUID.water.densityLbmFt3).toBe(67);
  });

  it.each([
    ["water", 0, "water"],
    ["oil", 0.3, "water"],
    ["condensate", 0.01, "water"],
    ["condensate", 0, "condensate"],
    ["oil", 0, "condensate"],
  ] as const)("a %s well at water cut %s loads by the %s form", (liquidType, waterCut, expected) => {
    expect(loadingLiquidFor(liquidType, waterCut)).toBe(expected);
  });
});
