import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  BELLOWS_AREA_IN2, domeForOpeningPressure, domeFromTro, ipoValvePressures, isValveOpening, portArea, portFrom64ths,
  rFromPort, testRackOpening, troForSurfaceOpening, tubingEffectFactor, valveClosingPressure, valveOpeningPressure,
} from "./valve";
import { domeAt60 } from "./dome-temperature";

describe("bellows area ratio R (DOMAIN.md §3)", () => {
  // [published] PressureDrop.jl: bellows area 0.31 in² (1-in valve), 0.77 in² (1.5-in valve).
  it("uses PressureDrop.jl's bellows areas [published]", () => {
    expect(BELLOWS_AREA_IN2[1]).toBe(0.31);
    expect(BELLOWS_AREA_IN2[1.5]).toBe(0.77);
  });

  // [computed] Geometric R = (π d²/4)/A_b, no lapping allowance.
  it.each([
    [1, "1/8", 1 / 8, 0.04],
    [1, "3/16", 3 / 16, 0.089],
    [1, "1/4", 1 / 4, 0.158],
    [1.5, "3/16", 3 / 16, 0.036],
    [1.5, "1/4", 1 / 4, 0.064],
    [1.5, "3/8", 3 / 8, 0.143],
  ])("%s-in valve, %s in port [computed]", (od, _label, port, r) => {
    expect(Math.abs(rFromPort(port, od) - r)).toBeLessThanOrEqual(0.0006);
  });

  // [published] PressureDrop.jl: a lapped seat adds 0.006 in to the port diameter.
  it("a lapped seat adds 0.006 in to the port diameter [published]", () => {
    expect(rFromPort(0.25, 1.5, { lapped: true })).toBeCloseTo(portArea(0.256) / 0.77, 12);
  });

  it("reads port sizes in 64ths", () => {
    expect(portFrom64ths(16)).toBe(0.25);
    expect(portArea(0.25)).toBeCloseTo(0.0490874, 6);
  });

  it("rejects sizes it has no bellows area for, and impossible R", () => {
    expect(() => rFromPort(0.25, 1.25)).toThrow(RangeError);
    expect(() => tubingEffectFactor(1)).toThrow(RangeError);
    expect(() => valveOpeningPressure(1000, 500, -0.1)).toThrow(RangeError);
  });
});

describe("IPO valve force balance: DOMAIN.md worked design, gauge basis [computed]", () => {
  // Valve at 6,000 ft; surface opening 1,000 psig; γg 0.65; 80→180 °F; P_t 600 psig;
  // 1.5-in valve with a 1/4" port (R 0.0637). At depth P_vo = 1,152.4 psig (from the gas
  // column, gas-column.test.ts), P_d@180 = 1,117.2 psig, spread 35.2 psi;
  // P_tro = 969.4 psig with ideal C_t, 942.9 psig with real-gas C_t.
  const r = rFromPort(0.25, 1.5);
  const pvo = 1152.4;
  const pt = 600;

  it("R is 0.0637", () => expect(r).toBeCloseTo(0.0637, 4));

  it("dome at depth is 1,117.2 psig and the spread is 35.2 psi", () => {
    const pd = domeForOpeningPressure(pvo, pt, r);
    expect(Math.abs(pd - 1117.2)).toBeLessThanOrEqual(0.05);
    expect(Math.abs(pvo - valveClosingPressure(pd) - 35.2)).toBeLessThanOrEqual(0.05);
  });

  it.each([
    ["ideal", 969.4],
    ["real", 942.9],
  ] as const)("test-rack opening pressure with %s-gas C_t is %s psig", (gas, expected) => {
    const pd = domeForOpeningPressure(pvo, pt, r);
    const tro = testRackOpening(domeAt60(pd, 180, { basis: "gauge", method: gas }), r);
    expect(Math.abs(tro - expected)).toBeLessThanOrEqual(0.1);
  });
});

