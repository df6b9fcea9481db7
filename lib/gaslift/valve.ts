// Injection-pressure-operated (IPO) gas-lift valve with a nitrogen-charged bellows
// (an unbalanced bellows valve). DOMAIN.md §3.
//
// Force balance at the point of opening (valve closed, tubing pressure under the port):
//   P_t·A_p + P_c·(A_b − A_p) ≥ P_d·A_b
// so, with R = A_p/A_b,
//   opening pressure at depth  P_vo = (P_d@T − P_t·R) / (1 − R)
//   closing pressure at depth  P_vc = P_d@T   (casing pressure on the whole bellows)
//   test-rack opening (60 °F)  P_tro = P_d@60 / (1 − R)   (no tubing pressure on the rack)
// Sources: API RP 11V6; Brown, *The Technology of Artificial Lift Methods*, vol. 2a
// (1980); the same forms are coded in PressureDrop.jl's `valve_calcs`.
// The closing pressure is the theoretical minimum (casing pressure acting on the
// whole bellows at closing), as PressureDrop.jl notes.
//
// All pressures here are gauge (psig) and at valve depth unless a name says otherwise;
// the force balance holds in gauge as in absolute because atmospheric pressure acts
// on both sides. Surface opening and closing pressures are the depth values referred
// up the static gas column (the depth value minus the gas-column increase).
import type { ZMethod } from "@/lib/gaslift/gas-properties";
import { gasColumnPressurePsig, surfacePressureForDepthPsig } from "@/lib/gaslift/gas-column";
import { domeAt60, domeAtTemperature, type DomeOptions } from "@/lib/gaslift/dome-temperature";

/** Effective bellows areas, in² (PressureDrop.jl `estimate_valve_Rvalue`). */
export const BELLOWS_AREA_IN2: Record<ValveOdIn, number> = { 1: 0.31, 1.5: 0.77 };

/** A lapped seat adds this to the port diameter, in (PressureDrop.jl). */
export const LAPPED_SEAT_ALLOWANCE_IN = 0.006;

export type ValveOdIn = 1 | 1.5;

export function isValveOd(od: number): od is ValveOdIn {
  return od === 1 || od === 1.5;
}

/** Area of a round port of diameter `portIn`, in². */
export function portArea(portIn: number): number {
  if (!(portIn > 0)) throw new RangeError(`port diameter must be > 0 in, got ${portIn}`);
  return (Math.PI * portIn * portIn) / 4;
}

/** Port diameter in inches from a size in 64ths of an inch (16/64" = 0.25"). */
export function portFrom64ths(sixtyFourths: number): number {
  return sixtyFourths / 64;
}

/**
 * Geometric R = A_port/A_bellows for a valve of nominal OD `valveOdIn` (1 or 1.5 in).
 * A manufacturer's published R is always better: use this only when none is on file.
 */
export function rFromPort(portIn: number, valveOdIn: number, opts: { lapped?: boolean } = {}): number {
  if (!isValveOd(valveOdIn)) throw new RangeError(`valve OD must be 1 or 1.5 in, got ${valveOdIn}`);
  const d = opts.lapped ? portIn + LAPPED_SEAT_ALLOWANCE_IN : portIn;
  const r = portArea(d) / BELLOWS_AREA_IN2[valveOdIn];
  assertR(r);
  return r;
}

/** Tubing effect factor TEF = R/(1 − R): psi of opening pressure taken off by each psi of tubing pressure. */
export function tubingEffectFactor(r: number): number {
  assertR(r);
  return r / (1 - r);
}

/** Opening pressure at depth, P_vo = (P_d − P_t·R)/(1 − R). */
export function valveOpeningPressure(domeAtValvePsig: number, tubingAtValvePsig: number, r: number): number {
  assertR(r);
  return (domeAtValvePsig - tubingAtValvePsig * r) / (1 - r);
}

/** Closing pressure at depth, P_vc = P_d@T. */
export function valveClosingPressure(domeAtValvePsig: number): number {
  return domeAtValvePsig;
}

/** Dome pressure at depth that gives opening pressure `openingPsig` against tubing `tubingAtValvePsig`. */
export function domeForOpeningPressure(openingPsig: number, tubingAtValvePsig: number, r: number): number {
  assertR(r);
  return openingPsig * (1 - r) + tubingAtValvePsig * r;
}

