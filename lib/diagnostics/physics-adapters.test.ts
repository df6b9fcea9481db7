// The rules read valve levels and critical rates through small adapters; these
// checks pin the adapters to lib/gaslift so the rules never drift from the physics.
import { describe, expect, it } from "vitest";
import { computeValveLevels, findLowestClosingPsig, findNearestUnloadingValve } from "@/lib/diagnostics/valve-levels";
import { computeCriticalGasRate } from "@/lib/diagnostics/critical-gas-rate";
import { makeTestDesign } from "@/lib/diagnostics/make-test-series";
import { inferOperatingPoint, valveSurfacePressures } from "@/lib/gaslift/operating-point";
import { criticalRateMscfd } from "@/lib/gaslift/liquid-loading";
import { gasZ } from "@/lib/gaslift/gas-properties";
import { DEFAULT_SETTINGS } from "@/lib/diagnostics/settings";

const design = makeTestDesign();
const gradient = { tubingGradientPsiPerFt: DEFAULT_SETTINGS.general.tubingGradientPsiPerFt };

describe("valve levels match lib/gaslift", () => {
  it("surface opening and closing pressures equal valveSurfacePressures", () => {
    const ours = computeValveLevels(design, 160);
    const theirs = valveSurfacePressures(design, 160, gradient);
    expect(ours.valves.map((v) => [v.position, v.surfaceOpeningPsig, v.surfaceClosingPsig])).toEqual(
      theirs.map((v) => [v.position, v.surfaceOpeningPsig, v.surfaceClosingPsig]),
    );
  });
  it("port capacity and open points equal inferOperatingPoint", () => {
    const ours = computeValveLevels(design, 160, 1040, 700);
    const op = inferOperatingPoint(design, { casingPsig: 1040, tubingPsig: 160, injectionMscfd: 700 }, gradient);
    expect(ours.operatingPoint?.portCapacityMscfd).toBe(op.portCapacityMscfd);
    expect(ours.operatingPoint?.openPositions).toEqual(op.openPositions);
    expect(ours.operating?.position).toBe(6);
  });
  it("surface closing pressures fall valve by valve down the string (common practice: each set lower)", () => {
    const closing = computeValveLevels(design, 160).unloading.map((v) => v.surfaceClosingPsig as number);
    for (let k = 1; k < closing.length; k++) expect(closing[k]).toBeLessThan(closing[k - 1]);
    expect(findLowestClosingPsig(computeValveLevels(design, 160))).toBe(closing[closing.length - 1]);
    expect(findNearestUnloadingValve(computeValveLevels(design, 160), closing[1] + 1)?.position).toBe(2);
  });
  it("an unusable design gives no levels instead of throwing", () => {
    const broken = { ...design, mandrels: [{ ...design.mandrels[0], tropsig: null, rRatio: null, valveOdIn: null }] };
    expect(computeValveLevels(broken, 160).unloading).toEqual([]);
  });
});

describe("critical gas rate matches lib/gaslift (Turner et al. 1969 field form)", () => {
  it("equals criticalRateMscfd at the wellhead with water (water cut > 0)", () => {
    const pPsia = 160 + 14.7;
    const want = criticalRateMscfd({ pressurePsia: pPsia, tempF: design.surfaceTempF, z: gasZ({ pPsia, tF: design.surfaceTempF, sg: design.gasSg }), tubingIdIn: 1.995, liquid: "water" });
    expect(computeCriticalGasRate(design, 160)).toBeCloseTo(want, 9);
  });
  it("rises with tubing pressure (denser gas needs less velocity but carries more mass; rate grows ~√p)", () => {
    expect(computeCriticalGasRate(design, 300)).toBeGreaterThan(computeCriticalGasRate(design, 100));
  });
});
