// Production at risk of a finding, against the well's own pre-onset baseline.
// Method (ours, stated in every finding): median liquid rate over the baseline
// window before the onset minus the median during the finding, floored at zero;
// gas rate (produced minus injected, i.e. formation gas) when no liquid is measured.
import type { ProductionAtRisk } from "@/lib/diagnostics/types";
import { medianOfRange } from "@/lib/diagnostics/stats/bins";
import { toBins, type PreparedWell } from "@/lib/diagnostics/prepare-well";

/** Loss vs baseline over bins [from, to). */
export function estimateProductionAtRisk(w: PreparedWell, from: number, to: number): ProductionAtRisk & { baseline: number; during: number } {
  const base = toBins(w, w.settings.general.baselineMinutes);
  const settle = toBins(w, 30);
  const end = Math.max(to, from + settle + 1);
  if (w.has.liquid) {
    const baseline = medianOfRange(w.quiet.liquid, from - base, from);
    const during = medianOfRange(w.quiet.liquid, from + settle, end);
    if (baseline === baseline && during === during) {
      return {
        value: Math.max(0, Math.round(baseline - during)),
        unit: "bbl/d",
        method: `liquid: median of the ${Math.round(w.settings.general.baselineMinutes / 60)} h before onset (${Math.round(baseline)} bbl/d) minus median during the finding (${Math.round(during)} bbl/d)`,
        baseline,
        during,
      };
    }
  }
  if (w.has.gas) {
    const formation = (a: number, b: number) => medianOfRange(w.quiet.gas, a, b) - (w.has.injection ? medianOfRange(w.quiet.injection, a, b) : 0);
    const baseline = formation(from - base, from);
    const during = formation(from + settle, end);
    if (baseline === baseline && during === during) {
      return {
        value: Math.max(0, Math.round(baseline - during)),
        unit: "Mscf/d",
        method: "formation gas (produced minus injected): median before onset minus median during the finding",
        baseline,
        during,
      };
    }
  }
  return { value: 0, unit: "bbl/d", method: "no liquid or gas rate to compare with a baseline", baseline: NaN, during: NaN };
}

/** Severity 0..100: a rule's base weight plus the share of production lost. */
export function scoreSeverity(baseWeight: number, risk: { baseline: number; value: number }): number {
  const share = risk.baseline > 0 ? risk.value / risk.baseline : 0;
  return Math.round(Math.min(100, Math.max(0, baseWeight + 60 * share)));
}

/** Confidence 0..1 from how far a statistic clears its threshold (ratio ≥ 1), plus supporting evidence. */
export function scoreConfidence(ratio: number, supporting = 0): number {
  const margin = Math.min(1, Math.max(0, ratio - 1));
  return Math.round(Math.min(0.99, 0.55 + 0.3 * margin + 0.07 * supporting) * 100) / 100;
}
