// Everything the rules share about one well, computed once: typed minute arrays,
// 10-minute bin statistics, the valve levels at the well's own typical tubing
// pressure, and the "quiet" masks that keep confounders away from the rules.
import { median } from "simple-statistics";
import type { DiagnosisInput, SignalKey } from "@/lib/diagnostics/types";
import { SIGNAL_KEYS } from "@/lib/diagnostics/types";
import type { RuleSettings } from "@/lib/diagnostics/settings";
import { toFloat64 } from "@/lib/diagnostics/stats/series-prep";
import { binSeries, type Bins } from "@/lib/diagnostics/stats/bins";
import { alignToMinutes, isMinuteGrid, MINUTE_MS } from "@/lib/diagnostics/stats/resample";
import { computeValveLevels, findLowestClosingPsig, type WellValveLevels } from "@/lib/diagnostics/valve-levels";
import { findQuietMasks, type QuietMasks } from "@/lib/diagnostics/quiet-masks";

export interface PreparedWell {
  input: DiagnosisInput;
  settings: RuleSettings;
  t0: number;
  n: number;
  binSize: number;
  nb: number;
  raw: Record<SignalKey, Float64Array>;
  has: Record<SignalKey, boolean>;
  bins: Record<SignalKey, Bins>;
  /** Bin medians with every masked bin set to NaN (field events, shut-ins, kick-offs). */
  quiet: Record<SignalKey, Float64Array>;
  /** Quiet casing pressure with setpoint-change windows also removed (for step rules). */
  casingSteady: Float64Array;
  masks: QuietMasks;
  levels: WellValveLevels;
  lowestClosingPsig: number | null;
  typicalTubingPsig: number;
  typicalCasingPsig: number;
  typicalInjectionMscfd: number;
}

export function prepareWell(input: DiagnosisInput): PreparedWell {
  const settings = input.settings;
  const s = input.series;
  let t = s.t;
  let raw = Object.fromEntries(SIGNAL_KEYS.map((k) => [k, toFloat64(s[k], t.length)])) as Record<SignalKey, Float64Array>;
  if (!isMinuteGrid(t) && t.length > 1) {
    const aligned = alignToMinutes(t, SIGNAL_KEYS.map((k) => raw[k]));
    t = aligned.t;
    raw = Object.fromEntries(SIGNAL_KEYS.map((k, i) => [k, aligned.signals[i]])) as Record<SignalKey, Float64Array>;
  }
  const n = t.length;
  const binSize = settings.general.binMinutes;
  const bins = Object.fromEntries(SIGNAL_KEYS.map((k) => [k, binSeries(raw[k], binSize)])) as Record<SignalKey, Bins>;
  const has = Object.fromEntries(SIGNAL_KEYS.map((k) => [k, bins[k].count.some((c) => c > 0)])) as Record<SignalKey, boolean>;
  const nb = Math.ceil(n / binSize);
  const t0 = n > 0 ? t[0] : 0;
  const typical = (k: SignalKey) => typicalOf(bins[k].median);
  const typicalTubingPsig = typical("tubing");
  const typicalCasingPsig = typical("casing");
  const typicalInjectionMscfd = typical("injection");
  const levels = computeValveLevels(
    input.design,
    Number.isFinite(typicalTubingPsig) ? typicalTubingPsig : 150,
    Number.isFinite(typicalCasingPsig) ? typicalCasingPsig : undefined,
    Number.isFinite(typicalInjectionMscfd) ? typicalInjectionMscfd : undefined,
    settings.general.tubingGradientPsiPerFt,
  );
  const lowestClosingPsig = findLowestClosingPsig(levels);
  const masks = findQuietMasks({ t0, nb, binMs: binSize * MINUTE_MS, bins, has, settings, context: input.context, typicalCasingPsig, typicalInjectionMscfd, lowestClosingPsig });
  const quiet = Object.fromEntries(SIGNAL_KEYS.map((k) => [k, applyMask(bins[k].median, masks.quiet)])) as Record<SignalKey, Float64Array>;
  const casingSteady = applyMask(quiet.casing, masks.steps);
  return {
    input, settings, t0, n, binSize, nb, raw, has, bins, quiet, casingSteady, masks, levels, lowestClosingPsig,
    typicalTubingPsig, typicalCasingPsig, typicalInjectionMscfd,
  };
}

/** Time (epoch ms) of the start of bin b. */
export function binTime(w: PreparedWell, b: number): number {
  return w.t0 + b * w.binSize * MINUTE_MS;
}

/** Bin index holding time `ms` (clamped). */
export function binAt(w: PreparedWell, ms: number): number {
  return Math.max(0, Math.min(w.nb - 1, Math.floor((ms - w.t0) / (w.binSize * MINUTE_MS))));
}

/** Minutes → bins, at least 1. */
export function toBins(w: PreparedWell, minutes: number): number {
  return Math.max(1, Math.round(minutes / w.binSize));
}

function applyMask(values: Float64Array, mask: Uint8Array): Float64Array {
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) out[i] = mask[i] ? NaN : values[i];
  return out;
}

/** Median of finite bin medians (the well's usual level), NaN when none. */
function typicalOf(values: Float64Array): number {
  const xs: number[] = [];
  for (let i = 0; i < values.length; i++) if (values[i] === values[i]) xs.push(values[i]);
  return xs.length ? median(xs) : NaN;
}