/** Test-rack opening pressure, P_tro = P_d@60/(1 − R). */
export function testRackOpening(domeAt60Psig: number, r: number): number {
  assertR(r);
  return domeAt60Psig / (1 - r);
}

/** Dome pressure at 60 °F from the test-rack opening pressure, P_d@60 = P_tro·(1 − R). */
export function domeFromTro(troPsig: number, r: number): number {
  assertR(r);
  return troPsig * (1 - r);
}

/**
 * Whether the force balance opens a closed valve: P_t·A_p + P_c·(A_b − A_p) ≥ P_d·A_b,
 * divided through by A_b.
 */
export function isValveOpening(casingAtValvePsig: number, tubingAtValvePsig: number, domeAtValvePsig: number, r: number): boolean {
  assertR(r);
  return tubingAtValvePsig * r + casingAtValvePsig * (1 - r) >= domeAtValvePsig;
}

function assertR(r: number): void {
  if (!(r >= 0 && r < 1)) throw new RangeError(`R = A_port/A_bellows must be in [0, 1), got ${r}`);
}

/** Where a valve sits and what surrounds it: enough to refer its pressures to surface. */
export interface IpoValveSetting {
  /** R = A_port/A_bellows. */
  r: number;
  /** Valve true vertical depth, ft. */
  depthFt: number;
  valveTempF: number;
  /** Temperature at the top of the annulus gas column, °F. */
  surfaceTempF: number;
  /** Injection gas specific gravity, air = 1. */
  sg: number;
  /** Tubing pressure at the valve, psig; null when unknown (no opening pressure then). */
  tubingAtValvePsig: number | null;
  dome?: DomeOptions;
  method?: ZMethod;
}

export interface IpoValvePressures {
  domeAt60Psig: number;
  domeAtValvePsig: number;
  closingAtDepthPsig: number;
  surfaceClosingPsig: number;
  openingAtDepthPsig: number | null;
  surfaceOpeningPsig: number | null;
  /** Opening minus closing pressure at depth, psi. */
  spreadPsi: number | null;
}

/** Opening and closing pressures, at depth and at surface, of an IPO valve set to `troPsig` on the rack. */
export function ipoValvePressures(troPsig: number, setting: IpoValveSetting): IpoValvePressures {
  const domeAt60Psig = domeFromTro(troPsig, setting.r);
  const domeAtValvePsig = domeAtTemperature(domeAt60Psig, setting.valveTempF, setting.dome);
  const closingAtDepthPsig = valveClosingPressure(domeAtValvePsig);
  const toSurface = (depthPsig: number) => surfacePressureForDepthPsig({ ...columnOf(setting), depthPsig });
  const openingAtDepthPsig = setting.tubingAtValvePsig === null
    ? null
    : valveOpeningPressure(domeAtValvePsig, setting.tubingAtValvePsig, setting.r);
  return {
    domeAt60Psig,
    domeAtValvePsig,
    closingAtDepthPsig,
    surfaceClosingPsig: toSurface(closingAtDepthPsig),
    openingAtDepthPsig,
    surfaceOpeningPsig: openingAtDepthPsig === null ? null : toSurface(openingAtDepthPsig),
    spreadPsi: openingAtDepthPsig === null ? null : openingAtDepthPsig - closingAtDepthPsig,
  };
}

/**
 * Test-rack opening pressure that makes the valve open at `surfaceOpeningPsig` of
 * casing pressure against `tubingAtValvePsig`: the design direction of
 * `ipoValvePressures` (surface → depth through the gas column, force balance for the
 * dome, temperature correction to 60 °F, then P_tro = P_d@60/(1 − R)).
 */
export function troForSurfaceOpening(surfaceOpeningPsig: number, setting: IpoValveSetting & { tubingAtValvePsig: number }): number {
  const openingAtDepthPsig = gasColumnPressurePsig({ ...columnOf(setting), surfacePsig: surfaceOpeningPsig });
  const domeAtValvePsig = domeForOpeningPressure(openingAtDepthPsig, setting.tubingAtValvePsig, setting.r);
  return testRackOpening(domeAt60(domeAtValvePsig, setting.valveTempF, setting.dome), setting.r);
}

function columnOf(setting: IpoValveSetting) {
  return {
    sg: setting.sg,
    depthFt: setting.depthFt,
    surfaceTempF: setting.surfaceTempF,
    depthTempF: setting.valveTempF,
    method: setting.method,
  };
}
