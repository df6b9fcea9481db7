import { describe, expect, it } from "vitest";
import type { Mandrel, WellDesign } from "./types";
import { inferOperatingPoint, sortedMandrels, valveSurfacePressures } from "./operating-point";
import { thornhillCraver } from "./orifice-flow";

const baseDesign: WellDesign = {
  tubingIdIn: 2.441,
  tubingDepthFt: 6100,
  perfDepthFt: 6000,
  surfaceTempF: 80,
  bottomholeTempF: 180,
  gasSg: 0.65,
  liquidType: "oil",
  liquidGravity: 38,
  waterCut: 0.5,
  reservoirPressurePsig: 1800,
  injectionPressurePsig: 1100,
  mandrels: [],
};

function ipo(position: number, tvdFt: number, tropsig: number | null, extra: Partial<Mandrel> = {}): Mandrel {
  return { position, mdFt: tvdFt, tvdFt, kind: "ipo", portIn: 0.25, valveOdIn: 1.5, rRatio: null, tropsig, ...extra };
}

function orifice(position: number, tvdFt: number, portIn: number | null = 16 / 64): Mandrel {
  return { position, mdFt: tvdFt, tvdFt, kind: "orifice", portIn, valveOdIn: null, rRatio: null, tropsig: null };
}

describe("operating point: DOMAIN.md worked design, gauge basis [computed]", () => {
  // Valve at 6,000 ft, 80 °F at surface and 180 °F there, γg 0.65, 1.5-in valve with a
  // 1/4" port, P_t 600 psig at the valve (surface 600 psig, zero gradient), real-gas C_t:
  // P_tro 942.9 psig opens at 1,000 psig at surface (P_vo 1,152.4, P_vc 1,117.2 at depth).
  const design = { ...baseDesign, mandrels: [ipo(1, 6000, 942.9)] };
  const options = { tubingGradientPsiPerFt: 0 };

  it("gives the worked design's pressures", () => {
    const [v] = inferOperatingPoint(design, { casingPsig: 1000, tubingPsig: 600 }, options).valves;
    expect(v.r).toBeCloseTo(0.0637, 4);
    expect(v.isREstimated).toBe(true);
    expect(v.valveTempF).toBeCloseTo(180, 9);
    expect(v.tubingAtDepthPsig).toBe(600);
    expect(Math.abs(v.casingAtDepthPsig - 1152.4)).toBeLessThanOrEqual(0.1);
    expect(Math.abs(v.openingAtDepthPsig! - 1152.4)).toBeLessThanOrEqual(0.15);
    expect(Math.abs(v.closingAtDepthPsig! - 1117.2)).toBeLessThanOrEqual(0.15);
    expect(Math.abs(v.surfaceOpeningPsig! - 1000)).toBeLessThanOrEqual(0.15);
  });

  it.each([
    [1010, "open", true],
    [990, "throttling", true],
    [950, "closed", false],
  ] as const)("at %s psig casing the valve reads %s", (casingPsig, condition, canBeOpen) => {
    const point = inferOperatingPoint(design, { casingPsig, tubingPsig: 600 }, options);
    expect(point.valves[0].condition).toBe(condition);
    expect(point.valves[0].canBeOpen).toBe(canBeOpen);
    expect(point.operatingPosition).toBe(canBeOpen ? 1 : null);
  });
});

