import { describe, expect, it } from "vitest";
import { DEFAULT_SETTINGS, mergeSettings } from "@/lib/diagnostics/settings";

describe("rule settings", () => {
  it("kick-off ramp defaults are 50 then 100 psi per 10 min (DOMAIN.md §1, from memory)", () => {
    expect(DEFAULT_SETTINGS.fastKickoff).toEqual({
      rampWindowMinutes: 10,
      limitBeforeTopValvePsi: 50,
      limitAfterTopValvePsi: 100,
    });
  });

  it("every group has defaults (our own documented detection thresholds)", () => {
    expect(DEFAULT_SETTINGS.valveLeak.minDropPsi).toBe(35);
    expect(DEFAULT_SETTINGS.heading.minPeriodMinutes).toBe(20);
    expect(DEFAULT_SETTINGS.general.binMinutes).toBe(10);
  });

  it.each([
    { name: "well overrides field overrides org", org: 30, field: 40, well: 50, want: 50 },
    { name: "field applies when the well is silent", org: 30, field: 40, well: undefined, want: 40 },
    { name: "org applies alone", org: 30, field: undefined, well: undefined, want: 30 },
  ])("cascade: $name", ({ org, field, well, want }) => {
    const s = mergeSettings(
      { valveLeak: { minDropPsi: org } },
      field === undefined ? null : { valveLeak: { minDropPsi: field } },
      well === undefined ? null : { valveLeak: { minDropPsi: well } },
    );
    expect(s.valveLeak.minDropPsi).toBe(want);
    expect(s.valveLeak.minDurationMinutes).toBe(DEFAULT_SETTINGS.valveLeak.minDurationMinutes);
  });

  it("rejects a nonsense override", () => {
    expect(() => mergeSettings({ heading: { minAutocorrelation: 3 } })).toThrow();
  });
});
