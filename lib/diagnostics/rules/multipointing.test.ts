// Multipointing: casing pressure at an upper unloading valve's surface closing
// pressure with a throttling sawtooth (DOMAIN.md §4); valve pressures from lib/gaslift.
// Thresholds are Bellows' own documented defaults (settings.multipointing).
import { describe, expect, it } from "vitest";
import { detectMultipointing } from "@/lib/diagnostics/rules/multipointing";
import { makeSteadySeries, makeTestDesign, toInput } from "@/lib/diagnostics/make-test-series";
import { computeValveLevels } from "@/lib/diagnostics/valve-levels";

const design = makeTestDesign();
const closing = computeValveLevels(design, 160).unloading.map((v) => v.surfaceClosingPsig as number);

/** CP from `level` upward in a sawtooth of `amp` psi: slow rise over `rise` min, fast fall over 3 min. */
function withSawtooth(level: number, amp: number) {
  const s = makeSteadySeries(3);
  const from = 1440;
  for (let i = from; i < s.t.length; i++) {
    const m = (i - from) % 23;
    const saw = m < 20 ? (amp * m) / 20 : amp * (1 - (m - 20) / 3);
    s.casing[i] = level + saw + (s.casing[i] - 1040);
  }
  return { s, from };
}

describe("multipointing rule", () => {
  it("a sawtooth sitting on the lowest unloading valve's closing pressure is multipointing, open-ended", () => {
    const { s, from } = withSawtooth(closing[closing.length - 1], 20);
    const f = detectMultipointing(toInput(s, design));
    expect(f).toHaveLength(1);
    expect(f[0].end).toBeNull();
    expect(Math.abs(f[0].start - s.t[from]) / 60_000).toBeLessThanOrEqual(60);
    expect(f[0].annotations.operatingValve).toBe(5);
    expect(f[0].annotations.levels.some((l) => l.label === "valve 5 closing")).toBe(true);
  });
  it("the same sawtooth well below every closing pressure is not (no upper valve can be open)", () => {
    const { s } = withSawtooth(closing[closing.length - 1] - 80, 20);
    expect(detectMultipointing(toInput(s, design))).toEqual([]);
  });
  it("a smooth casing pressure at the closing level is not (no throttling)", () => {
    const s = makeSteadySeries(3, 2, { casing: closing[closing.length - 1] + 2 });
    expect(detectMultipointing(toInput(s, design))).toEqual([]);
  });
});
