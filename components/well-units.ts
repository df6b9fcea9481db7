// Display of the register's canonical oilfield values in the user's unit
// system (oilfield: psig, ft, °F, in; metric: kPag, m, °C, mm). Conversions
// come from lib/units (NIST SP 811 factors); this file only formats.
import { displayValue, ftToM, inToMm, type UnitSystem } from "@/lib/units/units";

export interface UnitLabels {
  length: string;
  diameter: string;
  pressure: string;
  /** A pressure difference has no gauge reference. */
  pressureDelta: string;
  temperature: string;
}

export const UNIT_LABELS: Record<UnitSystem, UnitLabels> = {
  oilfield: { length: "ft", diameter: "in", pressure: "psig", pressureDelta: "psi", temperature: "°F" },
  metric: { length: "m", diameter: "mm", pressure: "kPag", pressureDelta: "kPa", temperature: "°C" },
};

const fmt = (v: number, digits: number) =>
  v.toLocaleString("en-US", { minimumFractionDigits: digits, maximumFractionDigits: digits });

/** Depth or length, stored in ft. */
export function formatLength(ft: number | null | undefined, system: UnitSystem): string {
  if (ft == null) return "—";
  return system === "metric" ? fmt(ftToM(ft), 1) : fmt(ft, 0);
}

/** Gauge pressure, stored in psig. */
export function formatPressure(psig: number | null | undefined, system: UnitSystem): string {
  if (psig == null) return "—";
  return system === "metric" ? fmt(displayValue("pressure", psig, system), 0) : fmt(psig, 0);
}

/** Temperature, stored in °F. */
export function formatTemperature(f: number | null | undefined, system: UnitSystem): string {
  if (f == null) return "—";
  return system === "metric" ? fmt(displayValue("temperature", f, system), 1) : fmt(f, 0);
}

/** Pipe or valve diameter, stored in inches. */
export function formatDiameter(inch: number | null | undefined, system: UnitSystem): string {
  if (inch == null) return "—";
  return system === "metric" ? fmt(inToMm(inch), 1) : fmt(inch, 3);
}

/** Nominal valve size (1 or 1.5 in), named as the trade names it. */
export function formatValveSize(inch: number | null | undefined, system: UnitSystem): string {
  if (inch == null) return "—";
  return system === "metric" ? fmt(inToMm(inch), 1) : String(inch);
}

/** A pressure difference in psi; the psig→kPag conversion is a pure factor, so it serves here too. */
export function formatPressureDelta(psi: number | null | undefined, system: UnitSystem): string {
  return formatPressure(psi, system);
}

/**
 * Port size, stored in inches. In oilfield units ports are named in 64ths of
 * an inch (common practice), so the nearest 64th is shown beside the decimal.
 */
export function formatPort(inch: number | null | undefined, system: UnitSystem): string {
  if (inch == null) return "—";
  if (system === "metric") return fmt(inToMm(inch), 1);
  const sixtyFourths = Math.round(inch * 64);
  const exact = Math.abs(sixtyFourths / 64 - inch) < 1e-6;
  return `${fmt(inch, 3)} (${exact ? "" : "≈"}${sixtyFourths}/64)`;
}

/** A timestamp as a short UTC date and time; the register spans time zones. */
export function formatUpdated(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return "—";
  return `${d.toISOString().slice(0, 16).replace("T", " ")} UTC`;
}
