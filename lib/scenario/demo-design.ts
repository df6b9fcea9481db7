// An invented, physically consistent gas-lift well for synthetic data: valve
// string, operating casing pressure, rates. Valve set pressures come from
// lib/gaslift (gas column, nitrogen dome, IPO force balance); the levels the
// generator draws from are read back through the same valve table the rules use,
// so data and rules agree on the physics.
//
// Design choices (common practice, DOMAIN.md §1): lib/gaslift's designUnloadingString
// spaces the valves and sets each one's surface opening pressure `stepPsi` (15–25)
// below the one above; the well operates on a bottom orifice with casing pressure held below the lowest unloading valve's
// surface closing pressure, so every unloading valve stays shut in steady flow.
import type { Mandrel, WellDesign } from "@/lib/gaslift/types";
import { designUnloadingString } from "@/lib/gaslift/unloading-design";
import { DEFAULT_SETTINGS } from "@/lib/diagnostics/settings";
import { computeValveLevels, findLowestClosingPsig, type WellValveLevels } from "@/lib/diagnostics/valve-levels";
import { computeCriticalGasRate } from "@/lib/diagnostics/critical-gas-rate";
import type { Rng } from "@/lib/scenario/prng";

export interface DemoWell {
  design: WellDesign;
  levels: WellValveLevels;
  /** Steady casing pressure on the orifice, psig. */
  casingPsig: number;
  tubingPsig: number;
  injectionMscfd: number;
  liquidBbld: number;
  /** Formation gas at the baseline liquid rate, Mscf/d. */
  formationGasMscfd: number;
  criticalGasMscfd: number;
  /** Lowest unloading-valve surface closing pressure, psig. */
  lowestClosingPsig: number;
  /** Surface opening pressure of each unloading valve, top first, psig. */
  openingPsig: number[];
  closingPsig: number[];
  stepPsi: number;
}

/** Invent a well and its valve string. */
export function designDemoWell(rng: Rng): DemoWell {
  const perfDepthFt = Math.round(rng.uniform(7200, 9800) / 10) * 10;
  const tubingPsig = Math.round(rng.uniform(110, 230));
  const base: WellDesign = {
    tubingIdIn: rng.chance(0.75) ? 1.995 : 2.441,
    tubingDepthFt: perfDepthFt - 120,
    perfDepthFt,
    surfaceTempF: Math.round(rng.uniform(75, 100)),
    bottomholeTempF: Math.round(rng.uniform(175, 215)),
    gasSg: Math.round(rng.uniform(0.64, 0.74) * 100) / 100,
    liquidType: "oil",
    liquidGravity: Math.round(rng.uniform(30, 42)),
    waterCut: Math.round(rng.uniform(0.3, 0.8) * 100) / 100,
    reservoirPressurePsig: Math.round(rng.uniform(1900, 2800)),
    injectionPressurePsig: Math.round(rng.uniform(1150, 1230)),
    mandrels: [],
  };
  const stepPsi = Math.round(rng.uniform(15, 25));
  // The valve string comes from lib/gaslift's designer, on the same tubing design line the rules use.
  const designed = designUnloadingString({
    design: base,
    kickoffPsig: base.injectionPressurePsig - Math.round(rng.uniform(20, 40)),
    wellheadPsig: tubingPsig,
    stepPsi,
    count: rng.int(4, 6),
    valvePortIn: rng.pick([3 / 16, 1 / 4]),
    tubingGradientPsiPerFt: DEFAULT_SETTINGS.general.tubingGradientPsiPerFt,
  });
  const mandrels = designed.filter((m) => m.kind === "ipo");
  const orificeDepth = designed.find((m) => m.kind === "orifice")?.tvdFt ?? base.tubingDepthFt - 150;
  const unloadingOnly: WellDesign = { ...base, mandrels };
  const probe = computeValveLevels(unloadingOnly, tubingPsig);
  const lowestClosingPsig = findLowestClosingPsig(probe) ?? base.injectionPressurePsig - 150;
  const casingPsig = Math.round(lowestClosingPsig - rng.uniform(48, 65));
  const criticalGasMscfd = computeCriticalGasRate(base, tubingPsig);
  const liquidBbld = Math.round(rng.uniform(150, 750));
  const formationGasMscfd = Math.round(liquidBbld * rng.uniform(0.2, 0.5));
  // Enough gas to stay well clear of loading even after a 25 % setpoint cut.
  const wanted = Math.max(rng.uniform(380, 1050), 1.7 * criticalGasMscfd - formationGasMscfd);
  const injectionMscfd = Math.round(Math.min(1200, Math.max(320, wanted)));
  // The smallest orifice that passes the design rate with 10 % to spare at the operating casing pressure.
  let design: WellDesign = unloadingOnly;
  let levels = probe;
  for (const sixtyFourths of [10, 12, 14, 16, 18, 20, 22, 24, 28, 32]) {
    const orifice: Mandrel = { position: mandrels.length + 1, mdFt: orificeDepth, tvdFt: orificeDepth, kind: "orifice", portIn: sixtyFourths / 64, valveOdIn: null, rRatio: null, tropsig: null };
    design = { ...base, mandrels: [...mandrels, orifice] };
    levels = computeValveLevels(design, tubingPsig, casingPsig);
    if ((levels.operating?.maxPortRateMscfd ?? 0) >= injectionMscfd / 0.9) break;
  }
  return {
    design,
    levels,
    casingPsig,
    tubingPsig,
    injectionMscfd,
    liquidBbld,
    formationGasMscfd,
    criticalGasMscfd,
    lowestClosingPsig,
    openingPsig: levels.unloading.map((v) => v.surfaceOpeningPsig ?? NaN),
    closingPsig: levels.unloading.map((v) => v.surfaceClosingPsig ?? NaN),
    stepPsi,
  };
}

/**
 * Operating point for a design someone else made (e.g. from the valve designer):
 * casing pressure held below the lowest unloading valve's closing pressure, tubing
 * pressure and rates invented within the ranges of designDemoWell.
 */
export function adoptDesign(design: WellDesign, rng: Rng): DemoWell {
  const tubingPsig = Math.round(rng.uniform(110, 230));
  const probe = computeValveLevels(design, tubingPsig);
  const lowestClosingPsig = findLowestClosingPsig(probe) ?? design.injectionPressurePsig - 150;
  const casingPsig = Math.round(lowestClosingPsig - rng.uniform(48, 65));
  const levels = computeValveLevels(design, tubingPsig, casingPsig);
  const criticalGasMscfd = computeCriticalGasRate(design, tubingPsig);
  const liquidBbld = Math.round(rng.uniform(150, 750));
  const formationGasMscfd = Math.round(liquidBbld * rng.uniform(0.2, 0.5));
  const wanted = Math.max(rng.uniform(380, 1050), 1.5 * criticalGasMscfd - formationGasMscfd);
  const injectionMscfd = Math.round(Math.min(1200, Math.max(320, wanted)));
  const steps = levels.unloading.slice(1).map((v, k) => (levels.unloading[k].surfaceOpeningPsig ?? 0) - (v.surfaceOpeningPsig ?? 0));
  return {
    design, levels, casingPsig, tubingPsig, injectionMscfd, liquidBbld, formationGasMscfd, criticalGasMscfd, lowestClosingPsig,
    openingPsig: levels.unloading.map((v) => v.surfaceOpeningPsig ?? NaN),
    closingPsig: levels.unloading.map((v) => v.surfaceClosingPsig ?? NaN),
    stepPsi: steps.length ? steps.reduce((a, b) => a + b, 0) / steps.length : 20,
  };
}
