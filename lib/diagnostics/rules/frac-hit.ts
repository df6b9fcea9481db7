// Frac hit / reload (DOMAIN.md §1, §4): an abrupt rise in tubing pressure, formation
// gas lost, a liquid spike then a decline; recovery after a new kick-off. We find a
// tubing-pressure step (levels over the 2 h before and after, transition within
// 30 min) that holds, and close the finding when tubing pressure is back near its
// pre-event level. Thresholds are Bellows' own defaults (settings.fracHit).
import type { DiagnosisInput, Finding } from "@/lib/diagnostics/types";
import { prepareWell, binTime, toBins, type PreparedWell } from "@/lib/diagnostics/prepare-well";
import { medianOfRange } from "@/lib/diagnostics/stats/bins";
import { findRuns } from "@/lib/diagnostics/stats/runs";
import { estimateProductionAtRisk, scoreConfidence, scoreSeverity } from "@/lib/diagnostics/production-at-risk";
import { formatNumber } from "@/lib/diagnostics/finding-text";

export function detectFracHit(input: DiagnosisInput, prepared?: PreparedWell): Finding[] {
  const w = prepared ?? prepareWell(input);
  if (!w.has.tubing) return [];
  const s = w.settings.fracHit;
  const tp = w.quiet.tubing;
  const cmp = toBins(w, s.compareMinutes);
  const gap = toBins(w, s.maxTransitionMinutes);
  const hold = toBins(w, s.minDurationMinutes);
  const shift = new Float64Array(w.nb);
  const flags = new Uint8Array(w.nb);
  for (let b = cmp; b + gap + cmp <= w.nb; b++) {
    if (tp[b] !== tp[b]) continue;
    const before = medianOfRange(tp, b - cmp, b);
    const after = medianOfRange(tp, b + gap, b + gap + cmp);
    shift[b] = after - before;
    if (shift[b] >= Math.max(s.minTubingRisePsi, s.minTubingRiseFraction * before)) flags[b] = 1;
  }
  const findings: Finding[] = [];
  let resumeAt = 0;
  for (const run of findRuns(flags, 1, 1)) {
    if (run.from < resumeAt) continue;
    let b = run.from;
    for (let k = run.from; k < run.to; k++) if (shift[k] > shift[b]) b = k;
    const before = medianOfRange(tp, b - cmp, b);
    let onset = b;
    // The before/after test flags a plateau of bins: the onset is the first bin actually past half the rise.
    for (let k = Math.max(0, b - cmp); k < Math.min(w.nb, b + gap + cmp); k++) if (tp[k] === tp[k] && tp[k] > before + 0.5 * shift[b]) { onset = k; break; }
    const held = medianOfRange(tp, onset + 1, onset + 1 + hold);
    if (!(held - before >= 0.7 * shift[b])) continue;
    const clearLevel = before * (1 + s.recoveryFraction);
    let end: number | null = null;
    for (let k = onset + hold; k + 3 <= w.nb; k++) {
      if (tp[k] === tp[k] && tp[k] <= clearLevel && medianOfRange(tp, k, k + 3) <= clearLevel) { end = k; break; }
    }
    resumeAt = end ?? w.nb;
    const formation = (a: number, z: number) => medianOfRange(w.quiet.gas, a, z) - (w.has.injection ? medianOfRange(w.quiet.injection, a, z) : 0);
    const fgBefore = w.has.gas ? formation(onset - cmp, onset) : NaN;
    const fgAfter = w.has.gas ? formation(onset + 2, onset + 2 + hold) : NaN;
    const liqPeak = maxOfRange(w.quiet.liquid, onset, onset + toBins(w, 120));
    const liqBefore = medianOfRange(w.quiet.liquid, onset - cmp, onset);
    const risk = estimateProductionAtRisk(w, onset, end ?? w.nb);
    const rise = held - before;
    const evidence: Finding["evidence"] = [
      { label: "Tubing pressure rise", value: Math.round(rise), threshold: Math.round(Math.max(s.minTubingRisePsi, s.minTubingRiseFraction * before)), unit: "psi", text: `Tubing pressure jumped ${formatNumber(rise)} psi (${formatNumber(before)} → ${formatNumber(held)} psig) within ${s.maxTransitionMinutes} min and held; the rule needs ${s.minTubingRisePsi} psi and ${s.minTubingRiseFraction * 100} % of the level before.` },
    ];
    if (fgBefore === fgBefore && fgAfter === fgAfter) evidence.push({ label: "Formation gas lost", value: Math.round(fgBefore - fgAfter), threshold: 0, unit: "Mscf/d", text: `Formation gas (produced minus injected) fell from ${formatNumber(fgBefore)} to ${formatNumber(fgAfter)} Mscf/d.` });
    if (liqPeak === liqPeak && liqBefore > 0) evidence.push({ label: "Liquid spike", value: Math.round((liqPeak / liqBefore - 1) * 100), threshold: 0, unit: "%", text: `Liquid peaked ${formatNumber((liqPeak / liqBefore - 1) * 100)} % above its level before, then declined.` });
    const supporting = (fgBefore - fgAfter > 0.3 * Math.max(fgBefore, 1) ? 1 : 0) + (liqPeak > 1.15 * liqBefore ? 1 : 0);
    findings.push({
      rule: "frac_hit",
      start: binTime(w, onset),
      end: end === null ? null : binTime(w, end),
      severity: scoreSeverity(65, risk),
      confidence: scoreConfidence(rise / Math.max(s.minTubingRisePsi, s.minTubingRiseFraction * before), supporting),
      evidence,
      summary: `Tubing pressure jumped ${formatNumber(rise)} psi and formation gas dropped: likely an offset frac hit loading the well; kick it off again once the offset job allows.`,
      annotations: { windows: [{ start: binTime(w, onset), end: binTime(w, end ?? w.nb), label: "tubing pressure up" }], levels: [], operatingValve: null },
      productionAtRisk: { value: risk.value, unit: risk.unit, method: risk.method },
    });
  }
  return findings;
}

function maxOfRange(x: Float64Array, a: number, b: number): number {
  let m = -Infinity;
  for (let i = Math.max(0, a); i < Math.min(x.length, b); i++) if (x[i] > m) m = x[i];
  return m === -Infinity ? NaN : m;
}
