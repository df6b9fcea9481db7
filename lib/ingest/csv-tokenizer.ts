// A push-style CSV tokenizer (RFC 4180 quoting) that works on string chunks of any
// size. We write our own instead of using papaparse's stream mode because the
// ingest layer needs three things papaparse does not give together:
//   1. the 1-based physical line number where each record starts (newlines inside
//      quotes counted), so a refusal can name the row;
//   2. a hard cap on field and record length, so a 10-million-character line costs
//      bounded memory and is reported instead of buffered;
//   3. LF, CRLF and bare CR line ends, even when a CRLF pair is split across chunks,
//      and a flag for a record cut off at end of file (open quote, no line end).
//
// Quotes only open a field when they are its first character (as in RFC 4180 §2.5);
// a quote in the middle of an unquoted field is kept as text.
//
// Speed: a whole line with no quote and no bare CR (nearly every line of a historian
// export) is split with String.indexOf, which scans natively, instead of character
// by character; anything else goes through the state machine. Both give the same
// records (csv-tokenizer.test.ts checks them against each other).

const QUOTE = 34;
const LF = 10;
const CR = 13;

export interface CsvRecord {
  fields: string[];
  /** 1-based physical line where the record starts. */
  line: number;
  /** A field or the record went over the caps; `fields` is then incomplete. */
  isOverflow: boolean;
  /** The record ended at end of input without a line end. */
  isLastWithoutNewline: boolean;
  /** The input ended inside a quoted field. */
  hasOpenQuote: boolean;
}

export interface TokenizerLimits {
  /** Longest field kept, in characters (default 65 536). */
  maxFieldLength?: number;
  /** Most fields kept per record (default 10 000). */
  maxFields?: number;
  /** Most characters kept per record over all fields (default 1 MiB). */
  maxRecordLength?: number;
}

/** Return false to pause: `push` then returns early, and the caller pushes the rest later. */
export type RecordHandler = (record: CsvRecord) => void | boolean;

export class CsvTokenizer {
  private readonly delim: number;
  private readonly maxField: number;
  private readonly maxFields: number;
  private readonly maxRecord: number;
  private fields: string[] = [];
  private field = "";
  private recordChars = 0;
  private isOverflow = false;
  private isInQuotes = false;
  private isQuotePending = false; // saw a quote inside quotes at the very end of a chunk
  private isCrPending = false; // saw CR at the very end of a chunk
  private isQuotedCrPending = false; // same, inside a quoted field (already counted as a line)
  private isFieldStart = true;
  private hasContent = false; // anything seen since the last record end
  private line = 1;
  private recordLine = 1;
  /** Longest line the fast path takes: no field or record cap can be reached inside it. */
  private readonly fastLimit: number;
  private readonly delimText: string;

  constructor(delimiter: string, limits: TokenizerLimits = {}) {
    this.delim = delimiter.charCodeAt(0);
    this.maxField = limits.maxFieldLength ?? 65_536;
    this.maxFields = limits.maxFields ?? 10_000;
    this.maxRecord = limits.maxRecordLength ?? 1_048_576;
    this.delimText = delimiter[0];
    this.fastLimit = Math.min(this.maxField, this.maxRecord, this.maxFields - 1);
  }

  private isAtCleanRecordStart(): boolean {
    return !this.isInQuotes && !this.hasContent && this.fields.length === 0 && this.field.length === 0 && !this.isOverflow;
  }

