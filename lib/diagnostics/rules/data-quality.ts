// Data quality (DOMAIN.md §2, §4): flatlined tags, long gaps, spikes and impossible
// values, per signal on the raw minutes. A flat zero on a rate is a shut-in, not a
// stuck tag. A spike is a reading far from its neighbours (Hampel-style: the
// distance to the median of the 6 minutes around it, in robust standard deviations
// of its hour, with a floor of 3 % of the level so slugging flow is not a spike).
// Thresholds are Bellows' own defaults (settings.dataQuality).
import type { DiagnosisInput, Finding, SignalKey } from "@/lib/diagnostics/types";
import { SIGNAL_KEYS } from "@/lib/diagnostics/types";
import { prepareWell, type PreparedWell } from "@/lib/diagnostics/prepare-well";
import { medianInPlace } from "@/lib/diagnostics/stats/bins";
import { MAD_TO_SIGMA } from "@/lib/diagnostics/stats/robust-z";
import { MINUTE_MS } from "@/lib/diagnostics/stats/resample";
import { formatNumber } from "@/lib/diagnostics/finding-text";

const LABEL: Record<SignalKey, string> = { casing: "Casing pressure", tubing: "Tubing pressure", injection: "Injection rate", gas: "Produced gas rate", liquid: "Liquid rate" };
const UNIT: Record<SignalKey, string> = { casing: "psig", tubing: "psig", injection: "Mscf/d", gas: "Mscf/d", liquid: "bbl/d" };
const IS_RATE: Record<SignalKey, boolean> = { casing: false, tubing: false, injection: true, gas: true, liquid: true };

export function detectDataQuality(input: DiagnosisInput, prepared?: PreparedWell): Finding[] {
  const w = prepared ?? prepareWell(input);
  const findings: Finding[] = [];
  for (const key of SIGNAL_KEYS) {
    if (!w.has[key]) continue;
    findings.push(...findFlatlines(w, key), ...findGaps(w, key), ...findSpikes(w, key));
  }
  return findings;
}

function findFlatlines(w: PreparedWell, key: SignalKey): Finding[] {
  const s = w.settings.dataQuality;
  const x = w.raw[key];
  const out: Finding[] = [];
  let start = 0;
  for (let i = 1; i <= x.length; i++) {
    const same = i < x.length && x[i] === x[i - 1] && x[i] === x[i];
    if (same) continue;
    const len = i - start;
    const v = x[start];
    const isZeroRate = IS_RATE[key] && Math.abs(v) < 1e-9;
    if (len >= s.flatlineMinutes && v === v && !isZeroRate) {
      out.push(makeFinding(w, key, start, i, {
        label: `${LABEL[key]} flatlined`, value: len, threshold: s.flatlineMinutes, unit: "min",
        text: `${LABEL[key]} read exactly ${formatNumber(v, 1)} ${UNIT[key]} for ${formatNumber(len / 60, 1)} h; a live tag moves within ${s.flatlineMinutes / 60} h.`,
      }, `${LABEL[key]} is stuck at one value: the tag or transmitter may be frozen.`));
    }
    start = i;
  }
  return out;
}

function findGaps(w: PreparedWell, key: SignalKey): Finding[] {
  const s = w.settings.dataQuality;
  const x = w.raw[key];
  const out: Finding[] = [];
  let start = -1;
  for (let i = 0; i <= x.length; i++) {
    const missing = i < x.length && x[i] !== x[i];
    if (missing && start < 0) start = i;
    if (!missing && start >= 0) {
      const len = i - start;
      // A gap that runs into the end of the data may just be data not yet loaded: report only closed gaps.
      if (len >= s.gapMinutes && i < x.length) {
        out.push(makeFinding(w, key, start, i, {
          label: `${LABEL[key]} missing`, value: len, threshold: s.gapMinutes, unit: "min",
          text: `${LABEL[key]} has no readings for ${formatNumber(len / 60, 1)} h (the rule reports gaps of ${s.gapMinutes / 60} h or more).`,
        }, `${LABEL[key]} data is missing for ${formatNumber(len / 60, 1)} h.`));
      }
      start = -1;
    }
  }
  return out;
}

