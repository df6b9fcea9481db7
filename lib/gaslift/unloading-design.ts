// A plausible unloading valve string for a well, for demo and test data: IPO unloading
// valves spaced down the tubing and an orifice at the bottom.
//
//   designUnloadingString({ design, kickoffPsig, wellheadPsig?, stepPsi?, count?, ... }) → Mandrel[]
//
// `design` is a WellDesign without mandrels; the result goes into `mandrels`. Every
// option has a default, listed in UnloadingStringInput. Mandrels are numbered 1 (top)
// down, MD = TVD (a vertical well).
//
// Method (a simplified form of the usual IPO spacing; API RP 11V6 describes the full one):
// - Top valve: the deepest point where the kick-off casing pressure, carried down the
//   gas column, still balances the static load fluid standing from the wellhead:
//   P_c(D) = P_wh + G_s·D.
// - Next valves: while valve i unloads, the tubing at D_i is at the design flowing line
//   P_wh + g_f·D_i and load fluid stands below it at G_s; valve i+1 goes where the
//   casing pressure at its own (lower) surface opening pressure balances that:
//   P_c(D) = P_wh + g_f·D_i + G_s·(D − D_i). Using the lower pressure is conservative.
// - Spacing is at least `minSpacingFt`; valves stop at `count` or 100 ft above the end
//   of tubing.
// - The orifice is the operating point. It goes where, at a casing pressure one more
//   step below the last valve's opening pressure, casing at depth still exceeds the
//   design tubing line by `injectionDifferentialPsi` (common practice: about 100 psi
//   across the operating point), no deeper than `orificeDepthFt`. Valves that would sit
//   within `minSpacingFt` of it are dropped, which raises that casing pressure again.
// - Surface opening pressures step down `stepPsi` per valve, starting `stepPsi` below
//   the kick-off pressure (DOMAIN.md §1, common practice: 10–25 psi). Each valve's
//   test-rack opening pressure is set so it opens at that surface pressure against the
//   design tubing line, so `valveSurfacePressures(design, wellheadPsig,
//   { tubingGradientPsiPerFt: same g_f })` gives the steps back exactly.
// - The string's intended operating casing pressure is then
//   kickoffPsig − (number of IPO valves + 1)·stepPsi: every unloading valve closed
//   (as long as the spreads stay under one step, true for the default 1.5-in valves
//   with 3/16" ports) and gas through the orifice.
import type { Mandrel, WellDesign } from "@/lib/gaslift/types";
import type { ZMethod } from "@/lib/gaslift/gas-properties";
import { gasColumnPressurePsig } from "@/lib/gaslift/gas-column";
import type { DomeOptions } from "@/lib/gaslift/dome-temperature";
import { rFromPort, troForSurfaceOpening, type ValveOdIn } from "@/lib/gaslift/valve";
import { DEFAULT_TUBING_GRADIENT_PSI_PER_FT, valveTemperature } from "@/lib/gaslift/operating-point";

/** Static gradient of a brine load fluid, psi/ft (common practice: 0.433 fresh water, ~0.465 brine). */
export const DEFAULT_LOAD_FLUID_GRADIENT_PSI_PER_FT = 0.465;

export interface UnloadingStringInput {
  design: Omit<WellDesign, "mandrels">;
  /** Surface casing pressure available to kick the well off, psig. */
  kickoffPsig: number;
  /** Tubing pressure at surface while unloading, psig. Default 100. */
  wellheadPsig?: number;
  /** Drop in surface opening pressure from one valve to the next, psi. Default 20. */
  stepPsi?: number;
  /** Most unloading valves to place. Default 8. */
  count?: number;
  /** Unloading valve port, in. Default 3/16. */
  valvePortIn?: number;
  /** Unloading valve OD, in. Default 1.5. */
  valveOdIn?: ValveOdIn;
  /** Orifice port, in. Default 16/64. */
  orificePortIn?: number;
  /** Deepest orifice TVD, ft. Default 100 ft above the end of tubing. */
  orificeDepthFt?: number;
  /** Casing minus tubing pressure wanted across the orifice in operation, psi. Default 100. */
  injectionDifferentialPsi?: number;
  /** Static load-fluid gradient, psi/ft. Default 0.465. */
  loadFluidGradientPsiPerFt?: number;
  /** Design flowing tubing gradient, psi/ft. Default 0.15 (as operating-point.ts). */
  tubingGradientPsiPerFt?: number;
  /** Least distance between mandrels, ft. Default 300. */
  minSpacingFt?: number;
  dome?: DomeOptions;
  method?: ZMethod;
}

