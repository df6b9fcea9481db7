import { describe, expect, it } from "vitest";
import { tokenizeText } from "./csv-tokenizer";
import { quoteCell, writeCsv, writeLongCsv, writeWideCsv } from "./write-csv";

describe("write-csv", () => {
  it.each([
    ["plain", "plain"],
    ["a,b", '"a,b"'],
    ['say "hi"', '"say ""hi"""'],
    ["l1\nl2", '"l1\nl2"'],
  ])("quotes %j as %s (RFC 4180 §2.6–2.7)", (cell, want) => expect(quoteCell(cell, ",")).toBe(want));

  it("writes what the tokenizer reads back", () => {
    const text = writeCsv(["a", "b,c"], [["x\ny", 1.5], [null, 'q"']], { lineEnding: "\r\n" });
    expect(tokenizeText(text, ",").map((r) => r.fields)).toEqual([["a", "b,c"], ["x\ny", "1.5"], ["", 'q"']]);
  });

  it("writes decimal commas only with another delimiter", () => {
    expect(writeCsv(["v"], [[1.5]], { delimiter: ";", decimalComma: true })).toBe("v\n1,5\n");
    expect(() => writeCsv(["v"], [[1.5]], { decimalComma: true })).toThrow(/delimiter/);
  });

  it("writes long and wide layouts", () => {
    expect(writeLongCsv([{ t: 0, tag: "CF-12.CSG", value: 1 }])).toBe("Timestamp,Tag,Value\n1970-01-01T00:00:00.000Z,CF-12.CSG,1\n");
    expect(writeWideCsv(["CSG"], [{ t: 0, well: "CF-12", values: [2] }], { wellColumn: "Well" })).toBe(
      "Timestamp,Well,CSG\n1970-01-01T00:00:00.000Z,CF-12,2\n",
    );
  });
});
