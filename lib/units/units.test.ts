import { describe, expect, it } from "vitest";
import {
  pressureToPsig, psigTo, gasRateToMscfd, mscfdTo, liquidRateToBbld, bbldTo,
  temperatureToF, fTo, ftToM, mToFt, toCanonical, fromCanonical,
} from "./units";

// Source: NIST Special Publication 811 (2008 ed.), Appendix B.8 "Factors for units
// listed alphabetically" — psi→kPa 6.894 757, bar→kPa 100, ft→m 0.3048 (exact),
// barrel (US, petroleum, 42 gal)→m3 0.158 987 3, ft3→m3 0.028 316 85,
// °C = (°F − 32)/1.8. Tolerances are the factors' own last digit.
describe("unit conversions against NIST SP 811 factors", () => {
  it.each([
    ["psi to kPa", () => psigTo(1, "kPag"), 6.894757, 1e-6],
    ["kPa to psi", () => pressureToPsig(6.894757, "kPag"), 1, 1e-9],
    ["bar to psi", () => pressureToPsig(1, "barg"), 100 / 6.894757, 1e-9],
    ["1000 psig to bar(g)", () => psigTo(1000, "barg"), 68.94757, 1e-5],
    ["ft to m", () => ftToM(1), 0.3048, 0],
    ["m to ft", () => mToFt(1000), 3280.8399, 1e-4],
    ["bbl/d to m3/d", () => bbldTo(1, "m3/d"), 0.1589873, 1e-9],
    ["m3/d to bbl/d", () => liquidRateToBbld(1, "m3/d"), 6.289811, 1e-5],
    ["1 e3m3/d in Mscf/d", () => gasRateToMscfd(1, "e3m3/d"), 35.31467, 1e-4],
    ["1 MMscf/d in e3m3/d", () => mscfdTo(1000, "e3m3/d"), 28.31685, 1e-4],
    ["212 °F in °C", () => fTo(212, "degC"), 100, 1e-9],
    ["-40 °C in °F", () => temperatureToF(-40, "degC"), -40, 1e-9],
  ])("%s", (_label, f, expected, tol) => {
    expect(Math.abs(f() - expected)).toBeLessThanOrEqual(tol + 1e-12);
  });

  // Absolute = gauge + 14.7 psi (DOMAIN.md §2, common practice).
  it("gauge/absolute offset is 14.7 psi (common practice)", () => {
    expect(pressureToPsig(114.7, "psia")).toBeCloseTo(100, 9);
    expect(psigTo(0, "psia")).toBeCloseTo(14.7, 9);
    expect(pressureToPsig(101.325, "kPaa")).toBeCloseTo(0.0, 1);
  });

  it("round-trips every unit through canonical", () => {
    const cases = [
      ["pressure", ["psig", "psia", "kPag", "kPaa", "barg", "bara", "kPa", "bar", "MPag"]],
      ["gas_rate", ["Mscf/d", "MMscf/d", "scf/d", "e3m3/d", "m3/d", "Mscf/h"]],
      ["liquid_rate", ["bbl/d", "m3/d", "bbl/h"]],
      ["temperature", ["degF", "degC"]],
    ] as const;
    for (const [q, units] of cases) {
      for (const u of units) {
        expect(fromCanonical(q, toCanonical(q, 123.456, u), u)).toBeCloseTo(123.456, 9);
      }
    }
  });
});
