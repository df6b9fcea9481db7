// Things that are not a well problem (DOMAIN.md §4) must stay quiet: a planned
// setpoint change and a pad-wide injection outage (one field event, not one issue per well).
import { describe, expect, it } from "vitest";
import { diagnoseWell } from "@/lib/diagnostics/diagnose-well";
import { diagnosePad } from "@/lib/diagnostics/diagnose-pad";
import { detectFieldEvents } from "@/lib/diagnostics/field-events";
import { addStep, makeSteadySeries, makeTestDesign, scaleRange, toInput } from "@/lib/diagnostics/make-test-series";
import { DEFAULT_SETTINGS } from "@/lib/diagnostics/settings";

const design = makeTestDesign();

function withOutage(seed: number, from: number, len: number) {
  const s = makeSteadySeries(4, seed);
  for (let i = from; i < from + len; i++) { s.injection[i] = 0; s.casing[i] = 1040 - 500 * (1 - Math.exp(-(i - from) / 60)) + (s.casing[i] - 1040); s.liquid[i] *= 0.15; s.gas[i] = 40; }
  for (let i = from + len, k = 0; k < 180; k++, i++) { s.casing[i] = Math.min(1040, s.casing[from + len - 1] + 3 * k) + (s.casing[i] - 1040); }
  return s;
}

describe("confounders", () => {
  it.each([
    { name: "setpoint up 18 %, CP and liquid follow", inj: 1.18, cp: 20, liq: 1.06 },
    { name: "setpoint down 22 %, CP and liquid follow", inj: 0.78, cp: -26, liq: 0.93 },
  ])("planned change: $name → no finding", ({ inj, cp, liq }) => {
    const s = makeSteadySeries(4);
    const at = 2 * 1440;
    scaleRange(s.injection, at, inj);
    addStep(s.casing, at, cp, 40);
    scaleRange(s.liquid, at + 30, liq);
    scaleRange(s.gas, at, inj);
    expect(diagnoseWell(toInput(s, design))).toEqual([]);
  });

  it("a setpoint change from the operator's log masks the casing-pressure step rules around it", () => {
    const s = makeSteadySeries(4);
    const at = 2 * 1440;
    addStep(s.casing, at, -45, 5, at + 180);
    expect(diagnoseWell(toInput(s, design), { rules: ["valve_leak"] })).toHaveLength(1);
    const context = { setpointChanges: [{ at: s.t[at], fromMscfd: 700, toMscfd: 560 }] };
    expect(diagnoseWell(toInput(s, design, context), { rules: ["valve_leak"] })).toEqual([]);
  });

  it("three wells losing injection together are one field event, and no well raises an issue", () => {
    const from = 1.5 * 1440;
    const wells = [1, 2, 3].map((seed) => ({ wellId: `w${seed}`, design, series: withOutage(seed, from + seed * 3, 240), settings: DEFAULT_SETTINGS }));
    const events = detectFieldEvents(wells);
    expect(events).toHaveLength(1);
    expect(events[0].wellIds).toEqual(["w1", "w2", "w3"]);
    const result = diagnosePad(wells);
    expect(result.fieldEvents).toHaveLength(1);
    expect(result.wells.flatMap((w) => w.findings)).toEqual([]);
  });

  it("one well alone losing injection is not a field event", () => {
    const wells = [
      { wellId: "a", series: withOutage(1, 2000, 240) },
      { wellId: "b", series: makeSteadySeries(4, 2) },
      { wellId: "c", series: makeSteadySeries(4, 3) },
    ];
    expect(detectFieldEvents(wells)).toEqual([]);
  });
});
