// Kick-off too fast (DOMAIN.md §1, §4): casing pressure rising faster than the safe
// ramp while unloading cuts valve seats with fluid. [memory] About 50 psi per 10 min
// until the top valve is uncovered (casing below the top valve's surface opening
// pressure, from lib/gaslift), then about 100 psi per 10 min (settings.fastKickoff).
// We read the rise between consecutive 10-minute bin medians inside each restart
// window found by quiet-masks (after a shut-in, until casing pressure settles).
import type { DiagnosisInput, Finding } from "@/lib/diagnostics/types";
import { prepareWell, type PreparedWell } from "@/lib/diagnostics/prepare-well";
import { binSeries } from "@/lib/diagnostics/stats/bins";
import { formatNumber, valveLevelLines } from "@/lib/diagnostics/finding-text";

export function detectFastKickoff(input: DiagnosisInput, prepared?: PreparedWell): Finding[] {
  const w = prepared ?? prepareWell(input);
  if (!w.has.casing) return [];
  const s = w.settings.fastKickoff;
  const cp = s.rampWindowMinutes === w.binSize ? w.bins.casing.median : binSeries(w.raw.casing, s.rampWindowMinutes).median;
  const perBin = s.rampWindowMinutes;
  const topOpening = w.levels.unloading[0]?.surfaceOpeningPsig ?? null;
  const findings: Finding[] = [];
  for (const k of w.masks.kickoffs) {
    if (k.from >= w.nb) continue;
    const from = Math.floor((k.from * w.binSize) / perBin) - 1;
    const to = Math.ceil((k.to * w.binSize) / perBin);
    let first = -1, last = -1, worst = 0, worstLimit = s.limitBeforeTopValvePsi;
    for (let j = Math.max(1, from); j < Math.min(cp.length, to); j++) {
      const rise = cp[j] - cp[j - 1];
      if (rise !== rise) continue;
      const limit = topOpening !== null && cp[j - 1] >= topOpening ? s.limitAfterTopValvePsi : s.limitBeforeTopValvePsi;
      if (rise > limit) {
        const next = j + 1 < cp.length ? cp[j + 1] - cp[j] : NaN;
        const prev = j >= 2 ? cp[j - 1] - cp[j - 2] : NaN;
        // Two rising intervals in a row: a ramp, not one noisy reading.
        if (!(next > 0.5 * limit || prev > 0.5 * limit)) continue;
        if (first < 0) first = j - 1;
        last = j;
        if (rise / limit > worst / worstLimit) { worst = rise; worstLimit = limit; }
      }
    }
    if (first < 0) continue;
    const startMs = w.t0 + first * perBin * 60_000;
    const endMs = w.t0 + (last + 1) * perBin * 60_000;
    findings.push({
      rule: "fast_kickoff",
      start: startMs,
      end: endMs,
      severity: Math.min(100, Math.round(35 + 20 * Math.min(2, worst / worstLimit - 1))),
      confidence: Math.min(0.99, Math.round((0.6 + 0.2 * Math.min(1.5, worst / worstLimit - 1)) * 100) / 100),
      evidence: [
        { label: "Casing pressure ramp", value: Math.round(worst), threshold: worstLimit, unit: `psi/${perBin} min`, text: `During the kick-off casing pressure rose ${formatNumber(worst)} psi in ${perBin} min; the safe ramp is about ${s.limitBeforeTopValvePsi} psi per ${perBin} min until the top valve is uncovered${topOpening !== null ? ` (${formatNumber(topOpening)} psig at surface)` : ""}, then ${s.limitAfterTopValvePsi} (from memory, tunable).` },
      ],
      summary: `Kick-off ramped casing pressure at ${formatNumber(worst)} psi per ${perBin} min, above the ${worstLimit} psi safe ramp: valve seats may be cut by fluid.`,
      annotations: { windows: [{ start: startMs, end: endMs, label: "ramp too fast" }], levels: valveLevelLines(w), operatingValve: null },
      productionAtRisk: { value: 0, unit: "bbl/d", method: "no immediate loss: the risk is valve damage that shows later as a leak" },
    });
  }
  return findings;
}
