// One writer per signature. Each changes the driver arrays of a ScenarioState over
// a window and records the labelled window. The shapes follow DOMAIN.md §4; sizes
// (psi, %, minutes) are our own plausible choices for invented data.
import type { ScenarioState } from "@/lib/scenario/scenario-state";
import { timeAt } from "@/lib/scenario/scenario-state";
import { writeKickoff, writeShutIn } from "@/lib/scenario/kickoff-profile";

const HOUR = 60;

function label(state: ScenarioState, kind: ScenarioState["labels"][number]["kind"], from: number, to: number, isConfounder = false): void {
  state.labels.push({ kind, isConfounder, start: timeAt(state, from), end: to >= state.n ? null : timeAt(state, to) });
}

/** Smooth 0→1 over `len` minutes starting at `from`. */
function rise(i: number, from: number, len: number): number {
  if (i < from) return 0;
  if (i >= from + len) return 1;
  return (1 - Math.cos((Math.PI * (i - from)) / len)) / 2;
}

/**
 * Multipointing: the orifice cannot pass the gas (partly plugged), casing pressure
 * climbs to an upper unloading valve's closing pressure and the valve throttles:
 * a sawtooth between its closing and opening pressures, injection and tubing
 * pressure unsteady, liquid down.
 */
export function writeMultipointing(state: ScenarioState, from: number, to: number): void {
  const { rng, well, n } = state;
  const close = well.closingPsig;
  const open = well.openingPsig;
  const k = close.length >= 2 && rng.chance(0.3) ? close.length - 2 : close.length - 1;
  const lift = close[k] - well.casingPsig;
  const amp = Math.min(30, Math.max(12, open[k] - close[k]));
  const injUp = rng.uniform(1.06, 1.12);
  const liqDown = rng.uniform(0.8, 0.9);
  let cycleStart = from + HOUR;
  let riseLen = rng.int(8, 25);
  let dropLen = rng.int(2, 4);
  let a = amp * rng.uniform(0.7, 1.1);
  for (let i = from; i < Math.min(n, to); i++) {
    const r = rise(i, from, HOUR);
    state.casingUnclamped[i] = 1;
    state.casingOffset[i] += lift * r;
    state.injection[i] *= 1 + (injUp - 1) * r;
    state.liquidFactor[i] *= 1 + (liqDown - 1) * r;
    state.injectionJitter[i] = 0.03 * r;
    if (i < cycleStart) continue;
    const m = i - cycleStart;
    if (m < riseLen) state.casingAdd[i] += (a * m) / riseLen;
    else if (m < riseLen + dropLen) {
      state.casingAdd[i] += a * (1 - (m - riseLen) / dropLen);
      state.tubingAdd[i] += rng.uniform(4, 10);
    } else {
      cycleStart = i;
      riseLen = rng.int(8, 25);
      dropLen = rng.int(2, 4);
      a = amp * rng.uniform(0.7, 1.1);
    }
  }
  label(state, "multipointing", from, to);
}

/** Heading: periodic swings of tubing pressure and produced gas, casing smaller and lagged. */
export function writeHeading(state: ScenarioState, from: number, to: number): void {
  const { rng, n } = state;
  const period = rng.uniform(30, 150);
  const a = rng.uniform(0.15, 0.3);
  const cpAmp = rng.uniform(1.5, 3);
  let phase = 0;
  const wave = (p: number) => Math.sin(p) + 0.35 * Math.sin(2 * p + 0.5);
  for (let i = from; i < Math.min(n, to); i++) {
    phase += ((2 * Math.PI) / period) * (1 + 0.03 * rng.normal());
    const r = rise(i, from, 30) * (1 - rise(i, to - 30, 30));
    state.tubingFactor[i] *= 1 + a * r * wave(phase);
    state.gasFactor[i] *= 1 + 0.8 * a * r * wave(phase - 0.3);
    // An unstable well also lifts less on average (our invented demo loss, half the
    // swing amplitude), so heading carries a production cost like the other problems.
    state.liquidWave[i] *= (1 - 0.5 * a * r) * (1 + 0.6 * a * r * wave(phase - 0.6));
    state.casingAdd[i] += cpAmp * r * wave(phase - Math.PI / 2);
  }
  label(state, "heading", from, to);
}

/**
 * Unloading valve stuck open or cut out: casing pressure steps down to a level it
 * cannot leave, injection up a little (gas takes the shallow hole), liquid down.
 */
