// Windows in which the rules stay quiet because the trends move for reasons that are
// not a well problem (DOMAIN.md §4 "Not a well problem"):
// - field events (a pad-wide supply outage), given by diagnose-pad;
// - the well's own shut-ins (injection off) and the kick-off or restart after them,
//   until casing pressure has settled (a normal kick-off steps down valve by valve);
// - planned injection setpoint changes, given or detected as a clean injection step
//   that casing pressure follows in the same direction; these only mask the
//   casing-pressure step rules (valve leak, multipointing), because over-injection is
//   judged precisely on how the well answers a rate change.
import type { Bins } from "@/lib/diagnostics/stats/bins";
import { medianOfRange } from "@/lib/diagnostics/stats/bins";
import { findRuns, type Run } from "@/lib/diagnostics/stats/runs";
import type { RuleSettings } from "@/lib/diagnostics/settings";
import type { DiagnosisContext, SignalKey } from "@/lib/diagnostics/types";

export interface QuietMasks {
  /** 1 = no rule reads this bin (data quality excepted). */
  quiet: Uint8Array;
  /** 1 = casing-pressure step rules skip this bin. */
  steps: Uint8Array;
  fieldEvent: Uint8Array;
  shutIns: Run[];
  /** Restart windows in bins: `from` is where injection came back, `to` where casing pressure settled. */
  kickoffs: Run[];
  /** Detected or given setpoint changes, bin index of the step. */
  setpointBins: number[];
}

export interface QuietMaskInput {
  t0: number;
  nb: number;
  binMs: number;
  bins: Record<SignalKey, Bins>;
  has: Record<SignalKey, boolean>;
  settings: RuleSettings;
  context?: DiagnosisContext;
  typicalCasingPsig: number;
  typicalInjectionMscfd: number;
  lowestClosingPsig: number | null;
}

export function findQuietMasks(p: QuietMaskInput): QuietMasks {
  const { nb, binMs, t0, settings } = p;
  const binMin = binMs / 60_000;
  const toBin = (ms: number) => Math.floor((ms - t0) / binMs);
  const quiet = new Uint8Array(nb);
  const steps = new Uint8Array(nb);
  const fieldEvent = new Uint8Array(nb);
  const mark = (arr: Uint8Array, from: number, to: number) => {
    for (let b = Math.max(0, from); b < Math.min(nb, to); b++) arr[b] = 1;
  };

  for (const ev of p.context?.fieldEvents ?? []) {
    mark(fieldEvent, toBin(ev.start), Math.ceil((ev.end - t0) / binMs));
  }
  for (let b = 0; b < nb; b++) if (fieldEvent[b]) quiet[b] = 1;

  // Shut-ins: injection off (or, with no injection tag, casing far below its usual level).
  const off = new Uint8Array(nb);
  const cp = p.bins.casing.median;
  const inj = p.bins.injection.median;
  const offLevel = settings.fieldEvents.outageFraction * p.typicalInjectionMscfd;
  for (let b = 0; b < nb; b++) {
    // Every reading in the bin must be off: intermittent injection (on and off within the hour) is not a shut-in.
    if (p.has.injection) off[b] = p.bins.injection.max[b] < offLevel ? 1 : 0;
    else if (p.has.casing) off[b] = cp[b] < p.typicalCasingPsig - settings.kickoff.minCasingRisePsi ? 1 : 0;
  }
  const shutIns = findRuns(off, Math.max(1, Math.round(settings.kickoff.minShutInMinutes / binMin)), 0);
  const kickoffs: Run[] = [];
  const settleBins = Math.max(2, Math.round(settings.kickoff.settleMinutes / binMin));
  const maxBins = Math.round(settings.kickoff.maxMinutes / binMin);
  for (const r of shutIns) {
    mark(quiet, r.from, r.to);
    const end = findSettled(cp, r.to, settleBins, maxBins, settings.kickoff.settleRangePsi, p.lowestClosingPsig);
    kickoffs.push({ from: r.to, to: end });
    mark(quiet, r.to, end);
  }

  // Setpoint changes.
  const setpointBins: number[] = [];
  for (const sc of p.context?.setpointChanges ?? []) setpointBins.push(toBin(sc.at));
  if (p.has.injection) setpointBins.push(...detectSetpointSteps(inj, cp, quiet, settings, binMin));
  const before = Math.round(settings.setpointChange.maskBeforeMinutes / binMin);
  const after = Math.round(settings.setpointChange.maskAfterMinutes / binMin);
  for (const b of setpointBins) mark(steps, b - before, b + after);
  return { quiet, steps, fieldEvent, shutIns, kickoffs, setpointBins };
}

/**
 * First bin after `from` (at least `settle` bins later) that ends `settle` bins of
 * casing pressure inside `range` psi, and below the lowest unloading valve's closing
 * pressure when that is known (gas has transferred to the operating point).
 */
function findSettled(cp: Float64Array, from: number, settle: number, maxBins: number, range: number, lowestClosing: number | null): number {
  const last = Math.min(cp.length, from + maxBins);
  for (let j = from + settle; j <= last; j++) {
    let lo = Infinity, hi = -Infinity, c = 0;
    for (let b = j - settle; b < j; b++) {
      const v = cp[b];
      if (v !== v) continue;
      c++;
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
    if (c < settle / 2) continue;
    if (hi - lo <= range && (lowestClosing === null || hi < lowestClosing)) return j;
  }
  return last;
}

/**
 * A clean injection step (≥ minStepFraction between the hour before and the hour
 * after, within one bin) that casing pressure follows the same way or barely
 * notices: the mark of an operator changing the setpoint.
 */
function detectSetpointSteps(inj: Float64Array, cp: Float64Array, quiet: Uint8Array, settings: RuleSettings, binMin: number): number[] {
  const cmp = Math.max(2, Math.round(60 / binMin));
  const cpLag = Math.max(1, Math.round(90 / binMin));
  const flags = new Uint8Array(inj.length);
  const shift = new Float64Array(inj.length);
  for (let b = cmp; b + 1 + cmp <= inj.length; b++) {
    if (quiet[b]) continue;
    const before = medianOfRange(inj, b - cmp, b);
    const after = medianOfRange(inj, b + 1, b + 1 + cmp);
    if (!(before > 0) || after !== after) continue;
    shift[b] = (after - before) / before;
    if (Math.abs(shift[b]) >= settings.setpointChange.minStepFraction) flags[b] = 1;
  }
  const out: number[] = [];
  for (const r of findRuns(flags, 1, 0)) {
    let best = r.from;
    for (let b = r.from; b < r.to; b++) if (Math.abs(shift[b]) > Math.abs(shift[best])) best = b;
    const cpBefore = medianOfRange(cp, best - cmp, best);
    const cpAfter = medianOfRange(cp, best + 1 + cpLag, best + 1 + cpLag + cmp);
    const dCp = cpAfter - cpBefore;
    const isFollowing = dCp !== dCp || Math.sign(dCp) === Math.sign(shift[best]) || Math.abs(dCp) < 10;
    if (isFollowing) out.push(best);
  }
  return out;
}
