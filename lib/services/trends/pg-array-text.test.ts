// PostgreSQL's array text form (PostgreSQL 15 manual, §8.15.6 "Array Input and Output
// Syntax"): braces around comma-separated elements; float output uses the shortest
// exact form, with NaN, Infinity and -Infinity spelled out (§8.1.3).
import { describe, expect, it } from "vitest";
import pg from "pg";
import { arrayTypeParsers, parseBooleanArray, parseNumberArray } from "./pg-array-text";

describe("parseNumberArray", () => {
  it.each([
    ["{}", []],
    ["{42}", [42]],
    ["{1,-2,30000}", [1, -2, 30000]],
    ["{1008.0318,-0.5,1.5e-05,3e+20}", [1008.0318, -0.5, 1.5e-5, 3e20]],
    ["{NaN,Infinity,-Infinity}", [NaN, Infinity, -Infinity]],
  ])("%s", (text, expected) => expect(parseNumberArray(text)).toEqual(expected));
});

describe("parseBooleanArray", () => {
  it.each([
    ["{}", []],
    ["{t}", [true]],
    ["{t,f,f,t}", [true, false, false, true]],
  ])("%s", (text, expected) => expect(parseBooleanArray(text)).toEqual(expected));
});

describe("arrayTypeParsers", () => {
  const get = arrayTypeParsers(pg.types).getTypeParser as (oid: number, format: string) => (text: string) => unknown;
  it("parses int4[], float4[], float8[] and bool[] with the fast parsers", () => {
    expect(get(1007, "text")("{1,2}")).toEqual([1, 2]);
    expect(get(1021, "text")("{1.5}")).toEqual([1.5]);
    expect(get(1022, "text")("{2.25}")).toEqual([2.25]);
    expect(get(1000, "text")("{f}")).toEqual([false]);
  });
  it("leaves other types to pg's own parsers", () => {
    expect(get(701, "text")("1.5")).toBe(1.5);
    expect(get(23, "text")("7")).toBe(7);
  });
});
