// Sniff the head of an uploaded historian file (the first ~64 KB as text) and say
// how to read it, or refuse it with a message a person can act on.
//
//   detectFile(headText, { isTruncated? }) → { ok: true, detection } | { ok: false, error }
//
// `isTruncated` tells whether headText stops before the end of the file (then the
// last, probably partial, line is ignored); it defaults to headText.length >= HEAD_CHARS.
import { CsvTokenizer, type CsvRecord } from "./csv-tokenizer";
import { detectLayout } from "./detect-layout";
import { detectNumberFormat } from "./detect-number-format";
import { findTimeColumn } from "./detect-time-format";
import { computeHeaderShape } from "./header-shape";
import type { Delimiter, DetectResult, LineEnding } from "./types";

/** How many characters of the file to pass to detectFile. */
export const HEAD_CHARS = 65_536;
const DELIMITERS: Delimiter[] = [",", ";", "\t", "|"];
const MAX_SAMPLE_RECORDS = 300;
const PREVIEW_ROWS = 20;
const MAX_TAG_VALUES = 2000;

const DELIMITER_NAME: Record<Delimiter, string> = { ",": "comma", ";": "semicolon", "\t": "tab", "|": "pipe" };

export function describeDelimiter(d: Delimiter): string {
  return DELIMITER_NAME[d];
}

/** Strip a UTF-8 byte-order mark (read as U+FEFF). */
export function stripBom(text: string): { text: string; hasBom: boolean } {
  return text.charCodeAt(0) === 0xfeff ? { text: text.slice(1), hasBom: true } : { text, hasBom: false };
}

export function detectLineEnding(text: string): LineEnding {
  const cr = text.indexOf("\r");
  if (cr < 0) return "LF";
  return text[cr + 1] === "\n" ? "CRLF" : "CR";
}

/** Binary files show NUL bytes or many control / replacement characters. */
function isBinary(text: string): boolean {
  const n = Math.min(text.length, 8192);
  let odd = 0;
  for (let i = 0; i < n; i++) {
    const c = text.charCodeAt(i);
    if (c === 0) return true;
    if ((c < 32 && c !== 9 && c !== 10 && c !== 13) || c === 0xfffd) odd++;
  }
  return odd > n * 0.05;
}

function sampleRecords(text: string, d: Delimiter, isTruncated: boolean): CsvRecord[] {
  const out: CsvRecord[] = [];
  const tok = new CsvTokenizer(d, { maxFieldLength: 4096, maxFields: 2000 });
  const take = (r: CsvRecord) => {
    if (out.length < MAX_SAMPLE_RECORDS + 1) out.push(r);
  };
  tok.push(text, take);
  if (!isTruncated) tok.end(take);
  if (out.length > MAX_SAMPLE_RECORDS) out.pop();
  return out;
}

interface DelimiterScore {
  delimiter: Delimiter;
  records: CsvRecord[];
  fieldCount: number;
  headerIndex: number;
  consistency: number;
}

/** The modal field count, where the run of rows with that count starts, and how steady it is. */
/** Field count ignoring trailing empty fields, which some exports add to every row. */
export function countFields(fields: string[]): number {
  let n = fields.length;
  while (n > 1 && fields[n - 1].trim() === "") n--;
  return n;
}

/** A row can be read as `n` columns when it has at least n fields and nothing but blanks past n. */
export function canReadAs(fields: string[], n: number): boolean {
  return fields.length >= n && countFields(fields) <= n;
}

/** The column count most rows can be read as, where that run starts, and how steady it is. */
function scoreDelimiter(delimiter: Delimiter, records: CsvRecord[]): DelimiterScore {
  const candidates = new Set<number>();
  for (const r of records) {
    candidates.add(r.fields.length);
    candidates.add(countFields(r.fields));
  }
  let fieldCount = 1;
  let best = 0;
  for (const n of candidates) {
    if (n < 2) continue;
    const k = records.filter((r) => canReadAs(r.fields, n)).length;
    if (k > best || (k === best && n > fieldCount)) [fieldCount, best] = [n, k];
  }
  const fits = (r: CsvRecord) => canReadAs(r.fields, fieldCount);
  // The header is the first line with that count that the next line repeats
  // (preamble lines rarely come in matching pairs; a stray malformed row later does not matter).
  let headerIndex = records.findIndex((_, i) => records.slice(i, i + 2).every(fits));
  if (headerIndex < 0) headerIndex = records.findIndex(fits);
  const after = records.slice(Math.max(headerIndex, 0));
  const consistency = fieldCount > 1 && after.length > 0 ? after.filter(fits).length / after.length : 0;
  return { delimiter, records, fieldCount, headerIndex, consistency };
}

function pickDelimiter(scores: DelimiterScore[]): DelimiterScore | undefined {
  const usable = scores.filter((s) => s.fieldCount > 1 && s.consistency >= 0.5);
  // Steady counts first, then the fewest preamble lines, then the most columns.
  usable.sort((a, b) =>
    Number(b.consistency >= 0.9) - Number(a.consistency >= 0.9) ||
    a.headerIndex - b.headerIndex ||
    b.consistency - a.consistency ||
    b.fieldCount - a.fieldCount,
  );
  return usable[0];
}

