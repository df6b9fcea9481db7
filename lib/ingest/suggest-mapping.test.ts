import { describe, expect, it } from "vitest";
import { detectFile } from "./detect";
import { createTagResolver } from "./resolve-tag";
import { suggestMapping } from "./suggest-mapping";

function suggest(text: string, opts?: { timeZone?: string; wellKey?: string }) {
  const r = detectFile(text);
  if (!r.ok) throw new Error(r.error.message);
  return suggestMapping(r.detection, opts);
}

describe("suggestMapping (our own heuristics)", () => {
  it.each([
    ["dot", "CF-12.CSG_PRESS", "CF-12.INJ_RATE", "CF-12.UNKNOWN_X"],
    ["colon", "Cinder Flats 12-3:CSG", "Cinder Flats 12-3:GAS", "Cinder Flats 12-3:FOO"],
    ["slash", "EMBER-7/CSG", "EMBER-7/LIQ", "EMBER-7/BAZ"],
    ["underscore, two-part signal", "CF12_CSG_PRESS", "CF12_INJ_RATE", "CF12_XX_YY"],
  ])("builds a tag pattern from %s-separated tags that also reads unseen tags", (_sep, a, b, unseenBad) => {
    const s = suggest(`Timestamp,Tag,Value\n2024-03-10T08:00:00Z,${a},1\n2024-03-10T08:00:00Z,${b},2\n`);
    expect(s.isComplete).toBe(true);
    const tags = s.mapping.long!.tags;
    expect(tags.mode).toBe("pattern");
    const resolve = createTagResolver(tags);
    const wellOf = a.slice(0, a.length - (a.endsWith("CSG_PRESS") ? "CSG_PRESS".length + 1 : "CSG".length + 1));
    expect(resolve(a)).toMatchObject({ wellKey: wellOf, signal: "casing_pressure", unit: "psig" });
    // Another well with the same signal names resolves too (the pattern is not a list).
    expect(resolve(a.replace(wellOf, "CF-99"))).toMatchObject({ wellKey: "CF-99", signal: "casing_pressure" });
    expect(resolve(unseenBad)).toBeNull();
  });

  it("falls back to a table of the tags it can read, with notes for the rest", () => {
    const s = suggest("Timestamp,Tag,Value\n2024-03-10T08:00:00Z,CF-12.CSG_PRESS,1\n2024-03-10T08:00:00Z,PUMP-3 AMPS,2\n");
    expect(s.mapping.long!.tags).toEqual({ mode: "table", entries: [{ tag: "CF-12.CSG_PRESS", wellKey: "CF-12", signal: "casing_pressure", unit: "psig" }] });
    expect(s.notes.join("\n")).toMatch(/PUMP-3 AMPS/);
  });

  it("maps wide columns with units from brackets, and asks for the well", () => {
    const s = suggest("Timestamp,Casing Pressure (kPa),TBG,Lift Gas [e3m3/d],Comment\n2024-03-10T08:00:00Z,5600,1500,18.2,ok\n");
    expect(s.mapping.wide!.columns).toEqual([
      { column: "Casing Pressure (kPa)", signal: "casing_pressure", unit: "kPa" },
      { column: "TBG", signal: "tubing_pressure", unit: "psig" },
      { column: "Lift Gas [e3m3/d]", signal: "injection_rate", unit: "e3m3/d" },
    ]);
    expect(s.isComplete).toBe(false);
    expect(s.notes.join("\n")).toMatch(/choose the well/);
    expect(suggest("Timestamp,TBG\n2024-03-10T08:00:00Z,1\n", { wellKey: "CF-12" }).isComplete).toBe(true);
  });

  it("notes the time zone assumption for naive timestamps only", () => {
    expect(suggest("Timestamp,TBG\n2024-03-10 08:00,1\n", { wellKey: "CF-12" }).notes.join()).toMatch(/assumed UTC/);
    expect(suggest("Timestamp,TBG\n2024-03-10T08:00Z,1\n", { wellKey: "CF-12" }).notes.join()).not.toMatch(/assumed UTC/);
  });

  it("learns signal names from the whole head, not only the 20-row preview", () => {
    const rows = Array.from({ length: 30 }, (_, i) => `2024-03-10T08:${String(i).padStart(2, "0")}:00Z,CF-12.CSG,${800 + i}`);
    rows.push("2024-03-10T09:00:00Z,CF-12.LIQ,385");
    const s = suggest(`Timestamp,Tag,Value\n${rows.join("\n")}\n`);
    expect(createTagResolver(s.mapping.long!.tags)("CF-12.LIQ")).toMatchObject({ signal: "liquid_rate", unit: "bbl/d" });
  });
});
