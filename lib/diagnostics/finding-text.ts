// Small helpers for the plain-words side of a finding.
import type { Annotations } from "@/lib/diagnostics/types";
import type { PreparedWell } from "@/lib/diagnostics/prepare-well";

export function formatNumber(v: number, digits = 0): string {
  return Number.isFinite(v) ? v.toLocaleString("en-US", { maximumFractionDigits: digits, minimumFractionDigits: digits }) : "n/a";
}

/** Reference lines for the casing-pressure chart: each unloading valve's surface closing and opening pressure. */
export function valveLevelLines(w: PreparedWell): Annotations["levels"] {
  const lines: Annotations["levels"] = [];
  for (const v of w.levels.unloading) {
    lines.push({ value: Math.round(v.surfaceClosingPsig as number), unit: "psig", label: `valve ${v.position} closing` });
    if (v.surfaceOpeningPsig !== null) lines.push({ value: Math.round(v.surfaceOpeningPsig), unit: "psig", label: `valve ${v.position} opening` });
  }
  return lines;
}
