// The synthetic data must be reproducible, within realistic ranges (our own stated
// ranges for an invented field), and labelled for every kind it can produce.
import { describe, expect, it } from "vitest";
import { generateWellScenario } from "@/lib/scenario/well-scenario";
import type { ScenarioKind } from "@/lib/scenario/scenario-types";
import { computeValveLevels } from "@/lib/diagnostics/valve-levels";

const START = Date.UTC(2026, 0, 1);
const KINDS: ScenarioKind[] = ["normal", "multipointing", "heading", "valve_leak", "liquid_loading", "frac_hit", "over_injection", "fast_kickoff", "data_quality", "kickoff", "setpoint_change"];

function finiteRange(x: Float64Array): [number, number] {
  let lo = Infinity, hi = -Infinity;
  for (const v of x) if (v === v) { lo = Math.min(lo, v); hi = Math.max(hi, v); }
  return [lo, hi];
}

function median(x: Float64Array): number {
  const s = Array.from(x).filter((v) => v === v).sort((a, b) => a - b);
  return s[s.length >> 1];
}

describe("generateWellScenario", () => {
  it("is deterministic for a seed", () => {
    const a = generateWellScenario({ seed: 5, kind: "heading", start: START, days: 5 });
    const b = generateWellScenario({ seed: 5, kind: "heading", start: START, days: 5 });
    expect(Array.from(a.series.tubing.slice(0, 500))).toEqual(Array.from(b.series.tubing.slice(0, 500)));
    expect(a.labels).toEqual(b.labels);
  });

  it.each(KINDS)("%s: labelled, 1-minute grid, levels in the stated ranges", (kind) => {
    const s = generateWellScenario({ seed: 17, kind, start: START, days: 6 });
    expect(s.series.t.length).toBe(6 * 1440);
    expect(s.series.t[1] - s.series.t[0]).toBe(60_000);
    if (kind === "normal") expect(s.labels).toEqual([]);
    else expect(s.labels.some((l) => l.kind === kind)).toBe(true);
    // Typical levels of the invented field: CP ~900–1200, TP ~100–250 psig, injection 300–1200 Mscf/d, liquid 100–800 bbl/d.
    expect(median(s.series.casing)).toBeGreaterThan(880);
    expect(median(s.series.casing)).toBeLessThan(1200);
    expect(median(s.series.tubing)).toBeGreaterThan(100);
    expect(median(s.series.tubing)).toBeLessThan(260);
    expect(median(s.series.injection)).toBeGreaterThan(250);
    expect(median(s.series.injection)).toBeLessThan(1500);
    expect(median(s.series.liquid)).toBeGreaterThan(80);
    expect(median(s.series.liquid)).toBeLessThan(800);
    if (kind !== "data_quality") expect(finiteRange(s.series.injection)[0]).toBeGreaterThanOrEqual(0);
  });

  it("normal operation keeps casing pressure below every unloading valve's surface closing pressure (lib/gaslift)", () => {
    const s = generateWellScenario({ seed: 23, kind: "normal", start: START, days: 4 });
    const closing = computeValveLevels(s.design, s.well.tubingPsig).unloading.map((v) => v.surfaceClosingPsig as number);
    expect(closing.length).toBeGreaterThanOrEqual(3);
    expect(finiteRange(s.series.casing)[1]).toBeLessThan(Math.min(...closing));
  });

  it("a kick-off steps casing pressure down by about the design step at each transfer (common practice 10–25 psi)", () => {
    const s = generateWellScenario({ seed: 29, kind: "kickoff", start: START, days: 5 });
    const steps = s.well.openingPsig.slice(1).map((v, k) => s.well.openingPsig[k] - v);
    for (const d of steps) {
      expect(d).toBeGreaterThan(8);
      expect(d).toBeLessThan(30);
    }
  });

  it("multipointing lifts casing pressure to an unloading valve's closing pressure", () => {
    const s = generateWellScenario({ seed: 31, kind: "multipointing", start: START, days: 6 });
    const label = s.labels[0];
    const from = (label.start - START) / 60_000 + 120;
    const during = s.series.casing.slice(from, from + 600);
    expect(median(during)).toBeGreaterThan(s.well.lowestClosingPsig - 10);
  });
});
