// Multipointing (DOMAIN.md §4): gas passes through more than one valve at once.
// Casing pressure sits at or around an upper unloading valve's surface closing
// pressure (so that valve can be open: lib/gaslift inferOperatingPoint), with an
// irregular sawtooth as the valve throttles; injection may exceed what one port
// passes by Thornhill–Craver. Thresholds are Bellows' own defaults (settings.multipointing).
import type { DiagnosisInput, Finding } from "@/lib/diagnostics/types";
import { prepareWell, binTime, toBins, type PreparedWell } from "@/lib/diagnostics/prepare-well";
import { binSeries, medianOfRange, quantileOfRange } from "@/lib/diagnostics/stats/bins";
import { rollingMean } from "@/lib/diagnostics/stats/rolling";
import { findRuns } from "@/lib/diagnostics/stats/runs";
import { computeValveLevels, findNearestUnloadingValve } from "@/lib/diagnostics/valve-levels";
import { estimateProductionAtRisk, scoreConfidence, scoreSeverity } from "@/lib/diagnostics/production-at-risk";
import { formatNumber, valveLevelLines } from "@/lib/diagnostics/finding-text";

/** Casing-pressure roughness per bin: RMS about a 31-min centered moving mean, over about an hour. */
export function computeCasingRoughness(w: PreparedWell): Float64Array {
  const cp = w.raw.casing;
  const smooth = rollingMean(cp, 31);
  const sq = new Float64Array(cp.length);
  for (let i = 0; i < cp.length; i++) {
    const d = cp[i] - smooth[i];
    sq[i] = d * d;
  }
  const perBin = binSeries(sq, w.binSize, false).mean;
  const hour = rollingMean(perBin, toBins(w, 60));
  for (let b = 0; b < hour.length; b++) hour[b] = Math.sqrt(hour[b]);
  return hour;
}

export function detectMultipointing(input: DiagnosisInput, prepared?: PreparedWell): Finding[] {
  const w = prepared ?? prepareWell(input);
  if (!w.has.casing) return [];
  const s = w.settings.multipointing;
  const cp = w.casingSteady;
  const rough = computeCasingRoughness(w);
  const history = toBins(w, 3 * 1440);
  const lowestClose = w.lowestClosingPsig;
  const flags = new Uint8Array(w.nb);
  for (let b = 0; b < w.nb; b++) {
    const v = cp[b];
    if (v !== v || !(rough[b] >= s.minRoughnessPsi)) continue;
    // High enough that an unloading valve can be open (or, with no design, well above the usual level).
    const floor = lowestClose !== null ? lowestClose - s.levelTolerancePsi : quantileOfRange(cp, b - history, b, 0.1) + 2 * s.levelTolerancePsi;
    if (v >= floor) flags[b] = 1;
  }
  const findings: Finding[] = [];
  for (const run of findRuns(flags, toBins(w, s.minDurationMinutes), toBins(w, 30))) {
    const level = medianOfRange(cp, run.from, run.to);
    const tp = medianOfRange(w.quiet.tubing, run.from, run.to);
    const inj = medianOfRange(w.quiet.injection, run.from, run.to);
    const roughness = medianOfRange(rough, run.from, run.to);
    const at = computeValveLevels(w.input.design, tp === tp ? tp : w.typicalTubingPsig, level, inj === inj ? inj : undefined, w.settings.general.tubingGradientPsiPerFt);
    // The throttling valve closes at the bottom of each tooth: match the troughs (bin minima) to closing pressures.
    const trough = medianOfRange(w.bins.casing.min, run.from, run.to);
    const nearest = findNearestUnloadingValve(w.levels, trough);
    const capacity = at.operatingPoint?.portCapacityMscfd ?? null;
    const openPoints = at.operatingPoint?.openPositions ?? [];
    const isOpen = run.to >= lastCasingBin(cp) - 1;
    const risk = estimateProductionAtRisk(w, run.from, run.to);
    const evidence: Finding["evidence"] = [
      { label: "Casing pressure sawtooth", value: Math.round(roughness * 10) / 10, threshold: s.minRoughnessPsi, unit: "psi", text: `Casing pressure swings irregularly (RMS ${formatNumber(roughness, 1)} psi about its 30-min mean; the rule needs ${s.minRoughnessPsi} psi) for ${formatNumber(((run.to - run.from) * w.binSize) / 60, 1)} h.` },
    ];
    if (nearest && nearest.surfaceClosingPsig !== null) {
      evidence.push({ label: `Near valve ${nearest.position} closing pressure`, value: Math.round(trough - nearest.surfaceClosingPsig), threshold: s.levelTolerancePsi, unit: "psi", text: `Casing pressure saws between ${formatNumber(trough)} and about ${formatNumber(2 * level - trough)} psig; its troughs sit ${formatNumber(trough - nearest.surfaceClosingPsig)} psi from unloading valve ${nearest.position}'s surface closing pressure (${formatNumber(nearest.surfaceClosingPsig)} psig): that valve can be passing gas as well as the operating point.` });
    }
    if (openPoints.length > 1) {
      evidence.push({ label: "Points that can pass gas", value: openPoints.length, threshold: 1, unit: "count", text: `At this casing and tubing pressure the valve design allows gas through ${openPoints.length} points (positions ${openPoints.join(", ")}).` });
    }
    if (capacity !== null && inj === inj) {
      evidence.push({ label: "Injection vs one-port capacity", value: Math.round(inj), threshold: Math.round(capacity * s.capacityTolerance), unit: "Mscf/d", text: `Injection ${formatNumber(inj)} Mscf/d against ${formatNumber(capacity)} Mscf/d that the operating port can pass by Thornhill–Craver (more than ${s.capacityTolerance}× would need a second point).` });
    }
    const supporting = (openPoints.length > 1 ? 1 : 0) + (capacity !== null && inj > capacity * s.capacityTolerance ? 1 : 0);
    findings.push({
      rule: "multipointing",
      start: binTime(w, run.from),
      end: isOpen ? null : binTime(w, run.to),
      severity: scoreSeverity(50, risk),
      confidence: scoreConfidence(roughness / s.minRoughnessPsi, supporting),
      evidence,
      summary: `Casing pressure sawtooths around ${formatNumber(level)} psig${nearest ? `, at unloading valve ${nearest.position}'s closing pressure` : ""}: gas is likely passing through more than one valve.`,
      annotations: {
        windows: [{ start: binTime(w, run.from), end: binTime(w, run.to), label: "sawtooth at an upper valve" }],
        levels: valveLevelLines(w),
        operatingValve: nearest?.position ?? null,
      },
      productionAtRisk: { value: risk.value, unit: risk.unit, method: risk.method },
    });
  }
  return findings;
}

function lastCasingBin(cp: Float64Array): number {
  for (let b = cp.length - 1; b >= 0; b--) if (cp[b] === cp[b]) return b;
  return 0;
}
