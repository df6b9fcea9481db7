// Label text is our own wording. The metric figure uses 1 psi = 6.894757 kPa
// [published] NIST SP 811 (2008), Appendix B.8.
import { describe, expect, it } from "vitest";
import { formatOperatingValve, formatValveLabel } from "./valve-label";
import { labelFieldEvent, labelRule } from "./rule-label";

describe("formatValveLabel", () => {
  it.each([
    [1, "open", 1012.4, "oilfield", "V1 open 1,012 psig"],
    [3, "close", 980, "oilfield", "V3 close 980 psig"],
    [2, "open", 1000, "metric", "V2 open 6,895 kPag"],
  ] as const)("V%s %s %s %s → %s", (pos, kind, psig, system, text) => {
    expect(formatValveLabel(pos, kind, psig, system)).toBe(text);
  });
});

describe("formatOperatingValve", () => {
  it.each([
    [4, [4], "Operating valve (inferred): V4"],
    [4, [2, 4], "Operating valve (inferred): V4; V2 can also pass gas"],
    [null, [], "Operating valve: none can pass gas at the recent casing pressure"],
  ] as const)("%s %j", (pos, open, text) => expect(formatOperatingValve(pos, open)).toBe(text));
});

describe("labels", () => {
  it.each([
    ["heading", "Heading"],
    ["liquid_loading", "Liquid loading"],
    ["valve_leak", "Valve leak or cut out"],
    ["some_new_rule", "Some new rule"],
  ])("rule %s → %s", (rule, text) => expect(labelRule(rule)).toBe(text));
  it("field event", () => expect(labelFieldEvent("injection_outage")).toBe("Pad-wide injection outage"));
});
