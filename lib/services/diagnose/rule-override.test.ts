// Parsing of one level of rule settings (pure). Ranges come from the engine's
// RuleSettingsSchema; these are checks of our own code, not engineering values.
import { describe, expect, it } from "vitest";
import { parseRuleOverride, readStoredOverride } from "./rule-override";
import { mergeLifecycle, DEFAULT_LIFECYCLE } from "./lifecycle-settings";
import { isSameJson } from "./same-json";

describe("parseRuleOverride", () => {
  it.each([
    ["empty", {}, true],
    ["null", null, true],
    ["one number", { valveLeak: { minDropPsi: 40 } }, true],
    ["lifecycle", { lifecycle: { closeAfterMinutes: 60 } }, true],
    ["negative", { valveLeak: { minDropPsi: -1 } }, false],
    ["fraction above 1", { heading: { minAutocorrelation: 1.5 } }, false],
    ["unknown group", { nonsense: { a: 1 } }, false],
    ["unknown name", { valveLeak: { a: 1 } }, false],
    ["text", { valveLeak: { minDropPsi: "forty" } }, false],
    ["lifecycle out of range", { lifecycle: { closeAfterMinutes: 0 } }, false],
  ])("%s", (_name, input, isOk) => {
    expect(parseRuleOverride(input).ok).toBe(isOk);
  });

  it("keeps only the numbers set and drops blanks", () => {
    const r = parseRuleOverride({ valveLeak: { minDropPsi: 40, compareMinutes: "" }, heading: {} });
    expect(r).toEqual({ ok: true, value: { valveLeak: { minDropPsi: 40 } } });
  });

  it("reads stored rows leniently", () => {
    expect(readStoredOverride({ valveLeak: { minDropPsi: 40, gone: 1 }, old: { x: 1 } })).toEqual({ valveLeak: { minDropPsi: 40 } });
  });
});

describe("mergeLifecycle", () => {
  it("later levels win number by number", () => {
    expect(mergeLifecycle({ closeAfterMinutes: 30, quietGapMinutes: 10 }, { quietGapMinutes: 20 }, null)).toEqual({ ...DEFAULT_LIFECYCLE, closeAfterMinutes: 30, quietGapMinutes: 20 });
  });
});

describe("isSameJson", () => {
  it.each([
    [{ a: 1, b: [1, 2] }, { b: [1, 2], a: 1 }, true],
    [{ a: NaN }, { a: null }, true],
    [{ a: 1 }, { a: 2 }, false],
    [[1, 2], [2, 1], false],
  ])("%j vs %j", (a, b, same) => {
    expect(isSameJson(a, b)).toBe(same);
  });
});
