// Our own heuristics for reading a signal and a unit out of a column header or a
// tag name ("CSG_PRESS", "Casing Pressure (psig)", "CF-12.TBG", "INJ_RATE [Mscf/d]").
// The abbreviations are common practice in oilfield SCADA naming (CSG casing, TBG
// tubing, INJ injection, LIQ liquid, WTR water, CHP/THP casing/tubing head pressure).
import { SIGNAL_QUANTITY, type Quantity, type Signal } from "@/lib/signals";
import { isUnitOf, type Unit } from "@/lib/units/units";

const PRESSURE = new Set(["PRESS", "PRES", "PRS", "PRESSURE", "P", "PSI", "PSIG", "PSIA", "KPA", "BAR"]);
const CASING = new Set(["CSG", "CAS", "CASING", "ANN", "ANNULUS", "ANNULAR"]);
const TUBING = new Set(["TBG", "TUB", "TUBING", "WH", "WELLHEAD"]);
const DOWNHOLE = new Set(["DH", "DOWNHOLE", "BOTTOMHOLE", "BH", "PDG", "GAUGE"]);
const INJECTION = new Set(["INJ", "INJECTION", "INJECTED", "GLI", "LIFT", "GASLIFT", "GL"]);
const TEMPERATURE = new Set(["TEMP", "TMP", "TEMPERATURE", "DEGF", "DEGC"]);
const RATE = new Set(["RATE", "FLOW", "Q", "VOL", "VOLUME", "MCFD", "MSCFD"]);
const GAS = new Set(["GAS", "QG", "MCF", "MSCF", "MCFD", "MSCFD", "PRODGAS"]);
const LIQUID = new Set(["LIQ", "LIQUID", "FLUID", "GROSS", "QL", "BFPD", "BLPD"]);
const OIL = new Set(["OIL", "QO", "BOPD"]);
const WATER = new Set(["WTR", "WATER", "QW", "BWPD"]);
const TIME_WORDS = new Set(["TIME", "DATE", "TIMESTAMP", "STAMP", "DATETIME", "EPOCH", "TS"]);
const DIRECT: Record<string, Signal> = {
  CP: "casing_pressure", CHP: "casing_pressure", ICP: "casing_pressure",
  TP: "tubing_pressure", THP: "tubing_pressure", FTP: "tubing_pressure", WHP: "tubing_pressure", FTHP: "tubing_pressure",
  BHP: "downhole_pressure", DHP: "downhole_pressure", BHFP: "downhole_pressure",
};

/** Split a name into upper-case word tokens, dropping bracketed unit text. */
export function tokenizeName(name: string): string[] {
  return name
    .replace(/[[(][^\])]*[\])]/g, " ")
    .replace(/([a-z])([A-Z])/g, "$1 $2")
    .toUpperCase()
    .split(/[^A-Z0-9]+/)
    .filter((t) => t.length > 0);
}

/** Guess the signal a header or tag names, or undefined when nothing fits. */
export function guessSignal(name: string): Signal | undefined {
  const tokens = tokenizeName(name);
  const has = (set: Set<string>) => tokens.some((t) => set.has(t));
  if (has(TIME_WORDS)) return undefined;
  if (has(TEMPERATURE)) return has(CASING) ? "casing_temperature" : has(TUBING) || tokens.length > 0 ? "tubing_temperature" : undefined;
  for (const t of tokens) if (DIRECT[t]) return DIRECT[t];
  const isPressure = has(PRESSURE);
  if (has(INJECTION)) return isPressure && !has(RATE) ? "casing_pressure" : "injection_rate";
  if (has(CASING)) return "casing_pressure";
  if (has(TUBING)) return "tubing_pressure";
  if (has(DOWNHOLE)) return "downhole_pressure";
  if (has(OIL)) return "oil_rate";
  if (has(WATER)) return "water_rate";
  if (has(LIQUID)) return "liquid_rate";
  if (has(GAS)) return "gas_rate";
  return undefined;
}

