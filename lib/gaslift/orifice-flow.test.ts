import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { criticalPressureRatio, isCriticalFlow, thornhillCraver } from "./orifice-flow";

describe("Thornhill–Craver check values (DOMAIN.md §3)", () => {
  // [published] PressureDrop.jl tests quoting Hernandez, Fundamentals of Gas Lift Engineering
  // (2016) §8.1: 850 → 420 psia, 150 °F, γg 0.7; chokes 28, 32, 40, 48 /64" give
  // 3.15, 4.11, 6.36, 9.39 MMscf/d, ±2 % (the source's Cd differ slightly).
  it.each([
    [28, 3150],
    [32, 4110],
    [40, 6360],
    [48, 9390],
  ])("Hernandez §8.1: %s/64 in gives ≈%s Mscf/d [published]", (s64, expected) => {
    const q = thornhillCraver({ p1Psia: 850, p2Psia: 420, tF: 150, portIn: s64 / 64, sg: 0.7 });
    expect(Math.abs(q - expected) / expected).toBeLessThanOrEqual(0.02);
  });

  // [published] PressureDrop.jl: 1,114.7 → 914.7 psia, 140 °F, 16/64" gives ≈1,127 Mscf/d.
  // (DOMAIN.md quotes no tolerance; PressureDrop.jl's own is ±1 on its simplified form.)
  // That test is of its simplified form (γ 0.65 with Z folded into one constant, 2946);
  // the full form with a computed Z lands 1.2 % higher, so the bound here is 2 %.
  it("PressureDrop.jl 16/64 in case, full form within 2 % of the simplified form's 1,127 [published]", () => {
    const q = thornhillCraver({ p1Psia: 1114.7, p2Psia: 914.7, tF: 140, portIn: 0.25, sg: 0.65 });
    expect(Math.abs(q - 1127) / 1127).toBeLessThanOrEqual(0.02);
  });

  // [published] DOMAIN.md: r_c about 0.55 for k 1.27.
  it("critical pressure ratio is about 0.55 for k 1.27 [published]", () => {
    expect(criticalPressureRatio()).toBeCloseTo(0.55, 2);
  });
});

describe("Thornhill–Craver behaviour", () => {
  const base = { tF: 150, portIn: 0.25, sg: 0.7 };

  it("passes nothing without a forward pressure drop (the check valve holds)", () => {
    expect(thornhillCraver({ ...base, p1Psia: 1100, p2Psia: 1200 })).toBe(0);
    expect(thornhillCraver({ ...base, p1Psia: 1100, p2Psia: 1100 })).toBe(0);
  });

  it("does not depend on downstream pressure in critical flow", () => {
    const a = thornhillCraver({ ...base, p1Psia: 1000, p2Psia: 100 });
    const b = thornhillCraver({ ...base, p1Psia: 1000, p2Psia: 500 });
    expect(a).toBeCloseTo(b, 9);
    expect(isCriticalFlow(1000, 500)).toBe(true);
    expect(isCriticalFlow(1000, 600)).toBe(false);
  });

  it("grows with upstream pressure and port size and falls with downstream pressure", () => {
    fc.assert(fc.property(
      fc.double({ min: 200, max: 2000, noNaN: true }),
      fc.double({ min: 0.6, max: 0.98, noNaN: true }),
      (p1, ratio) => {
        const q = thornhillCraver({ ...base, p1Psia: p1, p2Psia: p1 * ratio });
        return (
          q > 0 &&
          thornhillCraver({ ...base, p1Psia: p1 * 1.01, p2Psia: p1 * ratio }) > q &&
          thornhillCraver({ ...base, portIn: 0.3, p1Psia: p1, p2Psia: p1 * ratio }) > q &&
          thornhillCraver({ ...base, p1Psia: p1, p2Psia: Math.min(p1 * ratio * 1.01, p1) }) <= q
        );
      },
    ));
  });

  // Why Z is computed by default: with Z = 1 the Hernandez 48/64 case misses by > 2 %.
  it("with Z forced to 1 the Hernandez case falls outside ±2 % (so Z is computed by default)", () => {
    const q = thornhillCraver({ p1Psia: 850, p2Psia: 420, tF: 150, portIn: 48 / 64, sg: 0.7, z: 1 });
    expect(Math.abs(q - 9390) / 9390).toBeGreaterThan(0.02);
  });

  it("scales with port area (square of the diameter)", () => {
    const q1 = thornhillCraver({ ...base, p1Psia: 1000, p2Psia: 700 });
    const q2 = thornhillCraver({ ...base, portIn: 0.5, p1Psia: 1000, p2Psia: 700 });
    expect(q2 / q1).toBeCloseTo(4, 9);
  });
});
