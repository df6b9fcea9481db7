// Adapter between the rules and lib/gaslift/operating-point.ts: each valve's
// surface opening and closing pressures, the operating point and one port's
// Thornhill–Craver capacity. All the physics lives in lib/gaslift; this file only
// picks the inputs the rules use, so no rule repeats a formula.
import type { WellDesign } from "@/lib/gaslift/types";
import { inferOperatingPoint, type OperatingPoint } from "@/lib/gaslift/operating-point";
import { DEFAULT_SETTINGS } from "@/lib/diagnostics/settings";

export interface ValveLevel {
  position: number;
  kind: "ipo" | "orifice" | "dummy";
  tvdFt: number;
  surfaceOpeningPsig: number | null;
  surfaceClosingPsig: number | null;
  /** Thornhill–Craver upper bound through this port at the given casing pressure, Mscf/d. */
  maxPortRateMscfd: number | null;
}

export interface WellValveLevels {
  valves: ValveLevel[];
  /** Unloading (IPO) valves with a known closing pressure, top first. */
  unloading: ValveLevel[];
  /** The deepest valve or orifice: the design operating point. */
  operating: ValveLevel | null;
  /** The engineering core's reading at this casing pressure (null when the design is unusable). */
  operatingPoint: OperatingPoint | null;
}

/** Surface valve pressures of `design` at a steady tubing pressure (and casing pressure, for port capacity and open points). */
export function computeValveLevels(
  design: WellDesign,
  tubingPsig: number,
  casingPsig?: number,
  injectionMscfd?: number,
  tubingGradientPsiPerFt = DEFAULT_SETTINGS.general.tubingGradientPsiPerFt,
): WellValveLevels {
  let op: OperatingPoint | null = null;
  try {
    op = inferOperatingPoint(design, {
      casingPsig: casingPsig !== undefined && Number.isFinite(casingPsig) ? casingPsig : 0,
      tubingPsig: Math.max(0, Number.isFinite(tubingPsig) ? tubingPsig : 0),
      injectionMscfd: injectionMscfd !== undefined && Number.isFinite(injectionMscfd) ? injectionMscfd : undefined,
    }, { tubingGradientPsiPerFt });
  } catch {
    // A design the engineering core rejects (missing or impossible data) gives no levels.
    op = null;
  }
  const hasCasing = casingPsig !== undefined && Number.isFinite(casingPsig);
  const valves: ValveLevel[] = (op?.valves ?? []).map((v) => ({
    position: v.position,
    kind: v.kind,
    tvdFt: v.tvdFt,
    surfaceOpeningPsig: v.surfaceOpeningPsig,
    surfaceClosingPsig: v.surfaceClosingPsig,
    maxPortRateMscfd: hasCasing ? v.maxPassageMscfd : null,
  }));
  const unloading = valves.filter((v) => v.kind === "ipo" && v.surfaceClosingPsig !== null);
  const live = valves.filter((v) => v.kind !== "dummy");
  return { valves, unloading, operating: live[live.length - 1] ?? null, operatingPoint: hasCasing ? op : null };
}

/** Lowest surface closing pressure among the unloading valves, psig (null when none is known). */
export function findLowestClosingPsig(levels: WellValveLevels): number | null {
  let best: number | null = null;
  for (const v of levels.unloading) {
    const c = v.surfaceClosingPsig as number;
    if (best === null || c < best) best = c;
  }
  return best;
}

/** The unloading valve whose surface closing pressure is nearest to `casingPsig`. */
export function findNearestUnloadingValve(levels: WellValveLevels, casingPsig: number): ValveLevel | null {
  let best: ValveLevel | null = null;
  for (const v of levels.unloading) {
    if (!best || Math.abs((v.surfaceClosingPsig as number) - casingPsig) < Math.abs((best.surfaceClosingPsig as number) - casingPsig)) best = v;
  }
  return best;
}
