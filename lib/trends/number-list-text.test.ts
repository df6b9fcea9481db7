// PostgreSQL's array text form (PostgreSQL 15 manual, §8.15.6 "Array Input and Output
// Syntax": braces around comma-separated elements, one pair of braces per dimension)
// and float output (§8.1.3: shortest exact form; NaN, Infinity and -Infinity spelled
// out), read as JSON numbers (RFC 8259 §6: no NaN or Infinity; exponents with a sign
// and leading zeros are valid).
import { describe, expect, it } from "vitest";
import { flattenPairArray, insertNulls, jsonSafe, parseNumberList, reorderPairs } from "./number-list-text";

describe("flattenPairArray", () => {
  it.each([
    ["{}", ""],
    ["{{1,2}}", "1,2"],
    ["{{1008.0318,-0.5},{1.5e-05,3e+20}}", "1008.0318,-0.5,1.5e-05,3e+20"],
    ["{{NaN,1},{-Infinity,Infinity}}", "null,1,null,null"],
  ])("%s", (text, expected) => expect(flattenPairArray(text)).toBe(expected));

  it("reads back as the numbers PostgreSQL printed", () => {
    expect(parseNumberList(flattenPairArray("{{1008.0318,-0.5},{1.5e-05,3e+20}}"))).toEqual([1008.0318, -0.5, 1.5e-5, 3e20]);
  });
});

describe("jsonSafe", () => {
  it("leaves ordinary number text alone", () => expect(jsonSafe("1,2e+07,-3.25")).toBe("1,2e+07,-3.25"));
  it("writes NaN and infinities as null, as JSON.stringify does", () => {
    expect(jsonSafe("NaN,1,Infinity")).toBe(JSON.stringify([NaN, 1, Infinity]).slice(1, -1));
  });
});

describe("insertNulls", () => {
  it("puts a null before each given position", () => expect(insertNulls("1,2,3,4", [2])).toBe("1,2,null,3,4"));
  it("handles several positions and none", () => {
    expect(insertNulls("1,2,3,4", [1, 3])).toBe("1,null,2,3,null,4");
    expect(insertNulls("1,2", [])).toBe("1,2");
  });
});

describe("reorderPairs", () => {
  it("moves whole pairs", () => expect(reorderPairs("1,2,3,4,5,6", [2, 0, 1])).toBe("5,6,1,2,3,4"));
  it("keeps an empty list empty", () => expect(reorderPairs("", [])).toBe(""));
});

describe("parseNumberList", () => {
  it("reads nulls and an empty list", () => {
    expect(parseNumberList("1,null,2")).toEqual([1, null, 2]);
    expect(parseNumberList("")).toEqual([]);
  });
});