describe("operating point of a string", () => {
  // Three unloading valves with surface opening pressures 25 psi apart (common practice,
  // DOMAIN.md §1) and an orifice. The test-rack pressures are regression values: set
  // once with troForSurfaceOpening for 1,000 / 975 / 950 psig against a tubing line of
  // 150 psig + 0.1 psi/ft, 1.5-in valves with 3/16" ports.
  const options = { tubingGradientPsiPerFt: 0.1 };
  const mandrels: Mandrel[] = [
    orifice(4, 5900, 12 / 64),
    ipo(3, 5200, 891.1, { portIn: 3 / 16 }),
    ipo(1, 2500, 950.4, { portIn: 3 / 16 }),
    ipo(2, 4000, 919.7, { portIn: 3 / 16 }),
  ];
  const design = { ...baseDesign, mandrels };
  const surface = valveSurfacePressures(design, 150, options);

  it("lists mandrels top first and gives their surface pressures (regression values)", () => {
    expect(surface.map((v) => v.position)).toEqual([1, 2, 3, 4]);
    [1000, 975, 950].forEach((pso, i) => expect(Math.abs(surface[i].surfaceOpeningPsig! - pso)).toBeLessThan(0.1));
    expect(surface[3].surfaceOpeningPsig).toBeNull();
    expect(surface[3].kind).toBe("orifice");
    for (const v of surface.slice(0, 3)) expect(v.surfaceClosingPsig!).toBeLessThan(v.surfaceOpeningPsig!);
  });

  it("reads gas through the orifice alone when casing is below every closing pressure", () => {
    const casingPsig = Math.min(...surface.slice(0, 3).map((v) => v.surfaceClosingPsig!)) - 5;
    const point = inferOperatingPoint(design, { casingPsig, tubingPsig: 150 }, options);
    expect(point.valves.map((v) => v.condition)).toEqual(["closed", "closed", "closed", "open"]);
    expect(point.operatingPosition).toBe(4);
    expect(point.openPositions).toEqual([4]);
    const orificeState = point.valves[3];
    expect(point.portCapacityMscfd).toBeCloseTo(
      thornhillCraver({
        p1Psia: orificeState.casingAtDepthPsig + 14.7,
        p2Psia: orificeState.tubingAtDepthPsig + 14.7,
        tF: orificeState.valveTempF,
        sg: 0.65,
        portIn: 12 / 64,
      }),
      9,
    );
    expect(point.notes).toEqual([]);
  });

  it("shows more than one open point when casing sits between valve 2's closing and opening pressures", () => {
    const casingPsig = (surface[1].surfaceClosingPsig! + surface[1].surfaceOpeningPsig!) / 2;
    const point = inferOperatingPoint(design, { casingPsig, tubingPsig: 150 }, options);
    expect(point.valves.map((v) => v.condition)).toEqual(["closed", "throttling", "open", "open"]);
    expect(point.openPositions).toEqual([2, 3, 4]);
    expect(point.operatingPosition).toBe(4);
    expect(point.notes[0]).toMatch(/3 points can pass gas/);
  });

  it("flags an injection rate one port could not pass, and not one it could", () => {
    const casingPsig = surface[2].surfaceClosingPsig! - 5;
    const capacity = inferOperatingPoint(design, { casingPsig, tubingPsig: 150 }, options).portCapacityMscfd!;
    const above = inferOperatingPoint(design, { casingPsig, tubingPsig: 150, injectionMscfd: capacity * 1.5 }, options);
    const within = inferOperatingPoint(design, { casingPsig, tubingPsig: 150, injectionMscfd: capacity * 0.8 }, options);
    const unknown = inferOperatingPoint(design, { casingPsig, tubingPsig: 150 }, options);
    expect(above.isRateAbovePortCapacity).toBe(true);
    expect(within.isRateAbovePortCapacity).toBe(false);
    expect(unknown.isRateAbovePortCapacity).toBeNull();
    // The tolerance is tunable: at 1.6 the 1.5× rate is accepted.
    expect(inferOperatingPoint(design, { casingPsig, tubingPsig: 150, injectionMscfd: capacity * 1.5 }, { ...options, rateTolerance: 1.6 }).isRateAbovePortCapacity).toBe(false);
  });

  it("holds every check valve when casing cannot beat tubing at depth", () => {
    const point = inferOperatingPoint(design, { casingPsig: 100, tubingPsig: 150 }, options);
    expect(point.valves.every((v) => !v.canBeOpen)).toBe(true);
    expect(point.operatingPosition).toBeNull();
    expect(point.portCapacityMscfd).toBeNull();
    expect(point.notes).toContain("no valve can pass gas at this casing pressure");
  });

  it("uses the default 0.1 psi/ft tubing gradient when none is given (our assumption)", () => {
    const point = inferOperatingPoint(design, { casingPsig: 900, tubingPsig: 150 });
    expect(point.valves[0].tubingAtDepthPsig).toBeCloseTo(150 + 0.1 * 2500, 9);
  });
});

describe("operating point with missing data", () => {
  it("says why a figure is missing instead of failing", () => {
    const design: WellDesign = {
      ...baseDesign,
      mandrels: [
        ipo(1, 2000, null),
        ipo(2, 3000, 950, { valveOdIn: null }),
        { position: 3, mdFt: 4000, tvdFt: 4000, kind: "dummy", portIn: null, valveOdIn: null, rRatio: null, tropsig: null },
        ipo(4, 5000, 900, { rRatio: 0.064 }),
        orifice(5, 5800, null),
      ],
    };
    const point = inferOperatingPoint(design, { casingPsig: 1000, tubingPsig: 100 }, { tubingGradientPsiPerFt: 0.1 });
    const [v1, v2, v3, v4, v5] = point.valves;
    expect(v1.notes).toContain("no test-rack opening pressure on file");
    expect(v1.surfaceClosingPsig).toBeNull();
    expect(v1.canBeOpen).toBe(false);
    expect(v2.notes[0]).toMatch(/no R on file/);
    expect(v3.condition).toBe("no-valve");
    expect(v4.isREstimated).toBe(false);
    expect(v4.surfaceClosingPsig).not.toBeNull();
    expect(v5.canBeOpen).toBe(true);
    expect(point.operatingPosition).toBe(5);
    expect(point.portCapacityMscfd).toBeNull();
    expect(point.notes).toContain("no port size for position 5");
  });

  it("copes with a design without mandrels", () => {
    const point = inferOperatingPoint(baseDesign, { casingPsig: 1000, tubingPsig: 100 });
    expect(point.valves).toEqual([]);
    expect(point.operatingPosition).toBeNull();
    expect(point.notes).toEqual(["the design has no mandrels"]);
  });

  it("sorts mandrels by depth", () => {
    expect(sortedMandrels({ mandrels: [orifice(2, 5000), ipo(1, 2000, 900)] }).map((m) => m.position)).toEqual([1, 2]);
  });
});
