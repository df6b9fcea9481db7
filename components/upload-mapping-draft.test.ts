// Regression tests of the mapping form's state conversion. The inputs are
// invented historian heads; expectations are our own code's behaviour
// (regression values, not validation against an outside source).
import { describe, expect, it } from "vitest";
import { detectFile } from "@/lib/ingest/detect";
import { MappingSchema } from "@/lib/ingest/mapping";
import { suggestMapping } from "@/lib/ingest/suggest-mapping";
import type { Detection } from "@/lib/ingest/types";
import {
  draftFromMapping,
  findWell,
  keepOrDefaultUnit,
  listUnknownWellKeys,
  listWellKeys,
  mappingFromDraft,
  proposeTimeZone,
  type WellOption,
} from "./upload-mapping-draft";

const WELLS: WellOption[] = [
  { id: 7, name: "Heron 3-14H", uwi: "HX-0314", timeZone: "America/Chicago" },
  { id: 9, name: "Heron 5-02", uwi: "HX-0502", timeZone: "America/Chicago" },
];

function detect(text: string): Detection {
  const r = detectFile(text);
  if (!r.ok) throw new Error(r.error.message);
  return r.detection;
}

const WIDE_ONE_WELL = "Timestamp,CHP (psig),THP (psig),Inj Rate (Mscf/d)\n2026-01-05 08:00,812.5,215.2,640\n2026-01-05 08:05,811.9,214.8,641\n";
const WIDE_WELL_COLUMN = "Timestamp,Well,CHP,THP\n2026-01-05 08:00,Heron 3-14H,812.5,215.2\n2026-01-05 08:00,Marsh 1,1004.0,188.3\n";
const LONG = "Time,Tag,Value\n2026-01-05 08:00,HX-0314.CSG,812.5\n2026-01-05 08:00,HX-0314.TBG,215.2\n2026-01-05 08:00,Q-77.CSG,900.1\n";

describe("draft round trip", () => {
  it.each([
    ["wide, one well chosen", WIDE_ONE_WELL, 7],
    ["wide, well column", WIDE_WELL_COLUMN, null],
    ["long, tag pattern", LONG, null],
  ])("%s: suggested mapping survives draft → mapping and passes the schema", (_name, text, wellId) => {
    const d = detect(text);
    const { mapping } = suggestMapping(d, { timeZone: "America/Chicago", wellKey: wellId ? "Heron 3-14H" : undefined });
    const draft = draftFromMapping(mapping, d, WELLS);
    if (wellId) expect(draft.wide.wellId).toBe(wellId);
    const back = mappingFromDraft(draft, WELLS);
    const check = MappingSchema.safeParse(back);
    expect(check.success, JSON.stringify(check.error?.issues)).toBe(true);
    expect(back.layout).toBe(mapping.layout);
    if (back.layout === "wide") expect(back.wide?.columns).toEqual(mapping.wide?.columns);
    else expect(back.long?.tags).toEqual(mapping.long?.tags);
  });

  it("drops columns set to be ignored and a unit left unset", () => {
    const d = detect(WIDE_ONE_WELL);
    const draft = draftFromMapping(suggestMapping(d, { wellKey: "HX-0314" }).mapping, d, WELLS);
    draft.wide.columns["THP (psig)"] = { signal: "", unit: "psig" };
    draft.wide.columns["CHP (psig)"] = { signal: "casing_pressure", unit: "" };
    const m = mappingFromDraft(draft, WELLS);
    expect(m.wide?.columns.map((c) => c.column)).not.toContain("THP (psig)");
    expect(m.wide?.columns.find((c) => c.column === "CHP (psig)")).toEqual({ column: "CHP (psig)", signal: "casing_pressure" });
    // The one well is sent by its registered name, whatever key matched it.
    expect(m.wide?.wellKey).toBe("Heron 3-14H");
  });

  it("keeps both layouts' answers when switching layout", () => {
    const d = detect(LONG);
    const draft = draftFromMapping(suggestMapping(d).mapping, d, WELLS);
    const asWide = mappingFromDraft({ ...draft, layout: "wide" }, WELLS);
    expect(asWide.long).toBeUndefined();
    const backToLong = mappingFromDraft(draft, WELLS);
    expect(backToLong.long?.tagColumn).toBe("Tag");
  });
});

describe("well keys", () => {
  it.each([
    ["long: keys from the tag rule", LONG, ["HX-0314", "Q-77"], ["Q-77"]],
    ["wide: keys from the well column", WIDE_WELL_COLUMN, ["Heron 3-14H", "Marsh 1"], ["Marsh 1"]],
  ])("%s", (_name, text, keys, unknown) => {
    const d = detect(text);
    const m = suggestMapping(d).mapping;
    expect(listWellKeys(m, d)).toEqual(keys);
    expect(listUnknownWellKeys(listWellKeys(m, d), WELLS)).toEqual(unknown);
  });

  it("matches by name or identifier, ignoring case and edge spaces", () => {
    expect(findWell(" heron 5-02 ", WELLS)?.id).toBe(9);
    expect(findWell("hx-0314", WELLS)?.id).toBe(7);
    expect(findWell("Heron", WELLS)).toBeUndefined();
  });

  it("adds keys the server flagged, once", () => {
    expect(listUnknownWellKeys(["Q-77"], WELLS, ["Q-77", "Z-1", "HX-0502"])).toEqual(["Q-77", "Z-1"]);
  });

  it("a broken tag pattern resolves no well instead of throwing", () => {
    const d = detect(LONG);
    const m = suggestMapping(d).mapping;
    const broken = { ...m, long: { ...m.long!, tags: { mode: "pattern" as const, pattern: "(?<well>[", signalAliases: {}, units: {} } } };
    expect(listWellKeys(broken, d)).toEqual([]);
  });
});

describe("units and zones", () => {
  it.each([
    ["casing_pressure", "kPag", "kPag"],
    ["casing_pressure", "Mscf/d", "psig"],
    ["injection_rate", "", "Mscf/d"],
    ["oil_rate", "m3/d", "m3/d"],
    ["tubing_temperature", "psig", "degF"],
  ] as const)("%s with %s keeps or falls back to %s", (signal, unit, expected) => {
    expect(keepOrDefaultUnit(signal, unit)).toBe(expected);
  });

  it("proposes the field zone of a registered well in the file, else the fallback", () => {
    const wells = WELLS.map((w) => ({ ...w, fieldTimeZone: "America/Denver" }));
    expect(proposeTimeZone(["Q-77", "HX-0314"], wells, "UTC")).toBe("America/Denver");
    expect(proposeTimeZone(["Q-77"], wells, "Europe/Oslo")).toBe("Europe/Oslo");
  });
});
