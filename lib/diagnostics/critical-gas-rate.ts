// Adapter to lib/gaslift/liquid-loading.ts: the Turner critical (minimum unloading)
// gas rate of a well's tubing at its wellhead flowing pressure and temperature.
// The liquid (water or condensate field form) is chosen by lib/gaslift.
import type { WellDesign } from "@/lib/gaslift/types";
import { criticalRateMscfd, loadingLiquidFor } from "@/lib/gaslift/liquid-loading";
import { gasZ } from "@/lib/gaslift/gas-properties";
import { ATM_PSI } from "@/lib/units/units";

/** Turner critical gas rate at the wellhead, Mscf/d, for tubing pressure `tubingPsig`. */
export function computeCriticalGasRate(design: WellDesign, tubingPsig: number): number {
  const pressurePsia = Math.max(tubingPsig, 0) + ATM_PSI;
  const tempF = design.surfaceTempF;
  const z = gasZ({ pPsia: pressurePsia, tF: tempF, sg: design.gasSg });
  return criticalRateMscfd({
    pressurePsia,
    tempF,
    z,
    tubingIdIn: design.tubingIdIn,
    liquid: loadingLiquidFor(design.liquidType, design.waterCut),
    model: "turner",
  });
}

/** Memoized critical rate per 5-psi step of tubing pressure: the rules ask for it bin by bin. */
export function createCriticalRateLookup(design: WellDesign): (tubingPsig: number) => number {
  const cache = new Map<number, number>();
  return (tubingPsig: number) => {
    const key = Math.round(tubingPsig / 5) * 5;
    let v = cache.get(key);
    if (v === undefined) {
      v = computeCriticalGasRate(design, key);
      cache.set(key, v);
    }
    return v;
  };
}