  /**
   * Feed the next chunk; complete records go to `onRecord` synchronously. Returns how
   * many characters were consumed: less than chunk.length only when `onRecord` asked to
   * pause, and then the caller must push `chunk.slice(consumed)` next.
   */
  push(chunk: string, onRecord: RecordHandler): number {
    const n = chunk.length;
    let i = 0;
    if (n === 0) return 0;
    if (this.isCrPending) {
      this.isCrPending = false;
      if (chunk.charCodeAt(0) === LF) i = 1; // second half of a split CRLF
    }
    if (this.isQuotedCrPending) {
      this.isQuotedCrPending = false;
      if (this.isInQuotes && chunk.charCodeAt(0) === LF) i = 1; // CRLF split inside quotes: one line
      if (i === 1) this.append("\n");
    }
    if (this.isQuotePending) {
      this.isQuotePending = false;
      if (chunk.charCodeAt(i) === QUOTE) {
        this.append('"');
        i++;
      } else {
        this.isInQuotes = false;
      }
    }
    let start = i;
    const delim = this.delim;
    // Positions of the next quote, CR and separator at or after i (n: none), found
    // lazily and reused, so each native scan covers the chunk once overall.
    let nextQuote = -1;
    let nextCr = -1;
    let nextDelim = -1;
    while (i < n) {
      if (start === i && this.isAtCleanRecordStart()) {
        const lf = chunk.indexOf("\n", i);
        if (lf >= 0) {
          if (nextQuote < i) nextQuote = indexOrEnd(chunk, '"', i);
          if (nextCr < i) nextCr = indexOrEnd(chunk, "\r", i);
          const end = nextCr === lf - 1 && lf > i ? lf - 1 : lf;
          if (nextQuote > lf && nextCr >= end && end - i <= this.fastLimit) {
            const lineStart = i;
            const line = this.line++;
            this.recordLine = this.line;
            i = lf + 1;
            start = i;
            if (end === lineStart) continue; // a blank line is skipped, as below
            const fields: string[] = [];
            let j = lineStart;
            for (;;) {
              if (nextDelim < j) nextDelim = indexOrEnd(chunk, this.delimText, j);
              if (nextDelim >= end) {
                fields.push(chunk.slice(j, end));
                break;
              }
              fields.push(chunk.slice(j, nextDelim));
              j = nextDelim + 1;
            }
            const isPaused = onRecord({ fields, line, isOverflow: false, isLastWithoutNewline: false, hasOpenQuote: false }) === false;
            if (isPaused && i < n) return i;
            continue;
          }
        }
      }
      const c = chunk.charCodeAt(i);
      if (this.isInQuotes) {
        if (c === QUOTE) {
          this.append(chunk.slice(start, i));
          if (i + 1 >= n) {
            this.isQuotePending = true;
            i++;
            start = i;
            continue;
          }
          if (chunk.charCodeAt(i + 1) === QUOTE) {
            this.append('"');
            i += 2;
          } else {
            this.isInQuotes = false;
            i++;
          }
          start = i;
          continue;
        }
        if (c === LF) this.line++;
        else if (c === CR) {
          if (i + 1 >= n) {
            this.line++;
            this.isQuotedCrPending = true;
          } else if (chunk.charCodeAt(i + 1) !== LF) this.line++;
        }
        i++;
        continue;
      }
      if (c === delim) {
        this.append(chunk.slice(start, i));
        this.endField();
        i++;
        start = i;
        continue;
      }
      if (c === LF || c === CR) {
        this.append(chunk.slice(start, i));
        const isPaused = this.endRecord(onRecord, false) === false;
        this.line++;
        i++;
        if (c === CR) {
          if (i < n) {
            if (chunk.charCodeAt(i) === LF) i++;
          } else {
            this.isCrPending = true;
          }
        }
        this.recordLine = this.line;
        start = i;
        if (isPaused && i < n) return i;
        continue;
      }
      if (c === QUOTE && this.isFieldStart && start === i) {
        this.isInQuotes = true;
        this.hasContent = true;
        this.isFieldStart = false;
        i++;
        start = i;
        continue;
      }
      this.isFieldStart = false;
      this.hasContent = true;
      i++;
    }
    if (start < n) this.append(chunk.slice(start, n));
    return n;
  }

  /** Signal end of input; a trailing record without a line end is emitted and flagged. */
  end(onRecord: RecordHandler): void {
    this.isQuotedCrPending = false;
    if (this.isQuotePending) {
      this.isQuotePending = false;
      this.isInQuotes = false;
    }
    if (this.hasContent || this.fields.length > 0 || this.field.length > 0) {
      const hasOpenQuote = this.isInQuotes;
      this.isInQuotes = false;
      this.endRecord(onRecord, true, hasOpenQuote);
    }
  }

  private append(s: string): void {
    if (s.length === 0) return;
    this.hasContent = true;
    this.isFieldStart = false;
    if (this.isOverflow) return;
    if (this.field.length + s.length > this.maxField || this.recordChars + s.length > this.maxRecord) {
      this.isOverflow = true;
      return;
    }
    this.field += s;
    this.recordChars += s.length;
  }

  private endField(): void {
    this.hasContent = true;
    if (!this.isOverflow) {
      if (this.fields.length >= this.maxFields) this.isOverflow = true;
      else this.fields.push(this.field);
    }
    this.field = "";
    this.isFieldStart = true;
  }

  private endRecord(onRecord: RecordHandler, isAtEnd: boolean, hasOpenQuote = false): void | boolean {
    // A record that is only a line end (blank line) is skipped, as spreadsheets do.
    if (!this.hasContent && this.fields.length === 0 && this.field.length === 0) {
      this.isFieldStart = true;
      return true;
    }
    this.endField();
    const record: CsvRecord = {
      fields: this.fields,
      line: this.recordLine,
      isOverflow: this.isOverflow,
      isLastWithoutNewline: isAtEnd,
      hasOpenQuote,
    };
    this.fields = [];
    this.field = "";
    this.recordChars = 0;
    this.isOverflow = false;
    this.hasContent = false;
    this.isFieldStart = true;
    return onRecord(record);
  }
}

function indexOrEnd(chunk: string, text: string, from: number): number {
  const k = chunk.indexOf(text, from);
  return k < 0 ? chunk.length : k;
}

/** Tokenize a whole string at once (detection, tests). */
export function tokenizeText(text: string, delimiter: string, limits?: TokenizerLimits): CsvRecord[] {
  const out: CsvRecord[] = [];
  const tok = new CsvTokenizer(delimiter, limits);
  const push = (r: CsvRecord) => {
    out.push(r);
  };
  tok.push(text, push);
  tok.end(push);
  return out;
}
