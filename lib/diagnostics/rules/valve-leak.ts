// Unloading valve stuck open, leaking or cut out (DOMAIN.md §4): a step drop in
// casing pressure to a level below the well's normal operating level and below an
// upper valve's closing pressure, which it does not leave; injection not down (so
// it is not a supply or setpoint cut), often up, and production down.
// Detection thresholds are Bellows' own defaults (settings.valveLeak).
import type { DiagnosisInput, Finding } from "@/lib/diagnostics/types";
import { prepareWell, binTime, toBins, type PreparedWell } from "@/lib/diagnostics/prepare-well";
import { medianOfRange, quantileOfRange } from "@/lib/diagnostics/stats/bins";
import { findRuns } from "@/lib/diagnostics/stats/runs";
import { estimateProductionAtRisk, scoreConfidence, scoreSeverity } from "@/lib/diagnostics/production-at-risk";
import { formatNumber, valveLevelLines } from "@/lib/diagnostics/finding-text";

export function detectValveLeak(input: DiagnosisInput, prepared?: PreparedWell): Finding[] {
  const w = prepared ?? prepareWell(input);
  if (!w.has.casing) return [];
  const s = w.settings.valveLeak;
  const cp = w.casingSteady;
  const cmp = toBins(w, s.compareMinutes);
  const gap = toBins(w, s.maxTransitionMinutes);
  const hold = toBins(w, s.minDurationMinutes);
  const history = toBins(w, 3 * 1440);
  const shift = new Float64Array(w.nb);
  const flags = new Uint8Array(w.nb);
  for (let b = cmp; b + gap + cmp <= w.nb; b++) {
    if (cp[b] !== cp[b]) continue;
    const before = medianOfRange(cp, b - cmp, b);
    const after = medianOfRange(cp, b + gap, b + gap + cmp);
    shift[b] = after - before;
    if (shift[b] <= -s.minDropPsi) flags[b] = 1;
  }
  const findings: Finding[] = [];
  for (const run of findRuns(flags, 1, 1)) {
    let b = run.from;
    for (let k = run.from; k < run.to; k++) if (shift[k] < shift[b]) b = k;
    const onset = refineOnset(cp, b, cmp, gap, shift[b]);
    const before = medianOfRange(cp, onset - cmp, onset);
    const held = medianOfRange(cp, onset + gap, onset + gap + hold);
    const usualLow = quantileOfRange(cp, onset - history, onset, 0.1);
    // It must stay down (cannot be raised) and sit below the well's usual low, not just come back from a high.
    if (!(held <= before - 0.8 * s.minDropPsi)) continue;
    if (!(held <= usualLow - 0.5 * s.minDropPsi)) continue;
    const injBefore = medianOfRange(w.quiet.injection, onset - cmp, onset);
    const injAfter = medianOfRange(w.quiet.injection, onset + gap, onset + gap + hold);
    const injChange = injBefore > 0 ? injAfter / injBefore - 1 : NaN;
    if (injChange === injChange && injChange < -s.maxInjectionDropFraction) continue;
    const endBin = findRecovery(cp, onset + gap, before - 0.5 * s.minDropPsi, cmp);
    if (findings.length && findings[findings.length - 1].end === null) continue;
    const risk = estimateProductionAtRisk(w, onset, endBin ?? w.nb);
    const drop = before - held;
    const lowestClose = w.lowestClosingPsig;
    const evidence: Finding["evidence"] = [
      { label: "Casing pressure drop", value: Math.round(drop), threshold: s.minDropPsi, unit: "psi", text: `Casing pressure stepped down ${formatNumber(drop)} psi (from ${formatNumber(before)} to ${formatNumber(held)} psig) within ${s.maxTransitionMinutes} min and stayed there for at least ${s.minDurationMinutes / 60} h; the rule needs a drop of ${s.minDropPsi} psi.` },
      { label: "Below usual low", value: Math.round(usualLow - held), threshold: Math.round(0.5 * s.minDropPsi), unit: "psi", text: `The new level is ${formatNumber(usualLow - held)} psi below the lowest tenth of the previous 3 days' casing pressure (${formatNumber(usualLow)} psig).` },
    ];
    if (injChange === injChange) {
      evidence.push({ label: "Injection change", value: Math.round(injChange * 1000) / 10, threshold: -s.maxInjectionDropFraction * 100, unit: "%", text: `Injection changed ${formatNumber(injChange * 100, 1)} % (not a supply or setpoint cut: the rule rejects drops beyond ${s.maxInjectionDropFraction * 100} %).` });
    }
    if (lowestClose !== null) {
      evidence.push({ label: "Below lowest valve closing pressure", value: Math.round(lowestClose - held), threshold: 0, unit: "psi", text: `Casing pressure ${formatNumber(held)} psig is ${formatNumber(lowestClose - held)} psi under the lowest unloading valve's surface closing pressure (${formatNumber(lowestClose)} psig): gas is being taken at a level the design does not explain.` });
    }
    findings.push({
      rule: "valve_leak",
      start: binTime(w, onset),
      end: endBin === null ? null : binTime(w, endBin),
      severity: scoreSeverity(55, risk),
      confidence: scoreConfidence(drop / s.minDropPsi, (injChange > 0.02 ? 1 : 0) + (risk.value > 0 ? 1 : 0)),
      evidence,
      summary: `Casing pressure stepped down ${formatNumber(drop)} psi and stays low with injection ${injChange >= 0 ? "up" : "steady"}: an unloading valve may be stuck open, leaking or cut out.`,
      annotations: {
        windows: [{ start: binTime(w, onset), end: binTime(w, endBin ?? w.nb), label: "casing pressure down" }],
        levels: [...valveLevelLines(w), { value: Math.round(before), unit: "psig", label: "level before" }],
        operatingValve: null,
      },
      productionAtRisk: { value: risk.value, unit: risk.unit, method: risk.method },
    });
  }
  return findings;
}

/**
 * The first bin of the drop. The before/after test flags a plateau of bins around the
 * step; the onset is the first bin already past half of the largest drop.
 */
function refineOnset(cp: Float64Array, b: number, cmp: number, gap: number, drop: number): number {
  const halfway = medianOfRange(cp, b - cmp, b) + drop / 2;
  for (let k = Math.max(0, b - cmp); k < Math.min(cp.length, b + gap + cmp); k++) {
    if (cp[k] === cp[k] && cp[k] < halfway) return k;
  }
  return b;
}

/** First bin whose following `window` bins sit back above `level`, or null when the drop lasts to the end. */
function findRecovery(cp: Float64Array, from: number, level: number, window: number): number | null {
  for (let b = from; b + window <= cp.length; b++) {
    if (cp[b] !== cp[b] || cp[b] < level) continue;
    if (medianOfRange(cp, b, b + window) >= level) return b;
  }
  return null;
}