function findSpikes(w: PreparedWell, key: SignalKey): Finding[] {
  const s = w.settings.dataQuality;
  const x = w.raw[key];
  const n = x.length;
  const hourMed = new Float64Array(Math.ceil(n / 60));
  const hourSigma = new Float64Array(hourMed.length);
  const buf = new Float64Array(60);
  for (let h = 0; h < hourMed.length; h++) {
    let k = 0;
    for (let i = h * 60; i < Math.min(n, h * 60 + 60); i++) if (x[i] === x[i]) buf[k++] = x[i];
    const med = medianInPlace(buf, k);
    for (let j = 0; j < k; j++) buf[j] = Math.abs(buf[j] - med);
    const mad = medianInPlace(buf, k);
    hourMed[h] = med;
    hourSigma[h] = Math.max(MAD_TO_SIGMA * mad, 0.03 * Math.abs(med), 1);
  }
  const spikes: number[] = [];
  for (let h = 0; h < hourMed.length; h++) {
    const med = hourMed[h];
    const sigma = hourSigma[h];
    const screen = s.spikeRobustZ * sigma;
    for (let i = h * 60; i < Math.min(n, h * 60 + 60); i++) {
      const v = x[i];
      if (v !== v) continue;
      const isImpossible = IS_RATE[key] ? v < -0.5 || v > s.maxRate : v < -15 || v > s.maxPressurePsig;
      if (isImpossible) { spikes.push(i); continue; }
      // Cheap screen first: only readings far from their hour's median need the neighbour check.
      if (!(Math.abs(v - med) > screen)) continue;
      // A spike stands apart from BOTH sides (a step edge matches one side and is not a spike).
      const left = median3(x, i - 3, i - 1);
      const right = median3(x, i + 1, i + 3);
      if (left !== left || right !== right) continue;
      // The 3 % floor also follows the neighbours' level: an hour that is mostly shut in has a tiny MAD.
      const limit = s.spikeRobustZ * Math.max(sigma, 0.03 * Math.max(Math.abs(left), Math.abs(right)));
      if ((v - left > limit && v - right > limit) || (left - v > limit && right - v > limit)) spikes.push(i);
    }
  }
  // Clusters: spikes no more than 6 h apart; report a cluster with at least spikesPerDay spikes in it.
  const out: Finding[] = [];
  let a = 0;
  for (let b = 1; b <= spikes.length; b++) {
    if (b < spikes.length && spikes[b] - spikes[b - 1] <= 360) continue;
    const count = b - a;
    if (count >= s.spikesPerDay) {
      out.push(makeFinding(w, key, spikes[a], spikes[b - 1] + 1, {
        label: `${LABEL[key]} spikes`, value: count, threshold: s.spikesPerDay, unit: "count",
        text: `${count} readings of ${LABEL[key].toLowerCase()} were impossible or more than ${s.spikeRobustZ} robust standard deviations from their neighbours (the rule reports ${s.spikesPerDay} or more close together).`,
      }, `${LABEL[key]} has ${count} spikes or impossible readings.`));
    }
    a = b;
  }
  return out;
}

function makeFinding(w: PreparedWell, key: SignalKey, from: number, to: number, evidence: Finding["evidence"][number], summary: string): Finding {
  const start = w.t0 + from * MINUTE_MS;
  const end = w.t0 + to * MINUTE_MS;
  return {
    rule: "data_quality",
    start,
    end,
    severity: 20,
    confidence: 0.9,
    evidence: [evidence],
    summary,
    annotations: { windows: [{ start, end, label: `${key} data` }], levels: [], operatingValve: null },
    productionAtRisk: { value: 0, unit: "bbl/d", method: "data quality: no production estimate (other rules may be blind here)" },
  };
}

/** Median of the finite values among x[a..b] (at most 3 of them), without allocating. */
function median3(x: Float64Array, a: number, b: number): number {
  let p = NaN, q = NaN, r = NaN, k = 0;
  for (let j = Math.max(0, a); j <= Math.min(x.length - 1, b); j++) {
    const v = x[j];
    if (v !== v) continue;
    if (k === 0) p = v; else if (k === 1) q = v; else r = v;
    k++;
  }
  if (k === 0) return NaN;
  if (k === 1) return p;
  if (k === 2) return (p + q) / 2;
  return Math.max(Math.min(p, q), Math.min(Math.max(p, q), r));
}
