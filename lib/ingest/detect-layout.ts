// Long or wide? Header names decide first; cell contents decide when the names say
// nothing. Long: one row per (tag, time, value). Wide: one row per time, one column
// per signal, optionally a well column.
import { guessSignal } from "./guess-signal";
import type { Layout } from "./types";

const TAG_NAME = /^(tag|tags|tag ?name|tagname|tag ?id|point|point ?name|point ?id|pointname|signal|item|item ?name)$/i;
const VALUE_NAME = /^(value|val|reading|pv|avg|average|data|measurement)$/i;
const QUALITY_NAME = /^(quality|qual|status|flag|flags|q|state)$/i;
const NOT_WELL_NAME = /comment|note|remark|desc|message|event|reason|unit|quality|status|flag/i;
const WELL_NAME = /^(well|well ?name|wellname|well ?id|asset|site|completion|uwi|location)$/i;

export interface LayoutGuess {
  layout: Layout;
  tagColumn?: number;
  valueColumn?: number;
  qualityColumn?: number;
  wellColumn?: number;
}

function clean(name: string): string {
  return name.trim().replace(/[_\-.]+/g, " ").replace(/\s+/g, " ");
}

/** Share of filled cells that look like numbers (any separator style). */
export function shareNumeric(cells: string[]): number {
  const filled = cells.filter((c) => c.trim().length > 0);
  if (filled.length === 0) return 0;
  return filled.filter((c) => /^\s*[+-]?[\d.,' \u00a0]*\d[\d.,' \u00a0]*([eE][+-]?\d+)?\s*$/.test(c)).length / filled.length;
}

export function detectLayout(columns: string[], rows: string[][], timeIndex: number): LayoutGuess {
  const find = (re: RegExp) => {
    const i = columns.findIndex((c, k) => k !== timeIndex && re.test(clean(c)));
    return i < 0 ? undefined : i;
  };
  const cells = (i: number) => rows.map((r) => r[i] ?? "");
  const others = columns.map((_, i) => i).filter((i) => i !== timeIndex);
  const numeric = others.filter((i) => shareNumeric(cells(i)) >= 0.5);
  const text = others.filter((i) => !numeric.includes(i));

  let tagColumn = find(TAG_NAME);
  let valueColumn = find(VALUE_NAME);
  const qualityColumn = find(QUALITY_NAME);
  const wellColumn = find(WELL_NAME);

  if (tagColumn === undefined) {
    // A text column whose values mostly name signals is a tag column.
    tagColumn = text.find((i) => {
      if (i === qualityColumn || i === wellColumn) return false;
      const values = [...new Set(cells(i).filter((c) => c.trim()))];
      return values.length > 0 && values.filter((v) => guessSignal(v) !== undefined).length / values.length >= 0.5;
    });
  }
  if (tagColumn !== undefined) {
    valueColumn ??= numeric.find((i) => i !== tagColumn && i !== qualityColumn);
    valueColumn ??= others.find((i) => i !== tagColumn && i !== qualityColumn && i !== wellColumn);
    if (valueColumn !== undefined) return { layout: "long", tagColumn, valueColumn, qualityColumn };
  }
  // Failing a "Well" header, a short-valued text column that is not a note can name the well.
  const wideWell = wellColumn ?? text.find((i) =>
    guessSignal(columns[i]) === undefined &&
    i !== qualityColumn &&
    !NOT_WELL_NAME.test(clean(columns[i])) &&
    cells(i).every((c) => c.length <= 40 && !/[\r\n]/.test(c)),
  );
  return { layout: "wide", wellColumn: wideWell };
}
