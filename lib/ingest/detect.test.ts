import { describe, expect, it } from "vitest";
import { detectFile, detectLineEnding, stripBom } from "./detect";
import { computeHeaderShape } from "./header-shape";
import type { Detection } from "./types";

function detect(text: string): Detection {
  const r = detectFile(text);
  if (!r.ok) throw new Error(r.error.message);
  return r.detection;
}

describe("detectFile", () => {
  it("skips preamble lines and finds a long layout by header names", () => {
    const d = detect("Export of Cinder Flats\nfrom 2024-03-10 to 2024-03-11\n\nTime,Point ID,Value,Status\n2024-03-10 08:00,CF-12:CSG,812.5,Good\n2024-03-10 08:05,CF-12:CSG,811.9,Good\n");
    expect(d).toMatchObject({ headerRowIndex: 2, layout: "long", timeColumn: "Time", tagColumn: "Point ID", valueColumn: "Value", qualityColumn: "Status" });
  });

  it("finds a long layout from tag-like values when the names say nothing", () => {
    const d = detect("a,b,c\n2024-03-10 08:00,CF-12.CSG_PRESS,812.5\n2024-03-10 08:00,CF-12.TBG_PRESS,215.2\n");
    expect(d).toMatchObject({ layout: "long", timeColumn: "a", tagColumn: "b", valueColumn: "c" });
  });

  it("finds a wide layout with a well column", () => {
    const d = detect("Timestamp;Well Name;CHP;THP\n2024-03-10 08:00;CF-12;812,5;215,2\n2024-03-10 08:00;CF-14;1004,0;188,3\n");
    expect(d).toMatchObject({ delimiter: ";", layout: "wide", wellColumn: "Well Name", decimalComma: true, thousandsSep: null });
  });

  it("tells day/month from month/day by a value above 12, and notes when it cannot", () => {
    expect(detect("Date,CSG\n25/03/2024 08:00,1\n26/03/2024 08:00,2\n").timeFormat).toBe("dmy");
    expect(detect("Date,CSG\n03/25/2024 08:00,1\n03/26/2024 08:00,2\n").timeFormat).toBe("mdy");
    const ambiguous = detect("Date,CSG\n03/04/2024 08:00,1\n03/05/2024 08:00,2\n");
    expect(ambiguous.timeFormat).toBe("mdy");
    expect(ambiguous.notes.join(" ")).toMatch(/day\/month or month\/day/);
  });

  it("does not take a pressure column for epoch time", () => {
    const d = detect("Well,CSG,Stamp\nCF-12,1710057600,2024-03-10T08:00:00Z\nCF-12,1710057900,2024-03-10T08:05:00Z\n");
    expect(d.timeColumn).toBe("Stamp");
  });

  it("ignores a partial last line when the head is truncated", () => {
    const text = "Timestamp,CSG\n2024-03-10T08:00:00Z,812.5\n2024-03-10T08:05:00Z,81";
    expect(detectFile(text, { isTruncated: true }).ok && detect(text).preview.length).toBe(2);
    const r = detectFile(text, { isTruncated: true });
    expect(r.ok && r.detection.preview.length).toBe(1);
  });

  it("names blank and duplicate header cells", () => {
    const d = detect("Timestamp,CSG,CSG,\n2024-03-10T08:00:00Z,1,2,3\n2024-03-10T08:05:00Z,1,2,3\n");
    expect(d.columns).toEqual(["Timestamp", "CSG", "CSG (2)", "column 4"]);
  });

  it("gives the same header shape for cosmetic differences, another for other units", () => {
    expect(computeHeaderShape(["Timestamp", "Casing_Pressure (psig)"])).toBe(computeHeaderShape([" timestamp", "casing pressure (PSIG)"]));
    expect(computeHeaderShape(["Timestamp", "Casing Pressure (psig)"])).not.toBe(computeHeaderShape(["Timestamp", "Casing Pressure (kPa)"]));
  });

  it("reports line endings and the BOM", () => {
    expect(detectLineEnding("a\r\nb")).toBe("CRLF");
    expect(detectLineEnding("a\rb")).toBe("CR");
    expect(detectLineEnding("a\nb")).toBe("LF");
    expect(stripBom("\ufeffa")).toEqual({ text: "a", hasBom: true });
  });

  it("ignores trailing separators when finding the header", () => {
    const d = detect("Timestamp,CSG,\n2024-03-10T08:00:00Z,812.5,\n2024-03-10T08:05:00Z,811.9,\n");
    expect(d.headerRowIndex).toBe(0);
    const e = detect("Timestamp,CSG\n2024-03-10T08:00:00Z,812.5,\n2024-03-10T08:05:00Z,811.9,\n");
    expect(e.headerRowIndex).toBe(0);
  });
});
