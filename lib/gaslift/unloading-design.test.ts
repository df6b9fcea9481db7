import { describe, expect, it } from "vitest";
import type { WellDesign } from "./types";
import { designUnloadingString } from "./unloading-design";
import { inferOperatingPoint, valveSurfacePressures, valveTemperature } from "./operating-point";
import { gasColumnPressurePsig } from "./gas-column";

// Invented demo well: no real well or place.
const design: Omit<WellDesign, "mandrels"> = {
  tubingIdIn: 2.441,
  tubingDepthFt: 7600,
  perfDepthFt: 7800,
  surfaceTempF: 80,
  bottomholeTempF: 190,
  gasSg: 0.65,
  liquidType: "oil",
  liquidGravity: 38,
  waterCut: 0.5,
  reservoirPressurePsig: 2200,
  injectionPressurePsig: 1100,
};

describe("unloading string design (spacing and settings are common practice; figures are regression values)", () => {
  it.each([
    [1000, 100, 20],
    [1100, 150, 25],
    [800, 80, 15],
    [1300, 120, 20],
  ])("kick-off %s psig, wellhead %s psig, %s psi steps", (kickoffPsig, wellheadPsig, stepPsi) => {
    const mandrels = designUnloadingString({ design, kickoffPsig, wellheadPsig, stepPsi });
    const well = { ...design, mandrels };
    const ipos = mandrels.filter((m) => m.kind === "ipo");
    const last = mandrels.at(-1)!;

    // Numbered from the top, deeper each time, at least 300 ft apart, orifice last.
    expect(mandrels.map((m) => m.position)).toEqual(mandrels.map((_, i) => i + 1));
    for (let i = 1; i < mandrels.length; i++) expect(mandrels[i].tvdFt - mandrels[i - 1].tvdFt).toBeGreaterThanOrEqual(300);
    expect(last.kind).toBe("orifice");
    expect(last.tvdFt).toBeLessThanOrEqual(design.tubingDepthFt - 100);
    expect(ipos.length).toBeGreaterThanOrEqual(2);

    // The top valve sits where kick-off casing pressure at depth balances the load fluid.
    const top = ipos[0];
    const casingAtTop = gasColumnPressurePsig({
      surfacePsig: kickoffPsig, sg: design.gasSg, depthFt: top.tvdFt,
      surfaceTempF: design.surfaceTempF, depthTempF: valveTemperature(design, top.tvdFt),
    });
    expect(Math.abs(casingAtTop - (wellheadPsig + 0.465 * top.tvdFt))).toBeLessThan(1);

    // Surface opening pressures step down by stepPsi from one step below kick-off.
    const surface = valveSurfacePressures(well, wellheadPsig);
    ipos.forEach((_, i) => expect(surface[i].surfaceOpeningPsig!).toBeCloseTo(kickoffPsig - (i + 1) * stepPsi, 6));

    // At the intended operating casing pressure only the orifice passes gas.
    const operatingCasingPsig = kickoffPsig - (ipos.length + 1) * stepPsi;
    const point = inferOperatingPoint(well, { casingPsig: operatingCasingPsig, tubingPsig: wellheadPsig });
    expect(point.openPositions).toEqual([last.position]);
    // With the stated 100 psi across the orifice.
    const o = point.valves.at(-1)!;
    expect(o.casingAtDepthPsig - o.tubingAtDepthPsig).toBeGreaterThanOrEqual(99);
  });

  it("respects the valve count", () => {
    const mandrels = designUnloadingString({ design, kickoffPsig: 1300, wellheadPsig: 120, count: 2 });
    expect(mandrels.filter((m) => m.kind === "ipo")).toHaveLength(2);
  });

  it("rejects a kick-off pressure no higher than the wellhead pressure", () => {
    expect(() => designUnloadingString({ design, kickoffPsig: 90, wellheadPsig: 100 })).toThrow(RangeError);
  });
});
