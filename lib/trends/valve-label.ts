// Text of the valve reference lines on the casing-pressure panel, e.g.
// "V1 open 1,012 psig": V<position> counted from the top mandrel, as the valve
// string table numbers them.
import { DISPLAY_UNITS, displayValue, type UnitSystem } from "@/lib/units/units";

export type ValveLineKind = "open" | "close";

const NUMBER = new Intl.NumberFormat("en-US", { maximumFractionDigits: 0 });

/** A pressure in the reader's unit system, rounded to a whole number, with its unit. */
export function formatPressure(psig: number, system: UnitSystem): string {
  return `${NUMBER.format(displayValue("pressure", psig, system))} ${DISPLAY_UNITS[system].pressure}`;
}

export function formatValveLabel(position: number, kind: ValveLineKind, psig: number, system: UnitSystem = "oilfield"): string {
  return `V${position} ${kind} ${formatPressure(psig, system)}`;
}

/** How the inferred operating point reads in the legend. */
export function formatOperatingValve(position: number | null, openPositions: readonly number[]): string {
  if (position === null) return "Operating valve: none can pass gas at the recent casing pressure";
  const others = openPositions.filter((p) => p !== position);
  const base = `Operating valve (inferred): V${position}`;
  return others.length === 0 ? base : `${base}; V${others.join(", V")} can also pass gas`;
}