describe("IPO valve force balance behaviour", () => {
  const rArb = fc.double({ min: 0, max: 0.3, noNaN: true });
  const pArb = fc.double({ min: 100, max: 2000, noNaN: true });

  it("opening and dome pressure invert each other", () => {
    fc.assert(fc.property(pArb, pArb, rArb, (pvo, pt, r) =>
      Math.abs(valveOpeningPressure(domeForOpeningPressure(pvo, pt, r), pt, r) - pvo) < 1e-8));
  });

  it("opening pressure is at or above closing pressure while tubing is below the dome", () => {
    fc.assert(fc.property(pArb, rArb, fc.double({ min: 0, max: 1, noNaN: true }), (pd, r, frac) => {
      const pt = pd * frac;
      return valveOpeningPressure(pd, pt, r) >= valveClosingPressure(pd) - 1e-9;
    }));
  });

  it("opens exactly at the opening pressure", () => {
    fc.assert(fc.property(pArb, rArb, fc.double({ min: 0, max: 0.99, noNaN: true }), (pd, r, frac) => {
      const pt = pd * frac;
      const pvo = valveOpeningPressure(pd, pt, r);
      return isValveOpening(pvo + 1e-6, pt, pd, r) && !isValveOpening(pvo - 1e-3, pt, pd, r);
    }));
  });

  it("test-rack and dome-at-60 °F invert each other", () => {
    expect(testRackOpening(domeFromTro(950, 0.0637), 0.0637)).toBeCloseTo(950, 9);
  });

  // TEF = R/(1 − R) is the psi of opening pressure that one psi of tubing pressure takes off.
  it("tubing effect factor is the slope of opening pressure in tubing pressure", () => {
    const r = 0.089;
    const slope = valveOpeningPressure(1000, 500, r) - valveOpeningPressure(1000, 501, r);
    expect(slope).toBeCloseTo(tubingEffectFactor(r), 9);
  });
});

describe("IPO valve referred to surface: DOMAIN.md worked design, gauge basis [computed]", () => {
  // Same worked design: valve at 6,000 ft, 80 °F at surface and 180 °F at the valve,
  // γg 0.65, P_t 600 psig, R of a 1.5-in valve with a 1/4" port.
  const setting = {
    r: rFromPort(0.25, 1.5),
    depthFt: 6000,
    valveTempF: 180,
    surfaceTempF: 80,
    sg: 0.65,
    tubingAtValvePsig: 600,
  };

  it.each([
    ["ideal", 969.4],
    ["real", 942.9],
  ] as const)("P_tro %s-gas %s psig opens at 1,000 psig at surface, 1,152.4 psig at depth", (method, tro) => {
    const p = ipoValvePressures(tro, { ...setting, dome: { basis: "gauge", method } });
    expect(Math.abs(p.openingAtDepthPsig! - 1152.4)).toBeLessThanOrEqual(0.15);
    expect(Math.abs(p.closingAtDepthPsig - 1117.2)).toBeLessThanOrEqual(0.15);
    expect(Math.abs(p.spreadPsi! - 35.2)).toBeLessThanOrEqual(0.05);
    expect(Math.abs(p.surfaceOpeningPsig! - 1000)).toBeLessThanOrEqual(0.15);
    // The gas column is shorter in psi at the lower pressure, so the surface gap is a
    // little under the 35.2 psi spread at depth.
    const gap = p.surfaceOpeningPsig! - p.surfaceClosingPsig;
    expect(gap).toBeGreaterThan(30);
    expect(gap).toBeLessThan(35.2);
  });

  it.each([
    ["ideal", 969.4],
    ["real", 942.9],
  ] as const)("designing for 1,000 psig at surface gives P_tro %s-gas %s psig", (method, tro) => {
    expect(Math.abs(troForSurfaceOpening(1000, { ...setting, dome: { basis: "gauge", method } }) - tro)).toBeLessThanOrEqual(0.1);
  });

  it("has no opening pressure without a tubing pressure", () => {
    const p = ipoValvePressures(950, { ...setting, tubingAtValvePsig: null });
    expect(p.openingAtDepthPsig).toBeNull();
    expect(p.surfaceOpeningPsig).toBeNull();
    expect(p.surfaceClosingPsig).toBeLessThan(p.closingAtDepthPsig);
  });
});
