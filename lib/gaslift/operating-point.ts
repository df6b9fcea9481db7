// Operating point: what the surface casing and tubing pressures say about each valve
// of a well's design, where gas is most likely entering the tubing, and whether the
// measured injection rate fits through that one port.
//
// Per mandrel (sources beside each formula in valve.ts, dome-temperature.ts,
// gas-column.ts and orifice-flow.ts; DOMAIN.md §3):
// - valve temperature from the straight geothermal line (temperature.ts);
// - casing pressure at depth from the static gas column;
// - tubing pressure at depth from a straight flowing gradient below the surface tubing
//   pressure. OUR STATED ASSUMPTION: 0.1 psi/ft by default, inside the 0.1–0.2 psi/ft
//   usual for a gas-lifted column above the injection point; tunable per well. Below the
//   injection point the real gradient is heavier, so the tubing pressure there is low
//   and the deeper valves look more open-able than they are;
// - for an IPO valve: dome at temperature, opening and closing pressures at depth for
//   that tubing pressure, and the same referred to surface;
// - can it be open: casing at depth ≥ closing pressure at depth (an unloading valve that
//   has opened stays open until casing falls below its closing pressure) AND casing at
//   depth > tubing at depth (the reverse-flow check valve holds otherwise). An orifice
//   needs only the second;
// - the Thornhill–Craver passage of its port, an upper bound.
// The operating point is the deepest point that can be open: in a sound design the gas
// goes there and every valve above is closed. More than one open-able point is the
// multipointing picture of DOMAIN.md §4; the diagnostics decide what to make of it.
import type { Mandrel, ValveKind, WellDesign } from "@/lib/gaslift/types";
import { ATM_PSI } from "@/lib/units/units";
import type { ZMethod } from "@/lib/gaslift/gas-properties";
import { gasColumnPressurePsig } from "@/lib/gaslift/gas-column";
import type { DomeOptions } from "@/lib/gaslift/dome-temperature";
import { ipoValvePressures, isValveOd, rFromPort } from "@/lib/gaslift/valve";
import { thornhillCraver } from "@/lib/gaslift/orifice-flow";
import { temperatureAtDepth } from "@/lib/gaslift/temperature";

/** Default flowing tubing gradient above the injection point, psi/ft (our assumption, see header). */
export const DEFAULT_TUBING_GRADIENT_PSI_PER_FT = 0.1;

/**
 * A measured injection rate above this multiple of the port's Thornhill–Craver passage
 * is flagged. T-C is already optimistic, so 1.1 leaves room only for meter error
 * (our choice; tunable per field).
 */
export const DEFAULT_RATE_TOLERANCE = 1.1;

export interface OperatingPointOptions {
  /** Flowing tubing gradient, psi/ft of TVD. Default 0.1 (the rules use the same default). */
  tubingGradientPsiPerFt?: number;
  /** Dome correction; default real-gas nitrogen, gauge basis. */
  dome?: DomeOptions;
  /** Z correlation; default "dak". */
  method?: ZMethod;
  /** Multiple of port capacity above which the rate is flagged. Default 1.1. */
  rateTolerance?: number;
}

export interface OperatingPointReading {
  /** Surface casing (injection) pressure, psig. */
  casingPsig: number;
  /** Surface tubing (wellhead flowing) pressure, psig. */
  tubingPsig: number;
  /** Measured injection gas rate, Mscf/d. */
  injectionMscfd?: number;
}

/** How a valve stands: closed; open (casing at or above its opening pressure); or in between, held open only if it was already open. */
export type ValveCondition = "closed" | "throttling" | "open" | "no-valve";

