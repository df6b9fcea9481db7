// Kick-off: a normal one steps down valve by valve (DOMAIN.md §1, common practice:
// 10–25 psi per transfer) and must raise nothing; a ramp above the safe rate ([memory]
// about 50 psi per 10 min until the top valve is uncovered, then 100) is a fast kick-off.
import { describe, expect, it } from "vitest";
import { detectFastKickoff } from "@/lib/diagnostics/rules/fast-kickoff";
import { diagnoseWell } from "@/lib/diagnostics/diagnose-well";
import { makeSteadySeries, makeTestDesign, toInput } from "@/lib/diagnostics/make-test-series";
import { computeValveLevels } from "@/lib/diagnostics/valve-levels";

const design = makeTestDesign();
const opening = computeValveLevels(design, 160).unloading.map((v) => v.surfaceOpeningPsig as number);

/** Shut in at day 2 for 4 h, then ramp at `rate` psi/10 min to the top valve and step down valve by valve. */
function withKickoff(rate: number) {
  const s = makeSteadySeries(4);
  const shut = 2 * 1440, start = shut + 240;
  let i = shut;
  for (; i < start; i++) { s.casing[i] = 420 + (s.casing[i] - 1040); s.injection[i] = 0; s.liquid[i] = 0; s.gas[i] = 0; }
  let cp = 420;
  const rampStart = i;
  while (cp < opening[0] - 3) { cp = Math.min(opening[0] - 3, cp + rate / 10); s.casing[i] = cp + (s.casing[i] - 1040); s.liquid[i] *= 0.2; s.gas[i] *= 0.6; i++; }
  const rampEnd = i;
  for (const level of opening) for (let m = 0; m < 60; m++, i++) { s.casing[i] = level - 3 + (s.casing[i] - 1040); s.liquid[i] *= 0.6; }
  const last = opening[opening.length - 1] - 3;
  for (let m = 1; m <= 60; m++, i++) s.casing[i] = last + ((1040 - last) * m) / 60 + (s.casing[i] - 1040);
  return { s, rampStart, rampEnd };
}

describe("kick-off", () => {
  it("a normal kick-off at 30 psi per 10 min stepping down valve by valve raises no finding at all", () => {
    const { s } = withKickoff(30);
    expect(diagnoseWell(toInput(s, design))).toEqual([]);
  });
  it("a 150 psi per 10 min ramp is a fast kick-off over the ramp", () => {
    const { s, rampStart, rampEnd } = withKickoff(150);
    const f = detectFastKickoff(toInput(s, design));
    expect(f).toHaveLength(1);
    expect(f[0].evidence[0].value).toBeGreaterThan(100);
    expect(Math.abs(f[0].start - s.t[rampStart]) / 60_000).toBeLessThanOrEqual(20);
    expect(Math.abs((f[0].end as number) - s.t[rampEnd]) / 60_000).toBeLessThanOrEqual(20);
    expect(diagnoseWell(toInput(s, design)).map((x) => x.rule)).toEqual(["fast_kickoff"]);
  });
  it("a 70 psi per 10 min ramp breaks the 50 psi limit below the top valve (from memory, DOMAIN.md §1)", () => {
    expect(detectFastKickoff(toInput(withKickoff(70).s, design))).toHaveLength(1);
  });
});
