import { describe, expect, it } from "vitest";
import { generateField } from "@/lib/scenario/field";
import { RULE_KEYS } from "@/lib/diagnostics/types";

describe("generateField", () => {
  const field = generateField({ seed: 3, wells: 24, days: 5, start: Date.UTC(2026, 0, 1) });

  it("has invented pads and wells with names like 'Cinder Flats 12-3'", () => {
    expect(field.pads.length).toBe(6);
    expect(field.wells.length).toBe(24);
    for (const w of field.wells) expect(w.name).toMatch(/^[A-Z][A-Za-z ]+ \d{1,2}-\d$/);
    expect(new Set(field.wells.map((w) => w.wellId)).size).toBe(24);
  });

  it("every rule appears on some well, and confounders on others", () => {
    const kinds = new Set(field.wells.flatMap((w) => w.labels.map((l) => l.kind)));
    for (const r of RULE_KEYS) expect(kinds.has(r), r).toBe(true);
    for (const c of ["kickoff", "setpoint_change", "pad_outage"]) expect(kinds.has(c as never), c).toBe(true);
  });

  it("a pad outage hits every well of that pad at the same time", () => {
    const pad = field.pads.find((p) => p.outages.length)!;
    const starts = field.wells.filter((w) => w.padId === pad.padId).map((w) => w.labels.find((l) => l.kind === "pad_outage")?.start);
    expect(new Set(starts).size).toBe(1);
    expect(starts[0]).toBe(pad.outages[0].start);
  });
});
