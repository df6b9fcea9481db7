// CSV cells that a spreadsheet would run as a formula. Source: OWASP "CSV
// Injection" (owasp.org/www-community/attacks/CSV_Injection): a cell that
// begins with =, +, -, @, a tab (0x09) or a carriage return (0x0D) is
// prefixed with a single quote so it is read as text, and every cell is
// quoted with inner double quotes doubled (RFC 4180).
const FORMULA_START = /^[=+\-@\t\r]/;

/** Neutralise one value for a spreadsheet: prefix a formula-looking cell with '. */
export function neutraliseCsvCell(value: unknown): string {
  const s = value == null ? "" : String(value);
  return FORMULA_START.test(s) ? `'${s}` : s;
}

/** One CSV field: neutralised, then quoted (RFC 4180). */
export function toCsvField(value: unknown): string {
  return `"${neutraliseCsvCell(value).replace(/"/g, '""')}"`;
}

export function toCsvLine(values: unknown[]): string {
  return values.map(toCsvField).join(",") + "\r\n";
}