/** Header names: trimmed, blanks named by position, duplicates numbered. */
function nameColumns(fields: string[]): string[] {
  const seen = new Map<string, number>();
  return fields.map((f, i) => {
    let name = f.trim() || `column ${i + 1}`;
    const k = (seen.get(name) ?? 0) + 1;
    seen.set(name, k);
    if (k > 1) name = `${name} (${k})`;
    return name;
  });
}

/** Distinct tags in the whole head, so a suggested mapping knows more than the preview shows. */
function collectTagValues(text: string, d: Delimiter, headerIndex: number, tagIndex: number, isTruncated: boolean): string[] {
  const seen = new Set<string>();
  let k = 0;
  const take = (r: CsvRecord) => {
    const tag = r.fields[tagIndex]?.trim();
    if (k++ > headerIndex && tag && seen.size < MAX_TAG_VALUES) seen.add(tag);
  };
  const tok = new CsvTokenizer(d, { maxFieldLength: 4096, maxFields: 2000 });
  tok.push(text, take);
  if (!isTruncated) tok.end(take);
  return [...seen];
}

export function detectFile(headText: string, options: { isTruncated?: boolean } = {}): DetectResult {
  const isTruncated = options.isTruncated ?? headText.length >= HEAD_CHARS;
  const { text, hasBom } = stripBom(headText);
  if (text.trim().length === 0) {
    return { ok: false, error: { code: "empty", message: "The file is empty: it has no header and no rows." } };
  }
  if (isBinary(text)) {
    return {
      ok: false,
      error: { code: "binary", message: "The file is not UTF-8 text (binary or UTF-16 bytes found). Export it from the historian as CSV text in UTF-8." },
    };
  }
  const first = text.trimStart()[0];
  if (first === "{" || first === "[") {
    return { ok: false, error: { code: "not_csv", message: "The file looks like JSON, not CSV. Export the data as comma- or semicolon-separated text." } };
  }
  if (first === "<") {
    return { ok: false, error: { code: "not_csv", message: "The file looks like HTML or XML, not CSV. Export the data as comma- or semicolon-separated text." } };
  }
  const lineEnding = detectLineEnding(text);
  const best = pickDelimiter(DELIMITERS.map((d) => scoreDelimiter(d, sampleRecords(text, d, isTruncated))));
  if (!best) {
    return {
      ok: false,
      error: {
        code: "no_delimiter",
        message: "No column separator found: every line reads as a single column. Bellows reads comma, semicolon, tab or pipe separated files.",
      },
    };
  }
  const { delimiter, records, headerIndex, fieldCount } = best;
  const columns = nameColumns(records[headerIndex].fields.slice(0, fieldCount));
  const allRows = records.slice(headerIndex + 1).map((r) => r.fields);
  // Columns are judged on well-formed rows only; malformed ones are refused later.
  const rows = allRows.filter((r) => canReadAs(r, columns.length));
  if (rows.length === 0) {
    return { ok: false, error: { code: "header_only", message: `The file has a header (line ${records[headerIndex].line}) but no data rows.` } };
  }
  const time = findTimeColumn(columns, rows);
  if (!time) {
    return {
      ok: false,
      error: {
        code: "no_time_column",
        message: `No column holds timestamps Bellows can read (columns: ${columns.join(", ")}). Expected ISO 8601, YYYY-MM-DD HH:mm, MM/DD/YYYY, DD/MM/YYYY, DD-Mon-YYYY or epoch seconds/milliseconds.`,
      },
    };
  }
  const layout = detectLayout(columns, rows, time.index);
  const numberCells: string[] = [];
  for (const r of rows) r.forEach((c, i) => i !== time.index && i !== layout.tagColumn && i !== layout.wellColumn && numberCells.push(c));
  const numberFormat = detectNumberFormat(numberCells, delimiter);
  const notes: string[] = [];
  if (time.isDayMonthAmbiguous) {
    notes.push(`Dates such as "${rows[0][time.index]}" could be day/month or month/day; read as ${time.format === "mdy" ? "month/day" : "day/month"}. Check before importing.`);
  }
  if (!time.hasOffset && time.format !== "epoch_s" && time.format !== "epoch_ms") {
    notes.push("Timestamps carry no UTC offset: choose the time zone the historian wrote them in.");
  }
  if (best.consistency < 1) {
    notes.push(`Some lines do not have ${columns.length} ${describeDelimiter(delimiter)}-separated fields; they will be refused as malformed rows.`);
  }
  const col = (i: number | undefined) => (i === undefined ? undefined : columns[i]);
  const tagValues = layout.tagColumn === undefined ? undefined : collectTagValues(text, delimiter, headerIndex, layout.tagColumn, isTruncated);
  return {
    ok: true,
    detection: {
      delimiter,
      lineEnding,
      hasBom,
      headerRowIndex: headerIndex,
      columns,
      layout: layout.layout,
      timeColumn: columns[time.index],
      tagColumn: col(layout.tagColumn),
      valueColumn: col(layout.valueColumn),
      qualityColumn: col(layout.qualityColumn),
      wellColumn: col(layout.wellColumn),
      timeFormat: time.format,
      hasTimeOffset: time.hasOffset,
      decimalComma: numberFormat.decimalComma,
      thousandsSep: numberFormat.thousandsSep,
      tagValues,
      preview: allRows.slice(0, PREVIEW_ROWS),
      headerShape: computeHeaderShape(columns),
      notes,
    },
  };
}
