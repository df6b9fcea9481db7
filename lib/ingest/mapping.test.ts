import { describe, expect, it } from "vitest";
import { MappingSchema } from "./mapping";

const WIDE = {
  layout: "wide",
  timeColumn: "Timestamp",
  timeFormat: "iso",
  timeZone: "America/Chicago",
  wide: { wellKey: "CF-12", columns: [{ column: "CSG", signal: "casing_pressure", unit: "psig" }] },
};
const LONG_PATTERN = {
  layout: "long",
  timeColumn: "Timestamp",
  timeFormat: "iso",
  timeZone: "UTC",
  long: {
    tagColumn: "Tag",
    valueColumn: "Value",
    tags: {
      mode: "pattern",
      pattern: "^(?<well>[^.]+)\\.(?<signal>.+)$",
      signalAliases: { CSG_PRESS: "casing_pressure" },
      units: { casing_pressure: "kPa" },
    },
  },
};

describe("MappingSchema", () => {
  it.each([
    ["a wide mapping", WIDE],
    ["a long pattern mapping", LONG_PATTERN],
    ["a long table mapping", { ...LONG_PATTERN, long: { tagColumn: "Tag", valueColumn: "Value", tags: { mode: "table", entries: [{ tag: "X", wellKey: "CF-12", signal: "gas_rate", unit: "e3m3/d" }] } } }],
    ["a wide column without a unit (values refused as unknown_unit)", { ...WIDE, wide: { wellKey: "CF-12", columns: [{ column: "CSG", signal: "casing_pressure" }] } }],
  ])("accepts %s", (_label, m) => {
    expect(MappingSchema.safeParse(m).success).toBe(true);
  });

  it.each([
    ["a unit of the wrong quantity", { ...WIDE, wide: { wellKey: "CF-12", columns: [{ column: "CSG", signal: "casing_pressure", unit: "bbl/d" }] } }, /not a pressure unit/],
    ["an unknown unit", { ...WIDE, wide: { wellKey: "CF-12", columns: [{ column: "CSG", signal: "casing_pressure", unit: "furlong" }] } }, /unit/i],
    ["an unknown zone", { ...WIDE, timeZone: "Mars/Olympus" }, /time zone/],
    ["a wide file with no well", { ...WIDE, wide: { columns: WIDE.wide.columns } }, /well/],
    ["a long layout without its section", { ...WIDE, layout: "long" }, /long/],
    ["a pattern without named groups", { ...LONG_PATTERN, long: { ...LONG_PATTERN.long, tags: { ...LONG_PATTERN.long.tags, pattern: "^(.+)\\.(.+)$" } } }, /named group/],
    ["an invalid regular expression", { ...LONG_PATTERN, long: { ...LONG_PATTERN.long, tags: { ...LONG_PATTERN.long.tags, pattern: "(?<well>[" } } }, /invalid regular expression/],
    ["a pattern unit of the wrong quantity", { ...LONG_PATTERN, long: { ...LONG_PATTERN.long, tags: { ...LONG_PATTERN.long.tags, units: { casing_pressure: "Mscf/d" } } } }, /not a pressure unit/],
  ])("refuses %s", (_label, m, message) => {
    const r = MappingSchema.safeParse(m);
    expect(r.success).toBe(false);
    if (!r.success) expect(r.error.issues.map((i) => i.message).join("\n")).toMatch(message);
  });
});
