// CSV quoting rules follow RFC 4180 §2 (quoted fields may hold the delimiter, line
// breaks and doubled quotes). Line numbers and caps are our own contract.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CsvTokenizer, tokenizeText, type CsvRecord } from "./csv-tokenizer";

/** Feed text in pieces of `size` characters to exercise chunk boundaries. */
function tokenizeInPieces(text: string, delimiter: string, size: number): CsvRecord[] {
  const out: CsvRecord[] = [];
  const tok = new CsvTokenizer(delimiter, { maxFieldLength: 50 });
  for (let i = 0; i < text.length; i += size) tok.push(text.slice(i, i + size), (r) => {
    out.push(r);
  });
  tok.end((r) => {
    out.push(r);
  });
  return out;
}

describe("CsvTokenizer (RFC 4180 quoting)", () => {
  it.each([
    ["plain LF", "a,b\n1,2\n", [["a", "b"], ["1", "2"]], [1, 2]],
    ["CRLF", "a,b\r\n1,2\r\n", [["a", "b"], ["1", "2"]], [1, 2]],
    ["bare CR", "a,b\r1,2\r", [["a", "b"], ["1", "2"]], [1, 2]],
    ["no final newline", "a,b\n1,2", [["a", "b"], ["1", "2"]], [1, 2]],
    ["quoted delimiter", 'a,"x,y"\n', [["a", "x,y"]], [1]],
    ["doubled quote", 'a,"say ""hi"""\n', [["a", 'say "hi"']], [1]],
    ["newline in quotes counts lines", 'a,"l1\nl2"\nb,c\n', [["a", "l1\nl2"], ["b", "c"]], [1, 3]],
    ["CRLF in quotes kept", 'a,"l1\r\nl2"\r\nb,c\r\n', [["a", "l1\r\nl2"], ["b", "c"]], [1, 3]],
    ["blank lines skipped but counted", "a,b\n\n\n1,2\n", [["a", "b"], ["1", "2"]], [1, 4]],
    ["empty fields", ",,\n", [["", "", ""]], [1]],
    ["quote inside unquoted field is text", 'a,5"x\n', [["a", '5"x']], [1]],
    ["semicolon", "a;b,c\n", [["a", "b,c"]], [1]],
  ] as const)("%s", (_label, text, fields, lines) => {
    for (const size of [1, 2, 3, 1000]) {
      const recs = tokenizeInPieces(text, text.includes(";") ? ";" : ",", size);
      expect(recs.map((r) => r.fields), `piece size ${size}`).toEqual(fields);
      expect(recs.map((r) => r.line), `piece size ${size}`).toEqual(lines);
    }
  });

  it("flags a record at end of input without a line end, and an open quote", () => {
    const [, last] = tokenizeText('a,b\n1,"open', ",");
    expect(last.isLastWithoutNewline).toBe(true);
    expect(last.hasOpenQuote).toBe(true);
    const complete = tokenizeText("a,b\n1,2\n", ",");
    expect(complete.every((r) => !r.isLastWithoutNewline)).toBe(true);
  });

  it("caps a long field: the record is flagged and memory is not spent on it", () => {
    const long = "x".repeat(500);
    const recs = tokenizeInPieces(`a,b\n1,${long}\n2,3\n`, ",", 7);
    expect(recs.map((r) => r.isOverflow)).toEqual([false, true, false]);
    expect(recs[2].fields).toEqual(["2", "3"]);
    expect(recs[2].line).toBe(3);
  });

  it("caps the number of fields per record", () => {
    const recs = tokenizeText(`a\n${"1,".repeat(50)}1\nz\n`, ",", { maxFields: 10 });
    expect(recs[1].isOverflow).toBe(true);
    expect(recs[2].fields).toEqual(["z"]);
  });

  it("pauses when the handler returns false and resumes from the returned offset", () => {
    const tok = new CsvTokenizer(",");
    const seen: string[][] = [];
    let rest = "a,b\r\n1,2\r\n3,4\r\n";
    let pushes = 0;
    while (rest.length > 0) {
      const used = tok.push(rest, (r) => {
        seen.push(r.fields);
        return false;
      });
      rest = rest.slice(used);
      pushes++;
    }
    tok.end((r) => {
      seen.push(r.fields);
    });
    expect(seen).toEqual([["a", "b"], ["1", "2"], ["3", "4"]]);
    expect(pushes).toBe(3);
  });
});

describe("CsvTokenizer fast path (whole lines split natively)", () => {
  // Property: a text fed whole (lines take the native fast path) and fed one
  // character at a time (every line goes through the state machine) gives the same
  // records, line numbers and flags: RFC 4180 §2 quoting, LF / CRLF / CR line ends.
  const piece = fc.constantFrom("a", "1", "2.5", ",", ";", '"', "\n", "\r", "\r\n", " ", "x y", "");
  it("gives the same records as the character-by-character path", () => {
    fc.assert(
      fc.property(fc.array(piece, { maxLength: 60 }), fc.constantFrom(",", ";"), fc.integer({ min: 1, max: 9 }), (parts, delim, size) => {
        const text = parts.join("");
        const whole = tokenizeText(text, delim, { maxFieldLength: 50 });
        const pieces = tokenizeInPieces(text, delim, size);
        const strip = (r: CsvRecord[]) => r.map((x) => ({ ...x }));
        expect(strip(whole)).toEqual(strip(pieces));
      }),
      { numRuns: 3000 },
    );
  });
});
