// Liquid loading / insufficient gas (DOMAIN.md §4): produced gas below the Turner
// critical rate (Turner et al., JPT 1969, via lib/gaslift/liquid-loading.ts) at the
// well's own tubing pressure and tubing size, liquid falling, tubing pressure
// erratic with slugs, injection turning intermittent. Thresholds are Bellows' own
// defaults (settings.liquidLoading).
import type { DiagnosisInput, Finding } from "@/lib/diagnostics/types";
import { prepareWell, binTime, toBins, type PreparedWell } from "@/lib/diagnostics/prepare-well";
import { medianOfRange } from "@/lib/diagnostics/stats/bins";
import { rollingMean } from "@/lib/diagnostics/stats/rolling";
import { findRuns } from "@/lib/diagnostics/stats/runs";
import { createCriticalRateLookup } from "@/lib/diagnostics/critical-gas-rate";
import { estimateProductionAtRisk, scoreConfidence, scoreSeverity } from "@/lib/diagnostics/production-at-risk";
import { formatNumber } from "@/lib/diagnostics/finding-text";

export function detectLiquidLoading(input: DiagnosisInput, prepared?: PreparedWell): Finding[] {
  const w = prepared ?? prepareWell(input);
  if (!w.has.gas || !w.has.tubing) return [];
  const s = w.settings.liquidLoading;
  const critical = createCriticalRateLookup(w.input.design);
  const hour = toBins(w, 60);
  const gas = rollingMean(w.quiet.gas, hour);
  const tp = rollingMean(w.quiet.tubing, hour);
  const ratio = new Float64Array(w.nb).fill(NaN);
  const flags = new Uint8Array(w.nb);
  for (let b = 0; b < w.nb; b++) {
    if (w.quiet.gas[b] !== w.quiet.gas[b] || tp[b] !== tp[b]) continue;
    ratio[b] = gas[b] / critical(tp[b]);
    if (ratio[b] < s.criticalRateFactor) flags[b] = 1;
  }
  const base = toBins(w, w.settings.general.baselineMinutes);
  const findings: Finding[] = [];
  for (const run of findRuns(flags, toBins(w, s.minDurationMinutes), toBins(w, 40))) {
    const liqBefore = medianOfRange(w.quiet.liquid, run.from - base, run.from);
    const liqDuring = medianOfRange(w.quiet.liquid, run.from, run.to);
    const liqDrop = liqBefore > 0 ? 1 - liqDuring / liqBefore : NaN;
    if (liqDrop === liqDrop && liqDrop < s.minLiquidDropFraction) continue;
    const r = medianOfRange(ratio, run.from, run.to);
    const gasDuring = medianOfRange(gas, run.from, run.to);
    const tpDuring = medianOfRange(tp, run.from, run.to);
    const qc = critical(tpDuring);
    const injCv = coefficientOfVariation(w.quiet.injection, run.from, run.to);
    const isOpen = run.to >= w.nb - hour;
    const risk = estimateProductionAtRisk(w, run.from, run.to);
    const evidence: Finding["evidence"] = [
      { label: "Gas vs Turner critical rate", value: Math.round(r * 100) / 100, threshold: s.criticalRateFactor, unit: "ratio", text: `Produced gas ${formatNumber(gasDuring)} Mscf/d is ${formatNumber(r * 100)} % of the Turner critical rate (${formatNumber(qc)} Mscf/d at ${formatNumber(tpDuring)} psig in ${w.input.design.tubingIdIn}" tubing); below ${s.criticalRateFactor * 100} % liquid falls back.` },
    ];
    if (liqDrop === liqDrop) evidence.push({ label: "Liquid decline", value: Math.round(liqDrop * 1000) / 10, threshold: s.minLiquidDropFraction * 100, unit: "%", text: `Liquid fell ${formatNumber(liqDrop * 100)} % below the day before (${formatNumber(liqBefore)} → ${formatNumber(liqDuring)} bbl/d); the rule needs ${s.minLiquidDropFraction * 100} %.` });
    if (injCv === injCv) evidence.push({ label: "Injection unsteadiness", value: Math.round(injCv * 100), threshold: 30, unit: "%", text: `Injection varies by ${formatNumber(injCv * 100)} % (coefficient of variation of 10-min values); above about 30 % it is running intermittently.` });
    findings.push({
      rule: "liquid_loading",
      start: binTime(w, run.from),
      end: isOpen ? null : binTime(w, run.to),
      severity: scoreSeverity(55, risk),
      confidence: scoreConfidence(s.criticalRateFactor / Math.max(r, 0.05), (liqDrop >= s.minLiquidDropFraction ? 1 : 0) + (injCv > 0.3 ? 1 : 0)),
      evidence,
      summary: `Produced gas is below the critical rate to carry liquid (${formatNumber(r * 100)} % of Turner) and liquid is down: the well is loading up.`,
      annotations: { windows: [{ start: binTime(w, run.from), end: binTime(w, run.to), label: "gas below critical rate" }], levels: [], operatingValve: null },
      productionAtRisk: { value: risk.value, unit: risk.unit, method: risk.method },
    });
  }
  return findings;
}

function coefficientOfVariation(x: Float64Array, a: number, b: number): number {
  let s = 0, ss = 0, c = 0;
  for (let i = a; i < b; i++) {
    const v = x[i];
    if (v !== v) continue;
    s += v; ss += v * v; c++;
  }
  if (c < 3) return NaN;
  const m = s / c;
  return m > 0 ? Math.sqrt(Math.max(0, ss / c - m * m)) / m : NaN;
}
