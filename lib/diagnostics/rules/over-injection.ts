// Over-injection (DOMAIN.md §4): more gas gives no more liquid, and casing pressure
// rises (friction). We find a sustained rise in injection against the previous day
// and measure the liquid's answer as an elasticity, (Δq/q)/(Δqi/qi): on the flat
// part of the gas-lift performance curve it is near zero. Thresholds are Bellows'
// own defaults (settings.overInjection).
import type { DiagnosisInput, Finding } from "@/lib/diagnostics/types";
import { prepareWell, binTime, toBins, type PreparedWell } from "@/lib/diagnostics/prepare-well";
import { createRangeMean, medianOfRange } from "@/lib/diagnostics/stats/bins";
import { findRuns } from "@/lib/diagnostics/stats/runs";
import { scoreConfidence } from "@/lib/diagnostics/production-at-risk";
import { formatNumber } from "@/lib/diagnostics/finding-text";

export function detectOverInjection(input: DiagnosisInput, prepared?: PreparedWell): Finding[] {
  const w = prepared ?? prepareWell(input);
  if (!w.has.injection || !w.has.liquid) return [];
  const s = w.settings.overInjection;
  const inj = w.quiet.injection;
  const base = toBins(w, w.settings.general.baselineMinutes);
  const cmp = toBins(w, s.compareMinutes);
  const lag = toBins(w, 60);
  const hold = toBins(w, s.minDurationMinutes);
  const flags = new Uint8Array(w.nb);
  const rangeMean = createRangeMean(inj);
  const rise = 1 + s.minInjectionRiseFraction;
  for (let b = base; b + cmp <= w.nb; b++) {
    if (inj[b] !== inj[b]) continue;
    // Cheap screen on means; medians (robust to the odd bad reading) only where it passes.
    if (!(rangeMean(b, b + cmp) >= 0.9 * rise * rangeMean(b - base, b))) continue;
    const before = medianOfRange(inj, b - base, b);
    const after = medianOfRange(inj, b, b + cmp);
    if (before > 0 && after >= (1 + s.minInjectionRiseFraction) * before) flags[b] = 1;
  }
  const findings: Finding[] = [];
  let resumeAt = 0;
  for (const run of findRuns(flags, 1, 3)) {
    if (run.from < resumeAt) continue;
    // The window test fires up to compareMinutes early: the onset is where injection itself has risen.
    const injBefore = medianOfRange(inj, run.from - base, run.from);
    let onset = run.from;
    while (onset < w.nb - 1 && !(inj[onset] >= (1 + s.minInjectionRiseFraction / 2) * injBefore)) onset++;
    const liqBefore = medianOfRange(w.quiet.liquid, onset - base, onset);
    const injAfter = medianOfRange(inj, onset + lag, onset + lag + cmp);
    const liqAfter = medianOfRange(w.quiet.liquid, onset + lag, onset + lag + cmp);
    const cpBefore = medianOfRange(w.quiet.casing, onset - base, onset);
    const cpAfter = medianOfRange(w.quiet.casing, onset + lag, onset + lag + cmp);
    if (!(injBefore > 0 && liqBefore > 0)) continue;
    const dInj = injAfter / injBefore - 1;
    const dLiq = liqAfter / liqBefore - 1;
    const elasticity = dLiq / dInj;
    if (!(dInj >= s.minInjectionRiseFraction) || !(elasticity < s.maxLiquidElasticity)) continue;
    // Casing pressure must not fall: a falling casing pressure with more gas is a hole, not over-injection.
    if (cpAfter === cpAfter && cpBefore === cpBefore && cpAfter - cpBefore < -10) continue;
    // Sustained: injection stays up for the minimum duration.
    let end: number | null = null;
    for (let k = onset + lag; k < w.nb; k++) {
      if (inj[k] === inj[k] && inj[k] < (1 + s.minInjectionRiseFraction / 2) * injBefore && medianOfRange(inj, k, k + 6) < (1 + s.minInjectionRiseFraction / 2) * injBefore) { end = k; break; }
    }
    if ((end ?? w.nb) - onset < hold && end !== null) continue;
    resumeAt = end ?? w.nb;
    const wasted = Math.round(injAfter - injBefore);
    findings.push({
      rule: "over_injection",
      start: binTime(w, onset),
      end: end === null ? null : binTime(w, end),
      severity: Math.min(100, Math.round(25 + 40 * Math.min(1, dInj))),
      confidence: scoreConfidence(1 + (s.maxLiquidElasticity - elasticity) / s.maxLiquidElasticity, cpAfter - cpBefore > 5 ? 1 : 0),
      evidence: [
        { label: "Injection rise", value: Math.round(dInj * 1000) / 10, threshold: s.minInjectionRiseFraction * 100, unit: "%", text: `Injection rose ${formatNumber(dInj * 100)} % (${formatNumber(injBefore)} → ${formatNumber(injAfter)} Mscf/d) against the day before; the rule looks at rises of ${s.minInjectionRiseFraction * 100} % or more.` },
        { label: "Liquid response (elasticity)", value: Math.round(elasticity * 100) / 100, threshold: s.maxLiquidElasticity, unit: "ratio", text: `Liquid changed ${formatNumber(dLiq * 100, 1)} % (${formatNumber(liqBefore)} → ${formatNumber(liqAfter)} bbl/d): ${formatNumber(elasticity, 2)} % of liquid per % of gas, below ${s.maxLiquidElasticity}, so the extra gas buys nothing.` },
        { label: "Casing pressure change", value: Math.round(cpAfter - cpBefore), threshold: 0, unit: "psi", text: `Casing pressure moved ${formatNumber(cpAfter - cpBefore)} psi with the extra gas.` },
      ],
      summary: `Injection up ${formatNumber(dInj * 100)} % with no gain in liquid: about ${formatNumber(wasted)} Mscf/d of lift gas could go to another well.`,
      annotations: { windows: [{ start: binTime(w, onset), end: binTime(w, end ?? w.nb), label: "extra gas, no extra liquid" }], levels: [], operatingValve: null },
      productionAtRisk: { value: Math.max(0, wasted), unit: "Mscf/d", method: "injection gas above the pre-onset day's median that bought no extra liquid (gas that could lift another well)" },
    });
  }
  return findings;
}
