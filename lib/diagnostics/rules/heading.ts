// Heading (DOMAIN.md §4): periodic instability. Tubing pressure and produced gas
// swing with a period of minutes to hours; casing pressure swings smaller and
// lagged. We look for a dominant period by autocorrelation (a peak after the
// autocorrelation has dipped below zero) with an amplitude above a threshold
// relative to the mean. Asheim (1988) gives stability criteria from well data; the
// thresholds here are Bellows' own defaults (settings.heading), not his.
import type { DiagnosisInput, Finding } from "@/lib/diagnostics/types";
import { prepareWell, type PreparedWell } from "@/lib/diagnostics/prepare-well";
import { binSeries } from "@/lib/diagnostics/stats/bins";
import { autocorrelation, findDominantPeriod } from "@/lib/diagnostics/stats/autocorrelation";
import { rollingMean } from "@/lib/diagnostics/stats/rolling";
import { estimateProductionAtRisk, scoreConfidence, scoreSeverity } from "@/lib/diagnostics/production-at-risk";
import { formatNumber } from "@/lib/diagnostics/finding-text";
import { MINUTE_MS } from "@/lib/diagnostics/stats/resample";

const STEP_MIN = 5;

interface WindowHit {
  from: number;
  to: number;
  lag: number;
  acf: number;
  relAmp: number;
}

export function detectHeading(input: DiagnosisInput, prepared?: PreparedWell): Finding[] {
  const w = prepared ?? prepareWell(input);
  if (!w.has.tubing) return [];
  const s = w.settings.heading;
  const x = binSeries(w.raw.tubing, STEP_MIN, false).mean;
  maskQuiet(w, x);
  const win = Math.round(s.windowMinutes / STEP_MIN);
  const step = Math.max(1, Math.round(s.stepMinutes / STEP_MIN));
  const minLag = Math.max(2, Math.round(s.minPeriodMinutes / STEP_MIN));
  const maxLag = Math.min(Math.floor(win / 2), Math.round(s.maxPeriodMinutes / STEP_MIN));
  const acf = new Float64Array(maxLag + 2);
  const hits: WindowHit[] = [];
  for (let a = 0; a + win <= x.length; a += step) {
    const { mean, sd, count } = detrendedSpread(x, a, a + win);
    if (count < 0.7 * win || !(mean > 0)) continue;
    const relAmp = sd / mean;
    if (relAmp < s.minRelativeAmplitude) continue;
    autocorrelation(x, a, a + win, maxLag + 1, acf);
    const p = findDominantPeriod(acf, minLag, maxLag);
    if (p && p.value >= s.minAutocorrelation) hits.push({ from: a, to: a + win, lag: p.lag, acf: p.value, relAmp });
  }
  const findings: Finding[] = [];
  for (const group of groupHits(hits, step)) {
    const lag = medianOf(group.map((h) => h.lag));
    const env = envelope(x, lag);
    const first = group[0], last = group[group.length - 1];
    const meanLevel = medianOf(group.map((h) => h.relAmp));
    let from = first.from, to = last.to;
    const level = (k: number) => env.rel[k] >= 0.9 * s.minRelativeAmplitude;
    while (from < first.to && !level(from)) from++;
    while (to > last.from && !level(to - 1)) to--;
    if ((to - from) * STEP_MIN < s.minDurationMinutes) continue;
    const startMs = w.t0 + from * STEP_MIN * MINUTE_MS;
    const endMs = w.t0 + to * STEP_MIN * MINUTE_MS;
    const isOpen = to >= x.length - Math.round(60 / STEP_MIN);
    const b0 = Math.floor((from * STEP_MIN) / w.binSize), b1 = Math.ceil((to * STEP_MIN) / w.binSize);
    const risk = estimateProductionAtRisk(w, b0, b1);
    const acfBest = Math.max(...group.map((h) => h.acf));
    const gasSwing = w.has.gas ? relativeSpread(binSeries(w.raw.gas, STEP_MIN, false).mean, from, to) : NaN;
    const evidence: Finding["evidence"] = [
      { label: "Dominant period", value: lag * STEP_MIN, threshold: s.minPeriodMinutes, unit: "min", text: `Tubing pressure repeats every ~${lag * STEP_MIN} min (autocorrelation ${formatNumber(acfBest, 2)} at that lag; the rule needs ${s.minAutocorrelation} for a period of ${s.minPeriodMinutes}–${s.maxPeriodMinutes} min).` },
      { label: "Tubing pressure swing", value: Math.round(meanLevel * 1000) / 10, threshold: s.minRelativeAmplitude * 100, unit: "%", text: `Tubing pressure standard deviation is ${formatNumber(meanLevel * 100, 1)} % of its mean (threshold ${s.minRelativeAmplitude * 100} %).` },
    ];
    if (gasSwing === gasSwing) evidence.push({ label: "Produced gas swing", value: Math.round(gasSwing * 1000) / 10, threshold: s.minRelativeAmplitude * 100, unit: "%", text: `Produced gas swings with it: standard deviation ${formatNumber(gasSwing * 100, 1)} % of its mean.` });
    findings.push({
      rule: "heading",
      start: startMs,
      end: isOpen ? null : endMs,
      severity: scoreSeverity(40, risk),
      confidence: scoreConfidence(acfBest / s.minAutocorrelation, (gasSwing >= s.minRelativeAmplitude ? 1 : 0) + (group.length > 2 ? 1 : 0)),
      evidence,
      summary: `Tubing pressure and production cycle every ~${lag * STEP_MIN} min (swing ${formatNumber(meanLevel * 100, 0)} % of mean): the well is heading.`,
      annotations: { windows: [{ start: startMs, end: endMs, label: `cycles every ~${lag * STEP_MIN} min` }], levels: [], operatingValve: null },
      productionAtRisk: { value: risk.value, unit: risk.unit, method: risk.method },
    });
  }
  return findings.filter((f) => (f.end ?? Infinity) > f.start);
}