export interface ValveState {
  position: number;
  mdFt: number;
  tvdFt: number;
  kind: ValveKind;
  portIn: number | null;
  valveTempF: number;
  /** R used: the mandrel's own, else estimated from port and valve OD; null for orifice, dummy or unknown. */
  r: number | null;
  isREstimated: boolean;
  casingAtDepthPsig: number;
  tubingAtDepthPsig: number;
  domeAtValvePsig: number | null;
  openingAtDepthPsig: number | null;
  closingAtDepthPsig: number | null;
  surfaceOpeningPsig: number | null;
  surfaceClosingPsig: number | null;
  canBeOpen: boolean;
  condition: ValveCondition;
  /** Thornhill–Craver passage of the port at these pressures, Mscf/d (an upper bound). */
  maxPassageMscfd: number | null;
  /** Why a figure is missing or a reading is uncertain, in plain words. */
  notes: string[];
}

export interface OperatingPoint {
  /** Top mandrel first. */
  valves: ValveState[];
  /** Deepest point that can be open: where gas should be entering. */
  operatingPosition: number | null;
  /** Every point that can be open, top first; more than one is the multipointing picture. */
  openPositions: number[];
  /** Thornhill–Craver passage of the operating point's port, Mscf/d. */
  portCapacityMscfd: number | null;
  /** Measured rate above capacity × tolerance: gas is likely passing more than one point. Null when either is unknown. */
  isRateAbovePortCapacity: boolean | null;
  notes: string[];
}

/** Infer each valve's state and the operating point from surface casing and tubing pressures. */
export function inferOperatingPoint(
  design: WellDesign,
  reading: OperatingPointReading,
  options: OperatingPointOptions = {},
): OperatingPoint {
  const valves = sortedMandrels(design).map((m) => readValve(design, m, reading, options));
  const openPositions = valves.filter((v) => v.canBeOpen).map((v) => v.position);
  const operating = [...valves].reverse().find((v) => v.canBeOpen) ?? null;
  const notes: string[] = [];
  if (valves.length === 0) notes.push("the design has no mandrels");
  else if (operating === null) notes.push("no valve can pass gas at this casing pressure");
  if (openPositions.length > 1) {
    notes.push(`${openPositions.length} points can pass gas at this casing pressure (positions ${openPositions.join(", ")})`);
  }
  const portCapacityMscfd = operating?.maxPassageMscfd ?? null;
  if (operating !== null && portCapacityMscfd === null) notes.push(`no port size for position ${operating.position}`);
  const tolerance = options.rateTolerance ?? DEFAULT_RATE_TOLERANCE;
  const isRateAbovePortCapacity =
    reading.injectionMscfd === undefined || portCapacityMscfd === null
      ? null
      : reading.injectionMscfd > portCapacityMscfd * tolerance;
  return {
    valves,
    operatingPosition: operating?.position ?? null,
    openPositions,
    portCapacityMscfd,
    isRateAbovePortCapacity,
    notes,
  };
}

export interface ValveSurfacePressures {
  position: number;
  tvdFt: number;
  kind: ValveKind;
  surfaceOpeningPsig: number | null;
  surfaceClosingPsig: number | null;
}

/**
 * Each valve's surface opening and closing pressure at a surface tubing pressure: the
 * reference lines drawn on a casing-pressure chart. Orifices and dummies have none.
 */
export function valveSurfacePressures(
  design: WellDesign,
  tubingPsig: number,
  options: OperatingPointOptions = {},
): ValveSurfacePressures[] {
  // Casing pressure does not enter the valve's own pressures; any value will do.
  const { valves } = inferOperatingPoint(design, { casingPsig: 0, tubingPsig }, options);
  return valves.map((v) => ({
    position: v.position,
    tvdFt: v.tvdFt,
    kind: v.kind,
    surfaceOpeningPsig: v.surfaceOpeningPsig,
    surfaceClosingPsig: v.surfaceClosingPsig,
  }));
}

/** Mandrels top first (by TVD). */
export function sortedMandrels(design: Pick<WellDesign, "mandrels">): Mandrel[] {
  return [...design.mandrels].sort((a, b) => a.tvdFt - b.tvdFt);
}

/** Valve temperature from the design's geothermal line (perforation depth read as TVD). */
export function valveTemperature(design: WellDesign | Omit<WellDesign, "mandrels">, tvdFt: number): number {
  return temperatureAtDepth(design.surfaceTempF, design.bottomholeTempF, design.perfDepthFt, tvdFt);
}