export function writeValveLeak(state: ScenarioState, from: number, to: number): void {
  const { rng, n } = state;
  const drop = rng.uniform(45, 90);
  const injUp = rng.uniform(1.03, 1.1);
  const liqDown = rng.uniform(0.6, 0.8);
  const len = rng.int(4, 12);
  for (let i = from; i < Math.min(n, to); i++) {
    const r = rise(i, from, len);
    state.casingOffset[i] -= drop * r;
    state.injection[i] *= 1 + (injUp - 1) * r;
    state.liquidFactor[i] *= 1 + (liqDown - 1) * r;
    state.tubingAdd[i] += 5 * r;
  }
  label(state, "valve_leak", from, to);
}

/**
 * Liquid loading: the gas supply to the well falls, produced gas drops below the
 * Turner critical rate, injection turns intermittent, tubing pressure slugs and
 * liquid declines.
 */
export function writeLiquidLoading(state: ScenarioState, from: number, to: number): void {
  const { rng, well, n } = state;
  const targetGas = rng.uniform(0.45, 0.7) * well.criticalGasMscfd;
  const low = Math.max(60, targetGas - 0.3 * well.formationGasMscfd);
  const liqDown = rng.uniform(0.5, 0.65);
  const end = Math.min(n, to);
  let on = true;
  let switchAt = from + 2 * HOUR;
  let nextSlug = from + rng.int(10, 40);
  for (let i = from; i < end; i++) {
    const r = rise(i, from, 2 * HOUR) * (1 - rise(i, to - 2 * HOUR, 2 * HOUR));
    if (i >= switchAt) { on = !on; switchAt = i + (on ? rng.int(15, 40) : rng.int(10, 30)); }
    const lowNow = i >= from + 2 * HOUR ? low * (on ? 1.5 : 0.3) : low;
    state.injection[i] = state.injection[i] * (1 - r) + lowNow * r;
    state.formationGasFactor[i] *= 1 - 0.7 * rise(i, from, 6 * HOUR) * (1 - rise(i, to - 2 * HOUR, 2 * HOUR));
    state.liquidFactor[i] *= 1 - (1 - liqDown) * rise(i, from, 6 * HOUR) * (1 - rise(i, to - 2 * HOUR, 2 * HOUR));
    state.tubingAdd[i] += 10 * r;
    if (i >= nextSlug && r > 0.5) {
      const h = rng.uniform(15, 50);
      const len = rng.int(3, 8);
      for (let j = 0; j < len && i + j < end; j++) state.tubingAdd[i + j] += h * (1 - Math.abs(2 * j / len - 1));
      nextSlug = i + rng.int(12, 40);
    }
  }
  label(state, "liquid_loading", from, to);
}

/**
 * Frac hit: tubing pressure jumps, formation gas is lost, a liquid spike then a
 * decline; the operator shuts in and kicks the well off again, and it recovers.
 */
export function writeFracHit(state: ScenarioState, from: number): number {
  const { rng, well, n } = state;
  const jump = rng.uniform(80, 200);
  const hold = rng.int(10, 30) * HOUR;
  const shutLen = rng.int(60, 120);
  const kickAt = Math.min(n, from + hold + shutLen);
  for (let i = from; i < Math.min(n, from + hold); i++) {
    const m = i - from;
    state.tubingAdd[i] += jump * rise(i, from, rng.int(5, 10) || 5);
    state.formationGasFactor[i] *= 0.05 + 0.95 * (1 - rise(i, from, 20));
    const spike = m < 90 ? 1 + 0.6 * Math.sin((Math.PI * m) / 90) : 1;
    state.liquidFactor[i] *= spike * (0.4 + 0.6 * Math.exp(-m / 180));
    state.casingOffset[i] += 15 * rise(i, from, 30);
  }
  const cpNow = well.casingPsig + 15;
  writeShutIn(state, from + hold, kickAt, cpNow, well.tubingPsig + jump + rng.uniform(30, 80));
  for (let i = from + hold; i < kickAt; i++) state.tubingAdd[i] += jump;
  const kick = writeKickoff(state, { startIndex: kickAt, fromCasingPsig: well.tubingPsig + jump + 40, rampPsiPer10Min: rng.uniform(20, 38) });
  const recoverEnd = Math.min(n, kick.endIndex + 3 * HOUR);
  for (let i = kickAt; i < recoverEnd; i++) {
    const f = i < kick.endIndex ? 1 : 1 - rise(i, kick.endIndex, 3 * HOUR);
    state.tubingAdd[i] += jump * f;
  }
  label(state, "frac_hit", from, recoverEnd);
  return recoverEnd;
}

