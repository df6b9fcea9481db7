// Input checks of the trend route's query string (our own contract).
import { describe, expect, it } from "vitest";
import { TrendQuerySchema, readTrendSearchParams } from "./trend-query";

const parse = (qs: string) => TrendQuerySchema.safeParse(readTrendSearchParams(new URLSearchParams(qs)));

describe("TrendQuerySchema", () => {
  it("reads epoch milliseconds", () => {
    const r = parse("from=1000&to=2000&width=800");
    expect(r.success && r.data).toEqual({ from: 1000, to: 2000, width: 800 });
  });
  it("reads ISO 8601 times", () => {
    const r = parse("from=2026-11-01T00:00:00Z&to=2026-11-02T00:00:00Z");
    expect(r.success && r.data).toMatchObject({ from: Date.UTC(2026, 10, 1), to: Date.UTC(2026, 10, 2) });
  });
  it("reads a signal list", () => {
    const r = parse("from=0&to=1&signals=casing_pressure,tubing_pressure");
    expect(r.success && r.data.signals).toEqual(["casing_pressure", "tubing_pressure"]);
  });
  it.each([
    ["missing to", "from=1"],
    ["not a time", "from=yesterday&to=2"],
    ["reversed", "from=5&to=1"],
    ["unknown signal", "from=0&to=1&signals=choke"],
    ["width too small", "from=0&to=1&width=3"],
  ])("refuses %s", (_n, qs) => expect(parse(qs).success).toBe(false));
});