function maskQuiet(w: PreparedWell, x: Float64Array): void {
  for (let k = 0; k < x.length; k++) {
    const b = Math.floor((k * STEP_MIN) / w.binSize);
    if (w.masks.quiet[b]) x[k] = NaN;
  }
}

/** Mean and standard deviation about a least-squares line over values[a, b). */
function detrendedSpread(x: Float64Array, a: number, b: number): { mean: number; sd: number; count: number } {
  let sx = 0, sy = 0, sxx = 0, sxy = 0, c = 0;
  for (let i = a; i < b; i++) {
    const y = x[i];
    if (y !== y) continue;
    const t = i - a;
    sx += t; sy += y; sxx += t * t; sxy += t * y; c++;
  }
  if (c < 3) return { mean: NaN, sd: NaN, count: c };
  const den = c * sxx - sx * sx;
  const slope = den ? (c * sxy - sx * sy) / den : 0;
  const icpt = (sy - slope * sx) / c;
  let ss = 0;
  for (let i = a; i < b; i++) {
    const y = x[i];
    if (y !== y) continue;
    const r = y - icpt - slope * (i - a);
    ss += r * r;
  }
  return { mean: sy / c, sd: Math.sqrt(ss / c), count: c };
}

function relativeSpread(x: Float64Array, a: number, b: number): number {
  const { mean, sd } = detrendedSpread(x, a, b);
  return mean > 0 ? sd / mean : NaN;
}

/** Consecutive (or overlapping) flagged windows. */
function groupHits(hits: WindowHit[], step: number): WindowHit[][] {
  const groups: WindowHit[][] = [];
  for (const h of hits) {
    const g = groups[groups.length - 1];
    if (g && h.from - g[g.length - 1].from <= 2 * step) g.push(h);
    else groups.push([h]);
  }
  return groups;
}

/** Relative swing around a one-period moving mean, smoothed over a period: ≈ 0.9 × (sd/mean) for a sine. */
function envelope(x: Float64Array, period: number): { rel: Float64Array } {
  const m = rollingMean(x, period);
  const dev = new Float64Array(x.length);
  for (let i = 0; i < x.length; i++) dev[i] = Math.abs(x[i] - m[i]) / m[i];
  return { rel: rollingMean(dev, period) };
}

function medianOf(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const h = s.length >> 1;
  return s.length % 2 ? s[h] : (s[h - 1] + s[h]) / 2;
}
