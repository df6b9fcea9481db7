// A kick-off (unloading) as an engineer sees it on the casing-pressure trend
// (DOMAIN.md §1, common practice): a shut-in with casing pressure low, a ramp up
// to the top valve's opening pressure, then a step down of roughly the design
// step (10–25 psi) at each transfer to the next valve, a hold while that valve
// unloads, and finally a settle to the operating casing pressure on the orifice.
import type { ScenarioState } from "@/lib/scenario/scenario-state";

export interface KickoffPlan {
  /** Minute index where injection starts (end of shut-in). */
  startIndex: number;
  /** Casing pressure at the start of the ramp, psig. */
  fromCasingPsig: number;
  /** Ramp rate, psi per 10 min. */
  rampPsiPer10Min: number;
}

export interface KickoffResult {
  rampStart: number;
  rampEnd: number;
  /** Minute index where casing pressure has settled on the orifice. */
  endIndex: number;
}

/** Write a kick-off into the drivers from `plan.startIndex`; returns its phase boundaries (minute indexes). */
export function writeKickoff(state: ScenarioState, plan: KickoffPlan): KickoffResult {
  const { rng, well, n } = state;
  const open = well.openingPsig.filter((v) => Number.isFinite(v));
  const inj0 = well.injectionMscfd;
  const isFast = plan.rampPsiPer10Min > 60;
  let i = plan.startIndex;
  let cp = plan.fromCasingPsig;
  const top = (open[0] ?? well.casingPsig + 100) - rng.uniform(1, 4);
  const rampStart = i;
  // Ramp: casing pressure climbs at the chosen rate (with a little wobble).
  while (cp < top && i < n) {
    cp = Math.min(top, cp + (plan.rampPsiPer10Min / 10) * (1 + 0.15 * rng.normal()));
    const frac = (cp - plan.fromCasingPsig) / Math.max(1, top - plan.fromCasingPsig);
    setAt(state, i, cp, isFast ? 1.2 * inj0 : inj0 * (0.5 + 0.4 * frac), 0.25, 0);
    i++;
  }
  const rampEnd = i;
  // Holds and transfers, valve by valve.
  for (let k = 0; k < open.length && i < n; k++) {
    const level = open[k] - rng.uniform(2, 6);
    const hold = rng.int(30, 80);
    const progress = (k + 1) / (open.length + 1);
    for (let m = 0; m < hold && i < n; m++, i++) {
      setAt(state, i, level + 1.2 * Math.sin(m / 3), inj0, 0.3 + 0.6 * progress, 0.3 * progress);
    }
    const next = k + 1 < open.length ? open[k + 1] - rng.uniform(2, 6) : level;
    const transfer = rng.int(3, 6);
    for (let m = 1; m <= transfer && i < n && k + 1 < open.length; m++, i++) {
      setAt(state, i, level + ((next - level) * m) / transfer, inj0, 0.3 + 0.6 * progress, 0.3 * progress);
    }
  }
  // Settle from the last unloading valve to the operating casing pressure.
  const last = open.length ? open[open.length - 1] - 4 : top;
  const settle = rng.int(45, 90);
  for (let m = 1; m <= settle && i < n; m++, i++) {
    const f = m / settle;
    setAt(state, i, last + (well.casingPsig - last) * (1 - Math.cos(Math.PI * f)) / 2, inj0, 0.9 + 0.1 * f, 0.3 + 0.7 * f);
  }
  return { rampStart, rampEnd, endIndex: i };
}

/** Shut the well in over [from, to): no injection, no production, casing bleeds toward `toCasingPsig`. */
export function writeShutIn(state: ScenarioState, from: number, to: number, fromCasingPsig: number, toCasingPsig: number): void {
  for (let i = Math.max(0, from); i < Math.min(state.n, to); i++) {
    const m = i - from;
    state.casingForced[i] = toCasingPsig + (fromCasingPsig - toCasingPsig) * Math.exp(-m / 60);
    state.injection[i] = 0;
    state.liquidFactor[i] = 0;
    state.formationGasFactor[i] = 0;
  }
}

function setAt(state: ScenarioState, i: number, cp: number, inj: number, liquidFactor: number, formationGasFactor: number): void {
  state.casingForced[i] = cp;
  state.injection[i] = inj;
  state.liquidFactor[i] = liquidFactor;
  state.formationGasFactor[i] = formationGasFactor;
  state.tubingAdd[i] = 12;
}
