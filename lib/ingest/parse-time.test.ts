// Sources for the zone rules checked here:
// - US: 15 U.S.C. §260a as amended by the Energy Policy Act of 2005 §110: daylight time
//   runs from 02:00 local on the second Sunday of March to 02:00 local on the first Sunday
//   of November (2024: March 10 and November 3). Central time is UTC−6 standard
//   (49 CFR Part 71), UTC−5 daylight.
// - EU: Directive 2000/84/EC, Art. 2–3: summer time starts and ends at 01:00 UTC on the
//   last Sunday of March / October (2024: March 31 and October 27). Berlin is UTC+1
//   standard, UTC+2 summer.
import { describe, expect, it } from "vitest";
import { createTimeParser, parseTimestamp, readWallTime, TIME_NONEXISTENT } from "./parse-time";
import type { TimeFormat } from "./types";

const utc = (y: number, mo: number, d: number, h = 0, mi = 0, s = 0, ms = 0) => Date.UTC(y, mo - 1, d, h, mi, s, ms);

describe("timestamp formats (UTC zone)", () => {
  it.each<[string, TimeFormat, number]>([
    ["2024-03-10T08:00:00Z", "iso", utc(2024, 3, 10, 8)],
    ["2024-03-10 08:00", "iso", utc(2024, 3, 10, 8)],
    ["2024-03-10 08:00:05.25", "iso", utc(2024, 3, 10, 8, 0, 5, 250)],
    ["2024/03/10 08:00:00", "iso", utc(2024, 3, 10, 8)],
    ["2024-03-10T02:00:00-06:00", "iso", utc(2024, 3, 10, 8)],
    ["2024-03-10T09:00:00+0100", "iso", utc(2024, 3, 10, 8)],
    ["2024-03-10", "iso", utc(2024, 3, 10)],
    ["03/10/2024 08:00:00", "mdy", utc(2024, 3, 10, 8)],
    ["3/10/2024 8:00 PM", "mdy", utc(2024, 3, 10, 20)],
    ["3/10/2024 12:15 AM", "mdy", utc(2024, 3, 10, 0, 15)],
    ["10/03/2024 08:00", "dmy", utc(2024, 3, 10, 8)],
    ["10.03.2024 08:00:00", "dmy", utc(2024, 3, 10, 8)],
    ["10-Mar-2024 08:00:00", "d-mon-y", utc(2024, 3, 10, 8)],
    ["10-MAR-24 08:00", "d-mon-y", utc(2024, 3, 10, 8)],
    ["1710057600", "epoch_s", utc(2024, 3, 10, 8)],
    ["1710057600.5", "epoch_s", utc(2024, 3, 10, 8, 0, 0, 500)],
    ["1710057600000", "epoch_ms", utc(2024, 3, 10, 8)],
    // Spreadsheet serial days: day 25569 is 1970-01-01 (common practice, 1900 date system).
    ["45361.3333333333", "excel_days", utc(2024, 3, 10, 8)],
    ["2024-03-10 24:00:00", "iso", utc(2024, 3, 11)],
  ])("%s (%s)", (raw, format, want) => {
    expect(parseTimestamp(raw, format, "UTC")).toBe(want);
  });

  it.each<[string, TimeFormat]>([
    ["2024-02-30 08:00", "iso"],
    ["2023-02-29 08:00", "iso"],
    ["2024-13-01 08:00", "iso"],
    ["2024-03-10 25:00", "iso"],
    ["2024-03-10 24:01", "iso"],
    ["13/13/2024 08:00", "mdy"],
    ["10-Foo-2024 08:00", "d-mon-y"],
    ["yesterday", "iso"],
    ["", "epoch_s"],
    ["13/10/2024 08:00 PM", "mdy"],
  ])("%j is not a %s timestamp", (raw, format) => {
    expect(parseTimestamp(raw, format, "UTC")).toBeNaN();
  });

  it("reads the written offset, or null for naive times", () => {
    expect(readWallTime("2024-03-10T08:00:00-05:30", "iso")?.offsetMin).toBe(-330);
    expect(readWallTime("2024-03-10T08:00:00", "iso")?.offsetMin).toBeNull();
  });
});

