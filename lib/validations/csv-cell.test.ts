// Source for every case: OWASP "CSV Injection" guidance (cells starting with
// =, +, -, @, tab or carriage return get a leading single quote); quoting per
// RFC 4180. Common practice, no numeric values involved.
import { describe, expect, it } from "vitest";
import { neutraliseCsvCell, toCsvField, toCsvLine } from "./csv-cell";

describe("neutraliseCsvCell (OWASP CSV Injection)", () => {
  it.each([
    ["=SUM(A1:A2)", "'=SUM(A1:A2)"],
    ["+1+1", "'+1+1"],
    ["-2+3", "'-2+3"],
    ["@cmd", "'@cmd"],
    ["\tx", "'\tx"],
    ["\rx", "'\rx"],
    ["=HYPERLINK(\"http://x.invalid\")", "'=HYPERLINK(\"http://x.invalid\")"],
    ["Heading", "Heading"],
    ["a=b", "a=b"],
    ["", ""],
    [null, ""],
    [undefined, ""],
    [42, "42"],
  ])("%j becomes %j", (input, expected) => {
    expect(neutraliseCsvCell(input)).toBe(expected);
  });
});

describe("toCsvField / toCsvLine (RFC 4180 quoting)", () => {
  it("doubles inner quotes and neutralises before quoting", () => {
    expect(toCsvField('say "hi"')).toBe('"say ""hi"""');
    expect(toCsvField('=1+"2"')).toBe('"\'=1+""2"""');
  });
  it("joins a line with CRLF", () => {
    expect(toCsvLine(["a", -3, "@x"])).toBe('"a","\'-3","\'@x"\r\n');
  });
});