/** Over-injection: injection raised in two steps, liquid does not respond, casing pressure rises. */
export function writeOverInjection(state: ScenarioState, from: number): void {
  const { rng, n } = state;
  const first = rng.uniform(0.22, 0.32);
  const total = rng.uniform(0.45, 0.7);
  const second = from + rng.int(3, 8) * HOUR;
  for (let i = from; i < n; i++) {
    const up = first * rise(i, from, 5) + (total - first) * rise(i, second, 5);
    state.injection[i] *= 1 + up;
    state.elasticity[i] = -0.03;
  }
  label(state, "over_injection", from, n);
}

/** A kick-off after a shut-in; fast when `rampPsiPer10Min` exceeds the safe ramp. */
export function writeShutInAndKickoff(state: ScenarioState, from: number, rampPsiPer10Min: number, kind: "kickoff" | "fast_kickoff"): number {
  const { rng, well } = state;
  const shut = rng.int(3, 10) * HOUR;
  const low = well.tubingPsig + rng.uniform(60, 160);
  writeShutIn(state, from, from + shut, well.casingPsig, low);
  const fromCp = low + (well.casingPsig - low) * Math.exp(-shut / 60);
  const k = writeKickoff(state, { startIndex: from + shut, fromCasingPsig: fromCp, rampPsiPer10Min });
  if (kind === "kickoff") label(state, "kickoff", from, k.endIndex + HOUR, true);
  else label(state, "fast_kickoff", k.rampStart, k.rampEnd);
  return k.endIndex;
}

/** A planned injection setpoint change: a clean step, casing pressure and liquid follow smoothly. */
export function writeSetpointChange(state: ScenarioState, from: number): void {
  const { rng, n, well } = state;
  const up = rng.chance(0.5);
  const f = up ? rng.uniform(0.12, 0.2) : -rng.uniform(0.15, 0.25);
  const len = rng.int(3, 8);
  const before = state.injection[from];
  for (let i = from; i < n; i++) state.injection[i] *= 1 + f * rise(i, from, len);
  state.setpointChanges.push({ at: timeAt(state, from), fromMscfd: Math.round(before), toMscfd: Math.round(well.injectionMscfd * (1 + f)) });
  label(state, "setpoint_change", from - 30, from + 6 * HOUR, true);
}

/** A supply outage (compressor down) over [from, to): casing bleeds down, production falls; then recovery. */
export function writeOutage(state: ScenarioState, from: number, to: number): void {
  const { rng, well, n } = state;
  const low = well.tubingPsig + rng.uniform(60, 140);
  writeShutIn(state, from, to, well.casingPsig, low);
  for (let i = from; i < Math.min(n, to); i++) { state.liquidFactor[i] = 0.15; state.formationGasFactor[i] = 0.3; }
  const bled = low + (well.casingPsig - low) * Math.exp(-(to - from) / 60);
  const rate = rng.uniform(25, 40) / 10;
  let i = to;
  for (let cp = bled; cp < well.casingPsig && i < n; cp += rate, i++) {
    state.casingForced[i] = cp;
    state.liquidFactor[i] = 0.15 + 0.85 * rise(i, to, 2 * HOUR);
  }
  for (let j = i; j < Math.min(n, to + 2 * HOUR); j++) state.liquidFactor[j] = 0.15 + 0.85 * rise(j, to, 2 * HOUR);
  label(state, "pad_outage", from, Math.max(i, to + 2 * HOUR), true);
}

/**
 * Data-quality defects: a flatlined tubing-pressure tag, a long casing-pressure
 * gap and a burst of impossible injection readings. Applied to the rendered series.
 */
export function writeDataDefects(state: ScenarioState, series: { tubing: Float64Array; casing: Float64Array; injection: Float64Array }, at: number[]): void {
  const { rng, n } = state;
  const [a, b, c] = at;
  const flatLen = rng.int(6, 14) * HOUR;
  const v = Math.round(series.tubing[a - 1] || state.well.tubingPsig);
  for (let i = a; i < Math.min(n, a + flatLen); i++) series.tubing[i] = v;
  label(state, "data_quality", a, a + flatLen);
  const gapLen = rng.int(3, 6) * HOUR;
  for (let i = b; i < Math.min(n, b + gapLen); i++) series.casing[i] = NaN;
  label(state, "data_quality", b, b + gapLen);
  const burst = 10 * HOUR;
  const count = rng.int(5, 8);
  for (let s = 0; s < count; s++) {
    const i = c + rng.int(0, burst - 1);
    if (i < n) series.injection[i] = rng.chance(0.5) ? -100 : series.injection[i] * rng.uniform(5, 8);
  }
  label(state, "data_quality", c, c + burst);
}
