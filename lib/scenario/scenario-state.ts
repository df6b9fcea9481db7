// The driver arrays a synthetic well is built from, and how they turn into
// measured signals. Effects (scenario-effects.ts) write the drivers; `renderSeries`
// applies the well's simple response model, sensor noise and telemetry gaps.
//
// Response model (plain, stated assumptions, not a flow simulator):
// - liquid follows injection along a gas-lift performance curve with elasticity
//   `elasticity` ((Δq/q)/(Δqi/qi), ~0.35 in the normal range) and a 45-min lag;
// - casing pressure follows injection (an orifice passes more gas at higher
//   upstream pressure, DOMAIN.md §3 Thornhill–Craver) with a 12-min annulus lag,
//   kept below the lowest unloading valve's closing pressure unless an effect
//   lifts that limit;
// - produced gas = injection + formation gas in proportion to liquid.
import type { DemoWell } from "@/lib/scenario/demo-design";
import type { Rng } from "@/lib/scenario/prng";
import type { ScenarioLabel, ScenarioSeries } from "@/lib/scenario/scenario-types";

export const MINUTE_MS = 60_000;
/** psi of casing pressure per unit fractional change of injection (our assumption). */
const CASING_PSI_PER_INJECTION_FRACTION = 120;
const CASING_LAG_MIN = 12;
const LIQUID_LAG_MIN = 45;

export interface ScenarioState {
  n: number;
  start: number;
  rng: Rng;
  well: DemoWell;
  /** Commanded injection, Mscf/d. */
  injection: Float64Array;
  elasticity: Float64Array;
  liquidFactor: Float64Array;
  formationGasFactor: Float64Array;
  casingOffset: Float64Array;
  /** Casing pressure imposed directly (kick-off, outage); NaN = use the model. */
  casingForced: Float64Array;
  /** 1 where casing pressure may exceed the unloading valves' closing pressures. */
  casingUnclamped: Uint8Array;
  /** Added after the lag: sawtooth, lagged heading swing. */
  casingAdd: Float64Array;
  tubingAdd: Float64Array;
  tubingFactor: Float64Array;
  gasFactor: Float64Array;
  liquidWave: Float64Array;
  /** Extra white noise, as a fraction, on injection and liquid (unsteady flow). */
  injectionJitter: Float64Array;
  labels: ScenarioLabel[];
  setpointChanges: { at: number; fromMscfd: number; toMscfd: number }[];
}

export function createState(well: DemoWell, rng: Rng, start: number, n: number): ScenarioState {
  const f = (v: number) => new Float64Array(n).fill(v);
  return {
    n, start, rng, well,
    injection: f(well.injectionMscfd),
    elasticity: f(0.35),
    liquidFactor: f(1),
    formationGasFactor: f(1),
    casingOffset: f(0),
    casingForced: f(NaN),
    casingUnclamped: new Uint8Array(n),
    casingAdd: f(0),
    tubingAdd: f(0),
    tubingFactor: f(1),
    gasFactor: f(1),
    liquidWave: f(1),
    injectionJitter: f(0),
    labels: [],
    setpointChanges: [],
  };
}

export function timeAt(state: ScenarioState, i: number): number {
  return state.start + i * MINUTE_MS;
}

/** Turn the drivers into noisy minute signals with gaps. */
export function renderSeries(state: ScenarioState): ScenarioSeries {
  const { n, rng, well } = state;
  const t = new Float64Array(n);
  const casing = new Float64Array(n);
  const tubing = new Float64Array(n);
  const injection = new Float64Array(n);
  const gas = new Float64Array(n);
  const liquid = new Float64Array(n);
  const inj0 = well.injectionMscfd;
  const cap = well.lowestClosingPsig - 25;
  let cp = well.casingPsig;
  let liq = well.liquidBbld;
  let arCp = 0, arTp = 0, arInj = 0;
  for (let i = 0; i < n; i++) {
    t[i] = state.start + i * MINUTE_MS;
    const day = (2 * Math.PI * i) / 1440;
    const inj = Math.max(0, state.injection[i]);
    const ratio = inj / inj0;
    // Casing pressure: model with lag, or imposed.
    const forced = state.casingForced[i];
    if (forced === forced) {
      cp = forced;
    } else {
      let target = well.casingPsig + CASING_PSI_PER_INJECTION_FRACTION * (ratio - 1) + state.casingOffset[i];
      if (!state.casingUnclamped[i]) target = Math.min(target, cap);
      cp += (target - cp) / CASING_LAG_MIN;
    }
    arCp = 0.995 * arCp + 0.15 * rng.normal();
    casing[i] = cp + state.casingAdd[i] + arCp + 2.5 * Math.sin(day) + 1.0 * rng.normal();

    const liqTarget = well.liquidBbld * Math.max(0, 1 + state.elasticity[i] * (ratio - 1)) * state.liquidFactor[i];
    liq += (liqTarget - liq) / LIQUID_LAG_MIN;
    const liqNow = Math.max(0, liq * state.liquidWave[i] * (1 + 0.03 * rng.normal() + state.injectionJitter[i] * rng.normal()));
    liquid[i] = liqNow;

    arTp = 0.99 * arTp + 0.2 * rng.normal();
    tubing[i] = Math.max(0, (well.tubingPsig + state.tubingAdd[i]) * state.tubingFactor[i] + arTp + 1.5 * Math.sin(day + 0.7) + 1.5 * rng.normal());

    arInj = 0.995 * arInj + 0.0015 * rng.normal();
    const injMeas = inj * (1 + arInj + 0.01 * rng.normal() + state.injectionJitter[i] * rng.normal());
    injection[i] = Math.max(0, injMeas);
    const formation = well.formationGasMscfd * state.formationGasFactor[i] * (well.liquidBbld > 0 ? liq / well.liquidBbld : 0);
    gas[i] = Math.max(0, (injection[i] + formation) * state.gasFactor[i] * (1 + 0.015 * rng.normal()));
  }
  addTelemetryGaps(rng, [casing, tubing, injection, gas, liquid]);
  return { t, casing, tubing, injection, gas, liquid };
}

/**
 * Short dropouts as historians show them: each signal alone now and then, and all
 * signals together when the remote unit drops off (minutes, never hours).
 */
function addTelemetryGaps(rng: Rng, signals: Float64Array[]): void {
  const n = signals[0].length;
  for (const s of signals) {
    for (let i = 0; i < n; i++) {
      if (rng.next() < 1 / 3000) {
        const len = rng.int(1, 12);
        for (let j = i; j < Math.min(n, i + len); j++) s[j] = NaN;
        i += len;
      }
    }
  }
  for (let i = 0; i < n; i++) {
    if (rng.next() < 1 / 6000) {
      const len = rng.int(5, 40);
      for (const s of signals) for (let j = i; j < Math.min(n, i + len); j++) s[j] = NaN;
      i += len;
    }
  }
}
