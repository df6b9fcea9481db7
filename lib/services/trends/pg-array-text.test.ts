// PostgreSQL's array text form (PostgreSQL 15 manual, §8.15.6 "Array Input and Output
// Syntax"): braces around comma-separated elements, one pair per dimension.
import { describe, expect, it } from "vitest";
import pg from "pg";
import { minMaxTypeParsers, parseNumberArray } from "./pg-array-text";

describe("parseNumberArray", () => {
  it.each([
    ["{}", []],
    ["{42}", [42]],
    ["{1,-2,30000}", [1, -2, 30000]],
  ])("%s", (text, expected) => expect(parseNumberArray(text)).toEqual(expected));
});

describe("minMaxTypeParsers", () => {
  const get = minMaxTypeParsers(pg.types).getTypeParser as (oid: number, format: string) => (text: string) => unknown;
  it("reads int4[] as numbers and keeps float4[] as text", () => {
    expect(get(1007, "text")("{1,2}")).toEqual([1, 2]);
    expect(get(1021, "text")("{{1.5,2}}")).toBe("{{1.5,2}}");
  });
  it("leaves other types to pg's own parsers", () => {
    expect(get(701, "text")("1.5")).toBe(1.5);
    expect(get(23, "text")("7")).toBe(7);
  });
});
