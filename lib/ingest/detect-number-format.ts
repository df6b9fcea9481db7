// Decide decimal comma vs point, and the thousands separator, from sampled cells.
// Only unambiguous cells vote: "1,234" could be 1.234 or 1234, so it does not.
import type { NumberFormat } from "./parse-value";

const POINT_DECIMAL = /^[+-]?\d+\.\d+$/; // 12.5 (but "1.234" is ambiguous; counted only if not 3 decimals)
const COMMA_DECIMAL = /^[+-]?\d+,\d+$/;
const POINT_THOUSANDS_COMMA_DECIMAL = /^[+-]?\d{1,3}(\.\d{3})+,\d*$/; // 1.234,5
const COMMA_THOUSANDS_POINT_DECIMAL = /^[+-]?\d{1,3}(,\d{3})+\.\d*$/; // 1,234.5
const COMMA_THOUSANDS = /^[+-]?\d{1,3}(,\d{3})+$/; // 1,234 (ambiguous alone)
const POINT_THOUSANDS = /^[+-]?\d{1,3}(\.\d{3}){2,}$/; // 1.234.567 (only thousands)
const SPACE_THOUSANDS = /^[+-]?\d{1,3}([ \u00a0]\d{3})+([.,]\d*)?$/; // 1 234,5
const APOS_THOUSANDS = /^[+-]?\d{1,3}('\d{3})+(\.\d*)?$/; // 1'234.5

/**
 * `delimiter` breaks a tie: a semicolon-separated file with no telling number is taken
 * as decimal-comma, since the semicolon is used precisely where the comma is the
 * decimal mark (common practice of spreadsheet CSV exports in such locales).
 */
export function detectNumberFormat(cells: string[], delimiter = ","): NumberFormat {
  let comma = 0;
  let point = 0;
  let isCommaThousands = false;
  let isPointThousands = false;
  let isSpaceThousands = false;
  let isAposThousands = false;
  for (const raw of cells) {
    const s = raw.trim();
    if (s.length === 0 || !/\d/.test(s)) continue;
    if (POINT_THOUSANDS_COMMA_DECIMAL.test(s)) { comma++; isPointThousands = true; continue; }
    if (COMMA_THOUSANDS_POINT_DECIMAL.test(s)) { point++; isCommaThousands = true; continue; }
    if (SPACE_THOUSANDS.test(s)) { isSpaceThousands = true; if (s.includes(",")) comma++; else if (s.includes(".")) point++; continue; }
    if (APOS_THOUSANDS.test(s)) { isAposThousands = true; point++; continue; }
    if (POINT_THOUSANDS.test(s)) { isPointThousands = true; comma++; continue; }
    if (COMMA_THOUSANDS.test(s)) { isCommaThousands = true; continue; }
    if (COMMA_DECIMAL.test(s) && !/^[+-]?[1-9]\d{0,2},\d{3}$/.test(s)) comma++;
    else if (POINT_DECIMAL.test(s) && !/^[+-]?[1-9]\d{0,2}\.\d{3}$/.test(s)) point++;
  }
  const decimalComma = comma > point || (comma === point && delimiter === ";");
  let thousandsSep: NumberFormat["thousandsSep"] = null;
  if (isSpaceThousands) thousandsSep = " ";
  else if (isAposThousands) thousandsSep = "'";
  else if (decimalComma && isPointThousands) thousandsSep = ".";
  else if (!decimalComma && isCommaThousands) thousandsSep = ",";
  return { decimalComma, thousandsSep };
}