const UNIT_WORDS: Record<string, Partial<Record<Quantity, Unit>>> = {
  psig: { pressure: "psig" }, psi: { pressure: "psig" }, psia: { pressure: "psia" },
  kpa: { pressure: "kPa" }, kpag: { pressure: "kPag" }, kpaa: { pressure: "kPaa" },
  bar: { pressure: "bar" }, barg: { pressure: "barg" }, bara: { pressure: "bara" },
  mpa: { pressure: "MPag" }, mpag: { pressure: "MPag" },
  "mscf/d": { gas_rate: "Mscf/d" }, mscfd: { gas_rate: "Mscf/d" }, "mcf/d": { gas_rate: "Mscf/d" }, mcfd: { gas_rate: "Mscf/d" },
  "mscf/day": { gas_rate: "Mscf/d" }, "mcf/day": { gas_rate: "Mscf/d" },
  "mmscf/d": { gas_rate: "MMscf/d" }, mmscfd: { gas_rate: "MMscf/d" }, mmcfd: { gas_rate: "MMscf/d" }, "mmcf/d": { gas_rate: "MMscf/d" },
  "scf/d": { gas_rate: "scf/d" }, scfd: { gas_rate: "scf/d" },
  "e3m3/d": { gas_rate: "e3m3/d" }, "10^3m3/d": { gas_rate: "e3m3/d" }, "km3/d": { gas_rate: "e3m3/d" },
  "m3/d": { gas_rate: "m3/d", liquid_rate: "m3/d" }, "sm3/d": { gas_rate: "m3/d", liquid_rate: "m3/d" },
  "mscf/h": { gas_rate: "Mscf/h" },
  "bbl/d": { liquid_rate: "bbl/d" }, bpd: { liquid_rate: "bbl/d" }, bopd: { liquid_rate: "bbl/d" }, bwpd: { liquid_rate: "bbl/d" },
  blpd: { liquid_rate: "bbl/d" }, bfpd: { liquid_rate: "bbl/d" }, "b/d": { liquid_rate: "bbl/d" }, "bbls/d": { liquid_rate: "bbl/d" },
  "stb/d": { liquid_rate: "bbl/d" }, "bbl/day": { liquid_rate: "bbl/d" },
  "bbl/h": { liquid_rate: "bbl/h" }, bph: { liquid_rate: "bbl/h" },
  degf: { temperature: "degF" }, f: { temperature: "degF" }, "°f": { temperature: "degF" }, fahrenheit: { temperature: "degF" },
  degc: { temperature: "degC" }, c: { temperature: "degC" }, "°c": { temperature: "degC" }, celsius: { temperature: "degC" },
};

/** Normalise a unit as written ("psi", "MCFD", "m³/d", "deg F") to one of our units for a quantity. */
export function normaliseUnit(text: string, quantity: Quantity): Unit | undefined {
  const key = text.trim().toLowerCase().replace(/³/g, "3").replace(/\s+/g, "").replace(/^deg(?=[fc]$)/, "deg");
  if (isUnitOf(quantity, text.trim())) return text.trim() as Unit;
  return UNIT_WORDS[key]?.[quantity];
}

export interface UnitGuess {
  /** The unit recognised for the signal's quantity. */
  unit?: Unit;
  /** The unit text as written in the name, when there was one. */
  unitText?: string;
}

/** Find the unit written in a header: in brackets/parentheses, or as a trailing word. */
export function guessUnit(name: string, signal: Signal): UnitGuess {
  const quantity = SIGNAL_QUANTITY[signal];
  const bracketed = [...name.matchAll(/[[(]([^\])]+)[\])]/g)].map((m) => m[1]);
  if (bracketed.length > 0) {
    const text = bracketed[bracketed.length - 1];
    return { unit: normaliseUnit(text, quantity), unitText: text.trim() };
  }
  const words = name.split(/[\s_]+/).filter(Boolean);
  for (const w of words.slice(-2).reverse()) {
    const unit = normaliseUnit(w, quantity);
    if (unit) return { unit, unitText: w };
  }
  return {};
}