export function designUnloadingString(input: UnloadingStringInput): Mandrel[] {
  const { design, kickoffPsig } = input;
  const wellheadPsig = input.wellheadPsig ?? 100;
  const stepPsi = input.stepPsi ?? 20;
  const count = input.count ?? 8;
  const valvePortIn = input.valvePortIn ?? 3 / 16;
  const valveOdIn = input.valveOdIn ?? 1.5;
  const orificePortIn = input.orificePortIn ?? 16 / 64;
  const deepestOrificeFt = input.orificeDepthFt ?? design.tubingDepthFt - 100;
  const injectionDifferentialPsi = input.injectionDifferentialPsi ?? 100;
  const gs = input.loadFluidGradientPsiPerFt ?? DEFAULT_LOAD_FLUID_GRADIENT_PSI_PER_FT;
  const gf = input.tubingGradientPsiPerFt ?? DEFAULT_TUBING_GRADIENT_PSI_PER_FT;
  const minSpacingFt = input.minSpacingFt ?? 300;
  if (!(kickoffPsig > wellheadPsig)) throw new RangeError(`kick-off pressure (${kickoffPsig}) must exceed wellhead pressure (${wellheadPsig})`);
  if (!(deepestOrificeFt > 0)) throw new RangeError(`orifice depth must be > 0 ft, got ${deepestOrificeFt}`);

  const casingAt = (surfacePsig: number, depthFt: number) =>
    gasColumnPressurePsig({
      surfacePsig,
      sg: design.gasSg,
      depthFt,
      surfaceTempF: design.surfaceTempF,
      depthTempF: valveTemperature(design, depthFt),
      method: input.method,
    });
  const r = rFromPort(valvePortIn, valveOdIn);
  const lowestValveFt = deepestOrificeFt - minSpacingFt;

  const mandrels: Mandrel[] = [];
  let depthFt = Math.floor(balanceDepth((d) => casingAt(kickoffPsig, d) - (wellheadPsig + gs * d), 0, lowestValveFt));
  let surfaceOpeningPsig = kickoffPsig - stepPsi;
  while (mandrels.length < count && depthFt <= lowestValveFt) {
    mandrels.push({
      position: mandrels.length + 1,
      mdFt: depthFt,
      tvdFt: depthFt,
      kind: "ipo",
      portIn: valvePortIn,
      valveOdIn,
      rRatio: r,
      tropsig: troForSurfaceOpening(surfaceOpeningPsig, {
        r,
        depthFt,
        valveTempF: valveTemperature(design, depthFt),
        surfaceTempF: design.surfaceTempF,
        sg: design.gasSg,
        tubingAtValvePsig: wellheadPsig + gf * depthFt,
        dome: input.dome,
        method: input.method,
      }),
    });
    const upperFt = depthFt;
    const nextOpeningPsig = surfaceOpeningPsig - stepPsi;
    const tubingAtUpper = wellheadPsig + gf * upperFt;
    const next = balanceDepth(
      (d) => casingAt(nextOpeningPsig, d) - (tubingAtUpper + gs * (d - upperFt)),
      upperFt,
      deepestOrificeFt,
    );
    depthFt = Math.floor(Math.max(next, upperFt + minSpacingFt));
    surfaceOpeningPsig = nextOpeningPsig;
  }

  // Place the orifice; drop valves from the bottom until it sits below them.
  let orificeFt = 0;
  for (;;) {
    const operatingCasingPsig = kickoffPsig - (mandrels.length + 1) * stepPsi;
    orificeFt = Math.floor(balanceDepth(
      (d) => casingAt(operatingCasingPsig, d) - injectionDifferentialPsi - (wellheadPsig + gf * d),
      0,
      deepestOrificeFt,
    ));
    const last = mandrels.at(-1);
    if (last === undefined || last.tvdFt <= orificeFt - minSpacingFt) break;
    mandrels.pop();
  }
  mandrels.push({
    position: mandrels.length + 1,
    mdFt: orificeFt,
    tvdFt: orificeFt,
    kind: "orifice",
    portIn: orificePortIn,
    valveOdIn: null,
    rRatio: null,
    tropsig: null,
  });
  return mandrels;
}

/**
 * Depth in [lo, hi] where `excess` (casing minus fluid column, falling with depth)
 * crosses zero; `hi` when the casing still wins at `hi`, `lo` when it already loses at `lo`.
 */
function balanceDepth(excess: (depthFt: number) => number, lo: number, hi: number): number {
  if (hi <= lo || excess(lo) <= 0) return lo;
  if (excess(hi) >= 0) return hi;
  let a = lo;
  let b = hi;
  for (let i = 0; i < 60 && b - a > 0.01; i++) {
    const mid = (a + b) / 2;
    if (excess(mid) > 0) a = mid;
    else b = mid;
  }
  return a;
}
