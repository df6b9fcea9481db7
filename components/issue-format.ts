// Small display helpers shared by the issue list, cards and page.
export function formatDuration(hours: number): string {
  if (!Number.isFinite(hours)) return "—";
  if (hours < 1) return `${Math.max(1, Math.round(hours * 60))} min`;
  if (hours < 48) return `${Math.round(hours)} h`;
  return `${Math.round(hours / 24)} d`;
}

export function formatRisk(value: number, unit: string): string {
  return `${value.toLocaleString("en-US", { maximumFractionDigits: 0 })} ${unit}`;
}

export function formatWhen(iso: string): string {
  const d = new Date(iso);
  return `${d.toISOString().slice(0, 10)} ${d.toISOString().slice(11, 16)} UTC`;
}

export function severityTone(severity: number): string {
  if (severity >= 70) return "bg-bad/15 text-bad";
  if (severity >= 40) return "bg-warn/15 text-warn";
  return "bg-paper-sunk text-ink-soft";
}
