// Hand-made minute series for unit tests: a steady well plus small, seeded noise,
// and a few shapes (steps, ramps, sine) to write signatures by hand.
import type { AlignedSeries, DiagnosisInput } from "@/lib/diagnostics/types";
import type { WellDesign } from "@/lib/gaslift/types";
import { DEFAULT_SETTINGS } from "@/lib/diagnostics/settings";
import { createRng } from "@/lib/scenario/prng";

export const T0 = Date.UTC(2026, 2, 1);
export const MIN = 60_000;

export interface HandSeries {
  t: Float64Array;
  casing: Float64Array;
  tubing: Float64Array;
  injection: Float64Array;
  gas: Float64Array;
  liquid: Float64Array;
}

/** `days` of a steady well: CP 1,040 psig, TP 160 psig, 700 Mscf/d injected, 850 produced, 400 bbl/d, with 1 % noise. */
export function makeSteadySeries(days: number, seed = 1, level: Partial<Record<keyof Omit<HandSeries, "t">, number>> = {}): HandSeries {
  const n = Math.round(days * 1440);
  const rng = createRng(seed);
  const lv = { casing: 1040, tubing: 160, injection: 700, gas: 850, liquid: 400, ...level };
  const f = (v: number, sd: number) => Float64Array.from({ length: n }, () => v + sd * rng.normal());
  return {
    t: Float64Array.from({ length: n }, (_, i) => T0 + i * MIN),
    casing: f(lv.casing, 1),
    tubing: f(lv.tubing, 1.5),
    injection: f(lv.injection, 0.01 * lv.injection),
    gas: f(lv.gas, 0.015 * lv.gas),
    liquid: f(lv.liquid, 0.03 * lv.liquid),
  };
}

/** Add `delta` to x over minutes [from, to), reached linearly over `rampMin` minutes. */
export function addStep(x: Float64Array, fromMin: number, delta: number, rampMin = 5, toMin = x.length): void {
  for (let i = fromMin; i < Math.min(toMin, x.length); i++) x[i] += delta * Math.min(1, (i - fromMin + 1) / rampMin);
}

/** Multiply x by `factor` over [from, to). */
export function scaleRange(x: Float64Array, fromMin: number, factor: number, toMin = x.length): void {
  for (let i = fromMin; i < Math.min(toMin, x.length); i++) x[i] *= factor;
}

export function toInput(series: AlignedSeries, design: WellDesign, context?: DiagnosisInput["context"]): DiagnosisInput {
  return { wellId: "test-well", design, series, settings: DEFAULT_SETTINGS, context };
}

/** A plain test well: 5 IPO unloading valves (1.5-in, 3/16" port) and a 16/64" orifice. */
export function makeTestDesign(): WellDesign {
  return {
    tubingIdIn: 1.995,
    tubingDepthFt: 8000,
    perfDepthFt: 8100,
    surfaceTempF: 85,
    bottomholeTempF: 195,
    gasSg: 0.68,
    liquidType: "oil",
    liquidGravity: 36,
    waterCut: 0.5,
    reservoirPressurePsig: 2300,
    injectionPressurePsig: 1200,
    mandrels: [
      { position: 1, mdFt: 2200, tvdFt: 2200, kind: "ipo", portIn: 0.1875, valveOdIn: 1.5, rRatio: null, tropsig: 1130 },
      { position: 2, mdFt: 3600, tvdFt: 3600, kind: "ipo", portIn: 0.1875, valveOdIn: 1.5, rRatio: null, tropsig: 1115 },
      { position: 3, mdFt: 4800, tvdFt: 4800, kind: "ipo", portIn: 0.1875, valveOdIn: 1.5, rRatio: null, tropsig: 1100 },
      { position: 4, mdFt: 5800, tvdFt: 5800, kind: "ipo", portIn: 0.1875, valveOdIn: 1.5, rRatio: null, tropsig: 1085 },
      { position: 5, mdFt: 6600, tvdFt: 6600, kind: "ipo", portIn: 0.1875, valveOdIn: 1.5, rRatio: null, tropsig: 1070 },
      { position: 6, mdFt: 7400, tvdFt: 7400, kind: "orifice", portIn: 0.25, valveOdIn: null, rRatio: null, tropsig: null },
    ],
  };
}
