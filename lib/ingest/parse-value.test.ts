import { describe, expect, it } from "vitest";
import { classifyNonNumber, parseNumber, parseValueCell } from "./parse-value";

const POINT = { decimalComma: false, thousandsSep: null } as const;
const POINT_COMMA_THOUSANDS = { decimalComma: false, thousandsSep: "," } as const;
const COMMA = { decimalComma: true, thousandsSep: null } as const;
const COMMA_POINT_THOUSANDS = { decimalComma: true, thousandsSep: "." } as const;
const COMMA_SPACE_THOUSANDS = { decimalComma: true, thousandsSep: " " } as const;

describe("parseNumber", () => {
  it.each([
    ["812.5", POINT, 812.5],
    [" 812.5 ", POINT, 812.5],
    ["-15", POINT, -15],
    ["5e3", POINT, 5000],
    [".5", POINT, 0.5],
    ["1,250.5", POINT_COMMA_THOUSANDS, 1250.5],
    ["1,234,567", POINT_COMMA_THOUSANDS, 1234567],
    ["12,50.0", POINT_COMMA_THOUSANDS, NaN],
    ["812,5", COMMA, 812.5],
    ["1.250,5", COMMA_POINT_THOUSANDS, 1250.5],
    ["1.234", COMMA_POINT_THOUSANDS, 1234],
    ["1 250,5", COMMA_SPACE_THOUSANDS, 1250.5],
    ["1\u00a0250,5", COMMA_SPACE_THOUSANDS, 1250.5],
    ["12.3.4", POINT, NaN],
    ["0x10", POINT, NaN],
    ["Infinity", POINT, NaN],
    ["", POINT, NaN],
  ] as const)("%j → %s", (raw, fmt, want) => {
    const got = parseNumber(raw, fmt);
    if (Number.isNaN(want)) expect(got).toBeNaN();
    else expect(got).toBeCloseTo(want, 9);
  });
});

// Status texts seen in historian exports (DOMAIN.md §2, common practice).
describe("classifyNonNumber", () => {
  it.each([
    ["", "blank"], ["   ", "blank"],
    ["Bad", "status_text"], ["I/O Timeout", "status_text"], ["Shutdown", "status_text"], ["#N/A", "status_text"],
    ["Comm Fail", "status_text"], ["Calc Failed", "status_text"], ["---", "status_text"], ["NaN", "status_text"],
    ["12.3.4", "unparseable_value"], ["1-2", "unparseable_value"],
  ] as const)("%j is %s", (raw, want) => expect(classifyNonNumber(raw)).toBe(want));
});

describe("parseValueCell: canonical units and plausible ranges", () => {
  it.each([
    // NIST SP 811 (2008) App. B: 1 psi = 6.894757 kPa; 1 bar = 100 kPa.
    ["5600", "pressure", "kPag", POINT, { ok: true, v: 5600 / 6.894757 }],
    ["56,02", "pressure", "barg", COMMA, { ok: true, v: 5602 / 6.894757 }],
    // Gauge = absolute − 14.7 psi (DOMAIN.md §2, common practice).
    ["114.7", "pressure", "psia", POINT, { ok: true, v: 100 }],
    ["-15", "pressure", "psig", POINT, { ok: true, v: -15 }],
    ["-15.5", "pressure", "psig", POINT, { ok: false, reason: "out_of_range" }],
    ["20001", "pressure", "psig", POINT, { ok: false, reason: "out_of_range" }],
    ["-1", "gas_rate", "Mscf/d", POINT, { ok: false, reason: "out_of_range" }],
    ["1.5", "gas_rate", "MMscf/d", POINT, { ok: true, v: 1500 }],
    ["1000001", "liquid_rate", "bbl/d", POINT, { ok: false, reason: "out_of_range" }],
    ["100", "temperature", "degC", POINT, { ok: true, v: 212 }],
    ["701", "temperature", "degF", POINT, { ok: false, reason: "out_of_range" }],
    ["Bad", "pressure", "psig", POINT, { ok: false, reason: "status_text" }],
    ["", "pressure", "psig", POINT, { ok: false, reason: "blank" }],
  ] as const)("%j %s %s", (raw, q, unit, fmt, want) => {
    const got = parseValueCell(raw, q, unit, fmt);
    expect(got.ok).toBe(want.ok);
    if (got.ok && want.ok) expect(got.v).toBeCloseTo(want.v, 6);
    if (!got.ok && !want.ok) expect(got.reason).toBe(want.reason);
  });
});
