// Our own naming heuristics; the abbreviations are common practice in oilfield SCADA tags.
import { describe, expect, it } from "vitest";
import { guessSignal, guessUnit, normaliseUnit } from "./guess-signal";

describe("guessSignal (common-practice abbreviations)", () => {
  it.each([
    ["CSG_PRESS", "casing_pressure"],
    ["Casing Pressure (psig)", "casing_pressure"],
    ["CHP", "casing_pressure"],
    ["Injection Pressure", "casing_pressure"],
    ["TBG", "tubing_pressure"],
    ["Tubing Pressure [kPa]", "tubing_pressure"],
    ["FTP", "tubing_pressure"],
    ["WHP", "tubing_pressure"],
    ["INJ_RATE", "injection_rate"],
    ["Lift Gas (Mscf/d)", "injection_rate"],
    ["GLI", "injection_rate"],
    ["GAS", "gas_rate"],
    ["Gas Rate", "gas_rate"],
    ["LIQ", "liquid_rate"],
    ["Total Fluid", "liquid_rate"],
    ["OIL_RATE", "oil_rate"],
    ["WTR", "water_rate"],
    ["BHP", "downhole_pressure"],
    ["DownholePressure", "downhole_pressure"],
    ["CSG_TEMP", "casing_temperature"],
    ["Wellhead Temperature (degF)", "tubing_temperature"],
    ["Timestamp", undefined],
    ["Motor Amps", undefined],
    ["Well", undefined],
  ] as const)("%s → %s", (name, want) => expect(guessSignal(name)).toBe(want));
});

describe("guessUnit", () => {
  it.each([
    ["Casing Pressure (psig)", "casing_pressure", "psig"],
    ["Casing Pressure (psi)", "casing_pressure", "psig"],
    ["CSG [kPa]", "casing_pressure", "kPa"],
    ["TBG (barg)", "tubing_pressure", "barg"],
    ["INJ (MCFD)", "injection_rate", "Mscf/d"],
    ["Gas [e3m3/d]", "gas_rate", "e3m3/d"],
    ["Liquid (m³/d)", "liquid_rate", "m3/d"],
    ["Liquid (BPD)", "liquid_rate", "bbl/d"],
    ["Temp (°C)", "tubing_temperature", "degC"],
    ["CSG_PRESS_PSI", "casing_pressure", "psig"],
  ] as const)("%s → %s", (name, signal, want) => expect(guessUnit(name, signal).unit).toBe(want));

  it("keeps the text of an unknown unit so the message can name it", () => {
    expect(guessUnit("Casing Pressure (furlongs)", "casing_pressure")).toEqual({ unit: undefined, unitText: "furlongs" });
    expect(guessUnit("Casing Pressure", "casing_pressure")).toEqual({});
  });

  it("m3/d means gas or liquid depending on the signal", () => {
    expect(normaliseUnit("m3/d", "gas_rate")).toBe("m3/d");
    expect(normaliseUnit("m3/d", "liquid_rate")).toBe("m3/d");
    expect(normaliseUnit("bbl/d", "gas_rate")).toBeUndefined();
  });
});