function readValve(design: WellDesign, m: Mandrel, reading: OperatingPointReading, options: OperatingPointOptions): ValveState {
  const valveTempF = valveTemperature(design, m.tvdFt);
  const gradient = options.tubingGradientPsiPerFt ?? DEFAULT_TUBING_GRADIENT_PSI_PER_FT;
  const tubingAtDepthPsig = reading.tubingPsig + gradient * m.tvdFt;
  const casingAtDepthPsig = gasColumnPressurePsig({
    surfacePsig: Math.max(reading.casingPsig, -ATM_PSI),
    sg: design.gasSg,
    depthFt: m.tvdFt,
    surfaceTempF: design.surfaceTempF,
    depthTempF: valveTempF,
    method: options.method,
  });
  const state: ValveState = {
    position: m.position,
    mdFt: m.mdFt,
    tvdFt: m.tvdFt,
    kind: m.kind,
    portIn: m.portIn,
    valveTempF,
    r: null,
    isREstimated: false,
    casingAtDepthPsig,
    tubingAtDepthPsig,
    domeAtValvePsig: null,
    openingAtDepthPsig: null,
    closingAtDepthPsig: null,
    surfaceOpeningPsig: null,
    surfaceClosingPsig: null,
    canBeOpen: false,
    condition: "closed",
    maxPassageMscfd: null,
    notes: [],
  };
  if (m.kind === "dummy") return { ...state, condition: "no-valve" };

  const hasForwardDrop = casingAtDepthPsig > tubingAtDepthPsig;
  if (m.portIn !== null && m.portIn > 0) {
    state.maxPassageMscfd = thornhillCraver({
      p1Psia: casingAtDepthPsig + ATM_PSI,
      p2Psia: Math.max(tubingAtDepthPsig + ATM_PSI, 0),
      tF: valveTempF,
      sg: design.gasSg,
      portIn: m.portIn,
      method: options.method,
    });
  }
  if (m.kind === "orifice") {
    state.canBeOpen = hasForwardDrop;
    state.condition = hasForwardDrop ? "open" : "closed";
    return state;
  }

  const r = resolveR(m, state);
  if (r === null) return state;
  if (m.tropsig === null) {
    state.notes.push("no test-rack opening pressure on file");
    return state;
  }
  const p = ipoValvePressures(m.tropsig, {
    r,
    depthFt: m.tvdFt,
    valveTempF,
    surfaceTempF: design.surfaceTempF,
    sg: design.gasSg,
    tubingAtValvePsig: tubingAtDepthPsig,
    dome: options.dome,
    method: options.method,
  });
  state.domeAtValvePsig = p.domeAtValvePsig;
  state.openingAtDepthPsig = p.openingAtDepthPsig;
  state.closingAtDepthPsig = p.closingAtDepthPsig;
  state.surfaceOpeningPsig = p.surfaceOpeningPsig;
  state.surfaceClosingPsig = p.surfaceClosingPsig;
  state.canBeOpen = hasForwardDrop && casingAtDepthPsig >= p.closingAtDepthPsig;
  if (!state.canBeOpen) state.condition = "closed";
  else state.condition = casingAtDepthPsig >= (p.openingAtDepthPsig ?? Infinity) ? "open" : "throttling";
  return state;
}

function resolveR(m: Mandrel, state: ValveState): number | null {
  if (m.rRatio !== null) {
    state.r = m.rRatio;
    return m.rRatio;
  }
  if (m.portIn !== null && m.portIn > 0 && m.valveOdIn !== null && isValveOd(m.valveOdIn)) {
    state.r = rFromPort(m.portIn, m.valveOdIn);
    state.isREstimated = true;
    state.notes.push("R estimated from port and valve size (no manufacturer R on file)");
    return state.r;
  }
  state.notes.push("no R on file, and no port and 1 or 1.5 in valve size to estimate it from");
  return null;
}
