// Small display helpers for upload screens.

export function formatBytes(n: number): string {
  if (!Number.isFinite(n) || n < 0) return "—";
  if (n < 1024) return `${n} B`;
  const units = ["KB", "MB", "GB"];
  let v = n / 1024;
  let i = 0;
  while (v >= 1024 && i < units.length - 1) {
    v /= 1024;
    i++;
  }
  return `${v.toFixed(v < 10 ? 1 : 0)} ${units[i]}`;
}

export function formatCount(n: number | undefined): string {
  return (n ?? 0).toLocaleString("en-US");
}

/** "2026-03-04 14:05" in the viewer's own zone; the history is about when things happened here. */
export function formatWhen(iso: string | null | undefined): string {
  if (!iso) return "—";
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return "—";
  const p = (x: number) => String(x).padStart(2, "0");
  return `${d.getFullYear()}-${p(d.getMonth() + 1)}-${p(d.getDate())} ${p(d.getHours())}:${p(d.getMinutes())}`;
}

/** Reject reasons in plain words (keys are lib/ingest REJECT_REASONS). */
export const REJECT_REASON_LABEL: Record<string, string> = {
  status_text: "status text instead of a value",
  blank: "blank",
  unparseable_time: "time not readable",
  nonexistent_local_time: "local time skipped by a clock change",
  out_of_range: "outside the plausible range",
  unknown_tag: "tag not mapped",
  unknown_well: "well not in the register",
  unparseable_value: "value not a number",
  malformed_row: "broken row",
  unknown_unit: "unit not chosen",
};