describe("DST policy: spring-forward gap is refused [published zone rules]", () => {
  it.each([
    ["America/Chicago", "2024-03-10 01:59:00", utc(2024, 3, 10, 7, 59)],
    ["America/Chicago", "2024-03-10 02:00:00", TIME_NONEXISTENT],
    ["America/Chicago", "2024-03-10 02:30:00", TIME_NONEXISTENT],
    ["America/Chicago", "2024-03-10 03:00:00", utc(2024, 3, 10, 8)],
    ["Europe/Berlin", "2024-03-31 01:59:00", utc(2024, 3, 31, 0, 59)],
    ["Europe/Berlin", "2024-03-31 02:30:00", TIME_NONEXISTENT],
    ["Europe/Berlin", "2024-03-31 03:00:00", utc(2024, 3, 31, 1)],
  ])("%s %s", (zone, raw, want) => {
    expect(parseTimestamp(raw, "iso", zone)).toBe(want);
  });
});

describe("DST policy: fall-back repeated hour [published zone rules]", () => {
  it.each([
    // Alone, an ambiguous time takes the FIRST (daylight) occurrence.
    ["America/Chicago", "2024-11-03 01:30:00", utc(2024, 11, 3, 6, 30)],
    ["America/Chicago", "2024-11-03 02:00:00", utc(2024, 11, 3, 8)],
    ["Europe/Berlin", "2024-10-27 02:30:00", utc(2024, 10, 27, 0, 30)],
    ["Europe/Berlin", "2024-10-27 03:00:00", utc(2024, 10, 27, 2)],
  ])("%s %s alone → first occurrence", (zone, raw, want) => {
    expect(parseTimestamp(raw, "iso", zone)).toBe(want);
  });

  it.each([
    [
      "America/Chicago",
      ["2024-11-03 00:45", "2024-11-03 01:15", "2024-11-03 01:45", "2024-11-03 01:15", "2024-11-03 01:45", "2024-11-03 02:15"],
      [utc(2024, 11, 3, 5, 45), utc(2024, 11, 3, 6, 15), utc(2024, 11, 3, 6, 45), utc(2024, 11, 3, 7, 15), utc(2024, 11, 3, 7, 45), utc(2024, 11, 3, 8, 15)],
    ],
    [
      "Europe/Berlin",
      ["27.10.2024 01:30", "27.10.2024 02:00", "27.10.2024 02:30", "27.10.2024 02:00", "27.10.2024 02:30", "27.10.2024 03:00"],
      [utc(2024, 10, 26, 23, 30), utc(2024, 10, 27, 0), utc(2024, 10, 27, 0, 30), utc(2024, 10, 27, 1), utc(2024, 10, 27, 1, 30), utc(2024, 10, 27, 2)],
    ],
  ])("%s: in-order rows that step back map the second pass to standard time", (zone, raws, want) => {
    const parse = createTimeParser(raws[0].includes(".") ? "dmy" : "iso", zone);
    expect(raws.map((r) => parse(r, "CF-12.CSG_PRESS"))).toEqual(want);
  });

  it("hourly rows that repeat 01:00 map the repeat to standard time (America/Chicago)", () => {
    const parse = createTimeParser("iso", "America/Chicago");
    const got = ["2024-11-03 00:00", "2024-11-03 01:00", "2024-11-03 01:00", "2024-11-03 02:00"].map((r) => parse(r, "a"));
    expect(got).toEqual([utc(2024, 11, 3, 5), utc(2024, 11, 3, 6), utc(2024, 11, 3, 7), utc(2024, 11, 3, 8)]);
  });

  it("each series keeps its own pass (a long file grouped by tag)", () => {
    const parse = createTimeParser("iso", "America/Chicago");
    expect(parse("2024-11-03 01:30", "A")).toBe(utc(2024, 11, 3, 6, 30));
    expect(parse("2024-11-03 01:10", "A")).toBe(utc(2024, 11, 3, 7, 10)); // A stepped back: second pass
    expect(parse("2024-11-03 01:10", "B")).toBe(utc(2024, 11, 3, 6, 10)); // B has not
  });

  it("offsets written in the cell override the zone", () => {
    expect(parseTimestamp("2024-11-03T01:30:00-06:00", "iso", "America/Chicago")).toBe(utc(2024, 11, 3, 7, 30));
  });

  it("epoch times ignore the zone", () => {
    expect(parseTimestamp("1710057600", "epoch_s", "Europe/Berlin")).toBe(utc(2024, 3, 10, 8));
  });
});
