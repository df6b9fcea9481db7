// Gas through a square-edged port or choke: Thornhill–Craver.
//
//   q [Mscf/d] = 155.5·Cd·A·P1·√{2g·k/(k−1)·(r^(2/k) − r^((k+1)/k))} / √(γg·T1·Z1)
//   r = max(P2/P1, r_c),  r_c = (2/(k+1))^(k/(k−1))
//
// A in in², P1 in psia, T1 in °R, g = 32.16 ft/s². Cd 0.827 and k 1.27 as in
// PressureDrop.jl (`ThornhillCraver_gaspassage`), after Hernandez, *Fundamentals of
// Gas Lift Engineering* (2016), §8.1. DOMAIN.md §3.
//
// Conventions that reproduce the published checks (orifice-flow.test.ts):
// - Z must be the real upstream Z. With Z = 1 the Hernandez chokes come out ~6 % low,
//   outside their ±2 %; with Sutton + DAK they agree within 2 %. So when `z` is not
//   given it is computed, not taken as 1.
// - PressureDrop.jl's 1,127 Mscf/d case is of its simplified form (γ 0.65 and Z folded
//   into one constant, 2946); the full form with computed Z gives 1,140 (+1.2 %).
//
// T-C assumes a fully open port (no stem in the way), so it is optimistic by up to
// ±30 %. Bellows uses it as an upper bound on what one port can pass, e.g. to flag an
// injection rate that one port could not have carried (multipointing).
import { gasZ, RANKINE_OFFSET, type ZMethod } from "@/lib/gaslift/gas-properties";
import { portArea } from "@/lib/gaslift/valve";

export const THORNHILL_CRAVER_CD = 0.827;
export const GAS_HEAT_CAPACITY_RATIO = 1.27;
const G_FT_S2 = 32.16;

export interface ThornhillCraverInput {
  /** Upstream (casing at depth) pressure, psia. */
  p1Psia: number;
  /** Downstream (tubing at depth) pressure, psia. */
  p2Psia: number;
  /** Upstream gas temperature, °F. */
  tF: number;
  /** Gas specific gravity, air = 1. */
  sg: number;
  /** Port or choke bore, in. */
  portIn: number;
  /** Default 0.827. */
  cd?: number;
  /** Default 1.27. */
  k?: number;
  /** Upstream Z; when omitted it is computed with Sutton pseudo-criticals and `method`. */
  z?: number;
  /** Z correlation when `z` is omitted; default "dak". */
  method?: ZMethod;
}

/** Critical pressure ratio (2/(k+1))^(k/(k−1)); ≈0.55 for k = 1.27. */
export function criticalPressureRatio(k = GAS_HEAT_CAPACITY_RATIO): number {
  return (2 / (k + 1)) ** (k / (k - 1));
}

/** Thornhill–Craver gas rate through one port, Mscf/d. Zero when there is no forward drop. */
export function thornhillCraver(input: ThornhillCraverInput): number {
  const { p1Psia: p1, p2Psia: p2, tF, sg, portIn } = input;
  if (!(p1 > 0)) throw new RangeError(`upstream pressure must be > 0 psia, got ${p1}`);
  if (!(p2 >= 0)) throw new RangeError(`downstream pressure must be ≥ 0 psia, got ${p2}`);
  if (p2 >= p1) return 0;
  const k = input.k ?? GAS_HEAT_CAPACITY_RATIO;
  const cd = input.cd ?? THORNHILL_CRAVER_CD;
  const z = input.z ?? gasZ({ pPsia: p1, tF, sg, method: input.method });
  const r = Math.max(p2 / p1, criticalPressureRatio(k));
  const expansion = Math.sqrt(((2 * G_FT_S2 * k) / (k - 1)) * (r ** (2 / k) - r ** ((k + 1) / k)));
  return (155.5 * cd * portArea(portIn) * p1 * expansion) / Math.sqrt(sg * (tF + RANKINE_OFFSET) * z);
}

/** Whether the port is in critical (sonic) flow, where the rate no longer depends on P2. */
export function isCriticalFlow(p1Psia: number, p2Psia: number, k = GAS_HEAT_CAPACITY_RATIO): boolean {
  return p2Psia / p1Psia <= criticalPressureRatio(k);
}
