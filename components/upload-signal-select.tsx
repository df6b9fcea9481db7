// Selects for a signal and for a unit that fits the signal's quantity
// (pressure units for a pressure, gas rates for a gas rate, …).
import { SIGNALS, SIGNAL_LABEL, SIGNAL_QUANTITY, type Signal } from "@/lib/signals";
import { UNITS } from "@/lib/units/units";

const UNIT_TEXT: Record<string, string> = { degF: "°F", degC: "°C" };

export function unitText(unit: string): string {
  return UNIT_TEXT[unit] ?? unit;
}

export function SignalSelect({
  id,
  value,
  onChange,
  emptyLabel = "Not used",
  label,
}: {
  id: string;
  value: Signal | "";
  onChange: (s: Signal | "") => void;
  emptyLabel?: string;
  label?: string;
}) {
  return (
    <select id={id} aria-label={label} className="field-input" value={value} onChange={(e) => onChange(e.target.value as Signal | "")}>
      <option value="">{emptyLabel}</option>
      {SIGNALS.map((s) => <option key={s} value={s}>{SIGNAL_LABEL[s]}</option>)}
    </select>
  );
}

export function UnitSelect({
  id,
  signal,
  value,
  onChange,
  label,
}: {
  id: string;
  signal: Signal | "";
  value: string;
  onChange: (u: string) => void;
  label?: string;
}) {
  const units: readonly string[] = signal ? UNITS[SIGNAL_QUANTITY[signal]] : [];
  return (
    <select id={id} aria-label={label} className="field-input" value={value} disabled={!signal} onChange={(e) => onChange(e.target.value)}>
      <option value="">{signal ? "Not set (values refused)" : "—"}</option>
      {units.map((u) => <option key={u} value={u}>{unitText(u)}</option>)}
    </select>
  );
}
