// Unit conversion at the edges. Canonical storage units (oilfield):
//   pressure psig, gas rate Mscf/d, liquid rate bbl/d, temperature °F,
//   length ft, diameter in.
// Factors: NIST SP 811 (2008), Appendix B.8/B.9:
//   1 psi = 6.894 757 kPa; 1 bar = 100 kPa; 1 ft = 0.3048 m (exact);
//   1 bbl (US oil barrel, 42 gal) = 0.158 987 3 m3; 1 ft3 = 0.028 316 85 m3.
// Atmospheric offset for gauge/absolute: 14.7 psi (DOMAIN.md §2, practice).
import type { Quantity } from "@/lib/signals";

export const PSI_TO_KPA = 6.894757;
export const BAR_TO_KPA = 100;
export const FT_TO_M = 0.3048;
export const BBL_TO_M3 = 0.1589873;
export const FT3_TO_M3 = 0.02831685;
export const ATM_PSI = 14.7;

export const UNITS = {
  pressure: ["psig", "psia", "kPag", "kPaa", "barg", "bara", "kPa", "bar", "MPag"],
  gas_rate: ["Mscf/d", "MMscf/d", "scf/d", "e3m3/d", "m3/d", "Mscf/h"],
  liquid_rate: ["bbl/d", "m3/d", "bbl/h"],
  temperature: ["degF", "degC"],
} as const satisfies Record<Quantity, readonly string[]>;

export type PressureUnit = (typeof UNITS.pressure)[number];
export type GasRateUnit = (typeof UNITS.gas_rate)[number];
export type LiquidRateUnit = (typeof UNITS.liquid_rate)[number];
export type TemperatureUnit = (typeof UNITS.temperature)[number];
export type Unit = PressureUnit | GasRateUnit | LiquidRateUnit | TemperatureUnit;

export const CANONICAL_UNIT: Record<Quantity, Unit> = {
  pressure: "psig",
  gas_rate: "Mscf/d",
  liquid_rate: "bbl/d",
  temperature: "degF",
};

/** Pressure in the given unit to psig. Bare "kPa"/"bar" are taken as gauge, as SCADA tags usually are. */
export function pressureToPsig(v: number, unit: PressureUnit): number {
  switch (unit) {
    case "psig": return v;
    case "psia": return v - ATM_PSI;
    case "kPag": case "kPa": return v / PSI_TO_KPA;
    case "kPaa": return v / PSI_TO_KPA - ATM_PSI;
    case "barg": case "bar": return (v * BAR_TO_KPA) / PSI_TO_KPA;
    case "bara": return (v * BAR_TO_KPA) / PSI_TO_KPA - ATM_PSI;
    case "MPag": return (v * 1000) / PSI_TO_KPA;
  }
}

export function psigTo(v: number, unit: PressureUnit): number {
  switch (unit) {
    case "psig": return v;
    case "psia": return v + ATM_PSI;
    case "kPag": case "kPa": return v * PSI_TO_KPA;
    case "kPaa": return (v + ATM_PSI) * PSI_TO_KPA;
    case "barg": case "bar": return (v * PSI_TO_KPA) / BAR_TO_KPA;
    case "bara": return ((v + ATM_PSI) * PSI_TO_KPA) / BAR_TO_KPA;
    case "MPag": return (v * PSI_TO_KPA) / 1000;
  }
}

// 1 e3m3 = 1000 m3 = 1000 / 0.02831685 ft3 = 35.31467 Mscf.
const MSCF_PER_E3M3 = 1 / FT3_TO_M3; // 1000 m3 -> Mscf: 1000/0.02831685/1000

export function gasRateToMscfd(v: number, unit: GasRateUnit): number {
  switch (unit) {
    case "Mscf/d": return v;
    case "MMscf/d": return v * 1000;
    case "scf/d": return v / 1000;
    case "e3m3/d": return v * MSCF_PER_E3M3;
    case "m3/d": return (v * MSCF_PER_E3M3) / 1000;
    case "Mscf/h": return v * 24;
  }
}

export function mscfdTo(v: number, unit: GasRateUnit): number {
  return v / gasRateToMscfd(1, unit);
}

export function liquidRateToBbld(v: number, unit: LiquidRateUnit): number {
  switch (unit) {
    case "bbl/d": return v;
    case "m3/d": return v / BBL_TO_M3;
    case "bbl/h": return v * 24;
  }
}

export function bbldTo(v: number, unit: LiquidRateUnit): number {
  return v / liquidRateToBbld(1, unit);
}

export function temperatureToF(v: number, unit: TemperatureUnit): number {
  return unit === "degF" ? v : v * 1.8 + 32;
}

export function fTo(v: number, unit: TemperatureUnit): number {
  return unit === "degF" ? v : (v - 32) / 1.8;
}

export const ftToM = (ft: number) => ft * FT_TO_M;
export const mToFt = (m: number) => m / FT_TO_M;
export const inToMm = (inch: number) => inch * 25.4;
export const mmToIn = (mm: number) => mm / 25.4;

export function isUnitOf(q: Quantity, unit: string): unit is Unit {
  return (UNITS[q] as readonly string[]).includes(unit);
}

/** Convert a value in `unit` of quantity `q` to the canonical unit. */
export function toCanonical(q: Quantity, v: number, unit: Unit): number {
  switch (q) {
    case "pressure": return pressureToPsig(v, unit as PressureUnit);
    case "gas_rate": return gasRateToMscfd(v, unit as GasRateUnit);
    case "liquid_rate": return liquidRateToBbld(v, unit as LiquidRateUnit);
    case "temperature": return temperatureToF(v, unit as TemperatureUnit);
  }
}

/** Convert a canonical value of quantity `q` to `unit` for display. */
export function fromCanonical(q: Quantity, v: number, unit: Unit): number {
  switch (q) {
    case "pressure": return psigTo(v, unit as PressureUnit);
    case "gas_rate": return mscfdTo(v, unit as GasRateUnit);
    case "liquid_rate": return bbldTo(v, unit as LiquidRateUnit);
    case "temperature": return fTo(v, unit as TemperatureUnit);
  }
}

/** The user's display system: oilfield or metric. */
export type UnitSystem = "oilfield" | "metric";

export const DISPLAY_UNITS: Record<UnitSystem, Record<Quantity | "length" | "diameter", string>> = {
  oilfield: { pressure: "psig", gas_rate: "Mscf/d", liquid_rate: "bbl/d", temperature: "degF", length: "ft", diameter: "in" },
  metric: { pressure: "kPag", gas_rate: "e3m3/d", liquid_rate: "m3/d", temperature: "degC", length: "m", diameter: "mm" },
};

export function displayValue(q: Quantity, v: number, system: UnitSystem): number {
  return fromCanonical(q, v, DISPLAY_UNITS[system][q] as Unit);
}
