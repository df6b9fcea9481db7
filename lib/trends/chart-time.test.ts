import { describe, expect, it } from "vitest";
import { formatBucket, formatFieldTime, scaleRange, shiftRange } from "./chart-time";

describe("chart time helpers", () => {
  it("formats in the field's time zone (America/Chicago is UTC−6 in December)", () => {
    expect(formatFieldTime(Date.UTC(2026, 11, 2, 12, 30), "America/Chicago")).toBe("02 Dec 2026, 06:30");
  });
  it.each([
    [30_000, "30 s"],
    [15 * 60_000, "15 min"],
    [180 * 60_000, "3 h"],
    [2 * 86_400_000, "2 d"],
  ])("bucket %s ms → %s", (ms, text) => expect(formatBucket(ms)).toBe(text));
  it("zooms out around the middle", () => expect(scaleRange(100, 200, 2, 0)).toEqual({ from: 50, to: 250 }));
  it("keeps a minimum span", () => expect(scaleRange(0, 10, 0.5, 100)).toEqual({ from: -45, to: 55 }));
  it("pans", () => expect(shiftRange(100, 200, -0.5)).toEqual({ from: 50, to: 150 }));
});
