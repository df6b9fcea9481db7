// Nitrogen-charged bellows dome: pressure change between the 60 °F test rack and
// the valve temperature at depth.
//
// The dome volume is taken as constant, so P/(Z·T) is the same at both temperatures.
// Nitrogen Z: Sage & Lacy's experimental fit, as coded in the open-source
// PressureDrop.jl (jnoynaert, `SageAndLacy_nitrogen_Zfactor`, src/valvecalculations.jl):
//   Z = 1 + b·p + c·p², p in psia, T in °F,
//   b = (1.207e-7·T³ − 1.302e-4·T² + 5.122e-2·T − 4.781)·1e-5
//   c = (−2.461e-8·T³ + 2.640e-5·T² − 1.058e-2·T + 1.880)·1e-8
// The ideal-gas form is C_t = 519.67/(T + 459.67). DOMAIN.md §3.
//
// Basis. C_t = P_d@60 / P_d@T. The physics holds for absolute pressures; gas-lift
// C_t tables are applied to gauge dome pressures (trade practice, from memory), and
// DOMAIN.md's worked design is on the gauge basis. The two differ by 1–2 %.
// Bellows defaults to GAUGE with REAL-GAS nitrogen: the real-gas C_t is the absolute
// ratio taken at the valve's own dome pressure, applied to the gauge pressure. That
// reproduces the worked design (P_tro 942.9 psig) and lands within 0.01 of the
// handbook C_t readings. Every function takes `{ method, basis }` so a caller can
// choose otherwise, and the choice is visible where it is made.
import { ATM_PSI } from "@/lib/units/units";
import { RANKINE_OFFSET } from "@/lib/gaslift/gas-properties";

/** Test-rack setting temperature, °F: valves are set in the shop at 60 °F (DOMAIN.md §3). */
export const TEST_RACK_TEMP_F = 60;

export type DomeBasis = "gauge" | "absolute";
export type DomeMethod = "real" | "ideal";

export interface DomeOptions {
  /** Default "real": nitrogen with Sage & Lacy Z. */
  method?: DomeMethod;
  /** Default "gauge" (see header). */
  basis?: DomeBasis;
}

export const DEFAULT_DOME_OPTIONS: Required<DomeOptions> = { method: "real", basis: "gauge" };

/** Sage & Lacy nitrogen Z at `pressurePsia` and `tempF`. */
export function nitrogenZSageLacy(pressurePsia: number, tempF: number): number {
  const t = tempF;
  const b = (1.207e-7 * t ** 3 - 1.302e-4 * t ** 2 + 5.122e-2 * t - 4.781) * 1e-5;
  const c = (-2.461e-8 * t ** 3 + 2.64e-5 * t ** 2 - 1.058e-2 * t + 1.88) * 1e-8;
  return 1 + b * pressurePsia + c * pressurePsia ** 2;
}

/** Ideal-gas temperature correction factor C_t = T_60/T_v (both °R). */
export function idealDomeCt(valveTempF: number): number {
  return (TEST_RACK_TEMP_F + RANKINE_OFFSET) / (valveTempF + RANKINE_OFFSET);
}

/**
 * Absolute dome pressure at `valveTempF` for a dome charged to `rackPsia` at 60 °F,
 * real-gas nitrogen at constant volume. Fixed point on P_v = P_60·(Z_v/Z_60)·(T_v/T_60).
 */
export function domeAbsAtTemperature(rackPsia: number, valveTempF: number): number {
  assertPressure(rackPsia);
  const ratioT = (valveTempF + RANKINE_OFFSET) / (TEST_RACK_TEMP_F + RANKINE_OFFSET);
  const z60 = nitrogenZSageLacy(rackPsia, TEST_RACK_TEMP_F);
  let p = rackPsia * ratioT;
  for (let i = 0; i < 100; i++) {
    const next = (rackPsia * ratioT * nitrogenZSageLacy(p, valveTempF)) / z60;
    if (Math.abs(next - p) < 1e-9) return next;
    p = next;
  }
  return p;
}

/** Absolute dome pressure at 60 °F for a dome at `valvePsia` and `valveTempF`: the inverse. */
export function domeAbsAt60(valvePsia: number, valveTempF: number): number {
  assertPressure(valvePsia);
  const ratioT = (TEST_RACK_TEMP_F + RANKINE_OFFSET) / (valveTempF + RANKINE_OFFSET);
  const zV = nitrogenZSageLacy(valvePsia, valveTempF);
  let p = valvePsia * ratioT;
  for (let i = 0; i < 100; i++) {
    const next = (valvePsia * ratioT * nitrogenZSageLacy(p, TEST_RACK_TEMP_F)) / zV;
    if (Math.abs(next - p) < 1e-9) return next;
    p = next;
  }
  return p;
}

/**
 * Dome pressure at 60 °F (P_d@60), psig, from the dome pressure at the valve
 * temperature (P_d@T), psig: P_d@60 = C_t · P_d@T.
 */
export function domeAt60(valvePsig: number, valveTempF: number, opts: DomeOptions = {}): number {
  const { basis, method } = { ...DEFAULT_DOME_OPTIONS, ...opts };
  if (method === "ideal") {
    const ct = idealDomeCt(valveTempF);
    return basis === "gauge" ? ct * valvePsig : ct * (valvePsig + ATM_PSI) - ATM_PSI;
  }
  const absRack = domeAbsAt60(valvePsig + ATM_PSI, valveTempF);
  if (basis === "absolute") return absRack - ATM_PSI;
  // Gauge basis: the real-gas C_t (an absolute ratio) applied to gauge pressure.
  return (absRack / (valvePsig + ATM_PSI)) * valvePsig;
}

/** Dome pressure at the valve temperature (P_d@T), psig, from the 60 °F dome pressure P_d@60, psig. */
export function domeAtTemperature(rackPsig: number, valveTempF: number, opts: DomeOptions = {}): number {
  const { basis, method } = { ...DEFAULT_DOME_OPTIONS, ...opts };
  if (method === "ideal") {
    const ct = idealDomeCt(valveTempF);
    return basis === "gauge" ? rackPsig / ct : (rackPsig + ATM_PSI) / ct - ATM_PSI;
  }
  if (basis === "absolute") return domeAbsAtTemperature(rackPsig + ATM_PSI, valveTempF) - ATM_PSI;
  // Gauge basis is defined by domeAt60 (C_t taken at the valve's dome
  // pressure); solve it backwards so the pair are exact inverses. C_t changes
  // slowly with pressure, so the fixed point settles in a few steps.
  let valvePsig = rackPsig / idealDomeCt(valveTempF);
  for (let i = 0; i < 100; i++) {
    const next = rackPsig / domeCt(valvePsig, valveTempF, { basis, method });
    if (Math.abs(next - valvePsig) < 1e-9) return next;
    valvePsig = next;
  }
  return valvePsig;
}

/**
 * C_t = P_d@60/P_d@T for a dome at `valvePsig` and `valveTempF`, on the chosen basis.
 * On the gauge basis with real gas, C_t is the absolute real-gas ratio taken at the
 * valve's own dome pressure, then applied to gauge pressures.
 */
export function domeCt(valvePsig: number, valveTempF: number, opts: DomeOptions = {}): number {
  return domeAt60(valvePsig, valveTempF, opts) / valvePsig;
}

function assertPressure(p: number): void {
  if (!(p > 0)) throw new RangeError(`dome pressure must be > 0 psia, got ${p}`);
}
