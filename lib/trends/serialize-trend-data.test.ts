// The pre-encoded answer must be exactly JSON.stringify's bytes of the wire form (the
// chart parses it with JSON.parse and decodes it with decodeTrendData); regression
// checks of our own serializer, no outside source.
import { describe, expect, it } from "vitest";
import { serializeTrendData } from "./serialize-trend-data";
import type { TrendData, TrendSeries } from "./trend-types";
import { decodeTrendData, toWireSeries } from "./trend-wire";
import { evenTextSeries, evenTimes, textSeries } from "./text-series";

const decode = (b: Uint8Array) => new TextDecoder().decode(b);
const wire = (d: TrendData) => JSON.stringify({ ...d, series: d.series.map(toWireSeries) });

function makeData(series: TrendSeries[]): TrendData {
  return {
    wellId: 7,
    from: 1_780_000_000_000,
    to: 1_787_776_000_000,
    resolution: "minmax",
    bucketMs: 10_800_000,
    series,
    overlays: {
      recent: { casingPsig: 961.2345678901234, tubingPsig: null, injectionMscfd: 612.5, windowEnd: 1_787_775_940_000 },
      valves: [{ position: 1, kind: "ipo", surfaceOpeningPsig: 1012.25, surfaceClosingPsig: 990.125, openLabel: "V1 open 1,012 psig", closeLabel: "V1 close 990 psig" }],
      operatingPoint: null,
      issues: [{ id: 3, rule: "heading", label: "Heading — “swings”", start: 1_781_000_000_000, end: null, status: "new" }],
      fieldEvents: [],
    },
  };
}

const series = (): TrendSeries[] => [
  { signal: "casing_pressure", unit: "psig", t: [1_780_002_700_000, 1_780_008_100_000, 1_780_010_000_000], v: [1053.7615640750653, null, 1e-7] },
  { signal: "tubing_pressure", unit: "psig", t: [], v: [] },
];

describe("serializeTrendData", () => {
  it("gives exactly JSON.stringify's text, full precision and nulls included", () => {
    const d = makeData(series());
    expect(decode(serializeTrendData(d))).toBe(wire(d));
  });

  it("decodes back to the answer the service built", () => {
    const d = makeData(series());
    expect(decodeTrendData(JSON.parse(decode(serializeTrendData(d))))).toEqual(d);
  });

  it("reuses a frozen series list's bytes and still writes the current overlays", () => {
    const list = Object.freeze(series()) as TrendSeries[];
    const first = makeData(list);
    expect(decode(serializeTrendData(first))).toBe(wire(first));
    const second = makeData(list);
    second.overlays.issues = [];
    expect(decode(serializeTrendData(second))).toBe(wire(second));
  });

  it("encodes an unfrozen list afresh each time (it may have changed)", () => {
    const list = series();
    const d = makeData(list);
    serializeTrendData(d);
    list[0].v[1] = 5;
    expect(decode(serializeTrendData(d))).toBe(wire(d));
  });

  it("writes a series held as number text from that text, and it reads back as the same numbers", () => {
    const t = [1_780_002_700_000, 1_780_008_100_000, 1_780_010_000_000];
    const held = textSeries({ signal: "casing_pressure", unit: "psig", t }, "1053.76,null,1e+07");
    const plain: TrendSeries = { signal: "casing_pressure", unit: "psig", t, v: [1053.76, null, 1e7] };
    const text = decode(serializeTrendData(makeData([held])));
    expect(text).toContain('"v":[1053.76,null,1e+07]');
    expect(JSON.parse(text)).toEqual(JSON.parse(wire(makeData([plain]))));
    // Any other reader sees ordinary numbers.
    expect(held.v).toEqual(plain.v);
    expect(held).toEqual(plain);
  });

  it("writes evenly spaced times held as a start and a step exactly as it writes the same times in full", () => {
    const times = { t0: 1_780_002_700_000, step: 5_400_000, count: 4 };
    const held = evenTextSeries({ signal: "casing_pressure", unit: "psig" }, times, "1008.03,1091.48,null,1e+07");
    const plain: TrendSeries = { signal: "casing_pressure", unit: "psig", t: evenTimes(times), v: [1008.03, 1091.48, null, 1e7] };
    const text = decode(serializeTrendData(makeData([held])));
    expect(text).toContain('"t0":1780002700000,"dt":5400000,');
    expect(JSON.parse(text)).toEqual(JSON.parse(wire(makeData([plain]))));
    expect(held).toEqual(plain);
    expect(Object.isFrozen(held.t)).toBe(true);
    expect(decodeTrendData(JSON.parse(text)).series[0]).toEqual(plain);
  });

  it("writes two evenly spaced points as steps, as toWireTimes does", () => {
    const held = evenTextSeries({ signal: "gas_rate", unit: "Mscf/d" }, { t0: 1000, step: 500, count: 2 }, "1,2");
    const plain: TrendSeries = { signal: "gas_rate", unit: "Mscf/d", t: [1000, 1500], v: [1, 2] };
    expect(decode(serializeTrendData(makeData([held])))).toBe(wire(makeData([plain])));
  });
});
