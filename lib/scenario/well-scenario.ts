// generateWellScenario: one invented well, `days` of minute data, with exactly one
// main signature (or confounder, or none) at a random time, plus any supply
// outages the field imposes. Deterministic for a given seed.
import type { WellDesign } from "@/lib/gaslift/types";
import { createRng, deriveSeed, type Rng } from "@/lib/scenario/prng";
import { adoptDesign, designDemoWell, type DemoWell } from "@/lib/scenario/demo-design";
import { createState, renderSeries } from "@/lib/scenario/scenario-state";
import type { ScenarioKind, TimeSpan, WellScenario } from "@/lib/scenario/scenario-types";
import {
  writeDataDefects, writeFracHit, writeHeading, writeLiquidLoading, writeMultipointing,
  writeOutage, writeOverInjection, writeSetpointChange, writeShutInAndKickoff, writeValveLeak,
} from "@/lib/scenario/scenario-effects";

const DAY = 1440;
const HOUR = 60;

export interface WellScenarioOptions {
  seed: number;
  kind: ScenarioKind;
  /** Epoch ms of the first sample (rounded down to the minute). */
  start: number;
  days: number;
  /** Use this design instead of inventing one. */
  design?: WellDesign;
  /** Use this invented well (design and operating point) as is. */
  well?: DemoWell;
  /** Supply outages imposed by the field (epoch ms). */
  outages?: TimeSpan[];
}

export function generateWellScenario(opts: WellScenarioOptions): WellScenario {
  if (!(opts.days >= 4)) throw new RangeError(`a scenario needs at least 4 days, got ${opts.days}`);
  const rng = createRng(opts.seed);
  const well = opts.well ?? (opts.design ? adoptDesign(opts.design, createRng(deriveSeed(opts.seed, "design"))) : designDemoWell(rng));
  const start = Math.floor(opts.start / 60_000) * 60_000;
  const n = Math.round(opts.days * DAY);
  const state = createState(well, createRng(deriveSeed(opts.seed, "noise")), start, n);
  const avoid = (opts.outages ?? []).map((o) => ({
    from: Math.round((o.start - start) / 60_000) - 12 * HOUR,
    to: Math.round((o.end - start) / 60_000) + 18 * HOUR,
  }));
  const at = (lo: number, hi: number, len = 0) => pickStart(rng, lo * DAY, hi * DAY, len, avoid);
  const days = opts.days;
  let defectsAt: number[] | null = null;

  switch (opts.kind) {
    case "normal":
      break;
    case "multipointing": {
      const from = at(1.3, days - 1.5);
      writeMultipointing(state, from, rng.chance(0.6) ? n : from + rng.int(12, 36) * HOUR);
      break;
    }
    case "heading": {
      const from = at(1.3, days - 1);
      writeHeading(state, from, Math.min(n, from + rng.int(12, 48) * HOUR));
      break;
    }
    case "valve_leak":
      writeValveLeak(state, at(1.3, days - 1), n);
      break;
    case "liquid_loading": {
      const from = at(1.3, days - 1.2);
      writeLiquidLoading(state, from, rng.chance(0.5) ? n : Math.min(n, from + rng.int(20, 48) * HOUR));
      break;
    }
    case "frac_hit":
      writeFracHit(state, at(1.3, days - 2.5));
      break;
    case "over_injection":
      writeOverInjection(state, at(1.5, days - 1.5));
      break;
    case "fast_kickoff":
      writeShutInAndKickoff(state, at(1.2, days - 1.5), rng.uniform(120, 220), "fast_kickoff");
      break;
    case "kickoff":
      writeShutInAndKickoff(state, at(1.2, days - 1.5), rng.uniform(18, 38), "kickoff");
      break;
    case "setpoint_change": {
      const first = at(1.2, days - 1);
      writeSetpointChange(state, first);
      if (first + 2 * DAY < n - DAY && rng.chance(0.5)) writeSetpointChange(state, first + rng.int(30, 40) * HOUR);
      break;
    }
    case "data_quality":
      defectsAt = [at(1, 2), at(2.2, 3), at(3.2, days - 0.5, 10 * HOUR)];
      break;
  }
  for (const o of opts.outages ?? []) {
    writeOutage(state, Math.round((o.start - start) / 60_000), Math.round((o.end - start) / 60_000));
  }
  const series = renderSeries(state);
  if (defectsAt) writeDataDefects(state, series, defectsAt);
  state.labels.sort((a, b) => a.start - b.start);
  return { kind: opts.kind, design: well.design, well, series, labels: state.labels, setpointChanges: state.setpointChanges };
}

/** A start minute in [lo, hi − len) that keeps clear of `avoid`; falls back to lo. */
function pickStart(rng: Rng, lo: number, hi: number, len: number, avoid: { from: number; to: number }[]): number {
  const top = Math.max(lo + 1, hi - len);
  for (let tries = 0; tries < 50; tries++) {
    const t = Math.round(rng.uniform(lo, top));
    if (avoid.every((a) => t + len + 24 * HOUR < a.from || t > a.to)) return t;
  }
  return Math.round(lo);
}

