// Lists of numbers kept as the text the database wrote them in, so a chart answer can
// pass them on to the browser without turning each into a JS number and back: on
// 90 days × 5 signals that parse-and-print was ~2 of the ~3.3 ms of Node CPU the
// min/max read cost (measured here). The text is a JSON array's inside: "1.5,-2,3e+20",
// or "" for no numbers.
// PostgreSQL writes floats in their shortest exact form, which JSON reads back as the
// same number, except NaN, Infinity and -Infinity, which JSON cannot spell: those
// become null, as JSON.stringify would write them (PostgreSQL 15 manual, §8.1.3 and
// §8.15.6; RFC 8259 §6).
export type NumberListText = string;

/** "{{1,2},{3,4}}", the text of a two-dimensional array of pairs → "1,2,3,4"; "{}" → "". */
export function flattenPairArray(text: string): NumberListText {
  if (text.length <= 2) return "";
  return jsonSafe(text.slice(2, -2).replaceAll("},{", ","));
}

/** The list with every element that JSON cannot hold (NaN, ±Infinity) written as null. */
export function jsonSafe(list: NumberListText): NumberListText {
  // Number text holds no I or N otherwise (exponents are a lower-case e). Two plain
  // searches: the regular expression /[IN]/ over each ~14 kB list of a 90-day chart
  // showed up in CPU profiles of the chart read; a plain search did not.
  if (!list.includes("N") && !list.includes("I")) return list;
  return list
    .split(",")
    .map((x) => (Number.isFinite(Number(x)) ? x : "null"))
    .join(",");
}

/** The list with a null put before each element position in `before` (ascending). */
export function insertNulls(list: NumberListText, before: readonly number[]): NumberListText {
  if (before.length === 0) return list;
  const items = list.split(",");
  const out: string[] = [];
  let next = 0;
  for (let i = 0; i < items.length; i++) {
    if (next < before.length && before[next] === i) {
      out.push("null");
      next++;
    }
    out.push(items[i]);
  }
  return out.join(",");
}

/** The numbers themselves (null where a gap was marked). */
export function parseNumberList(list: NumberListText): (number | null)[] {
  return JSON.parse(`[${list}]`) as (number | null)[];
}

/** Reorders pairs (two elements per entry) by `order`, a permutation of entry indices. */
export function reorderPairs(list: NumberListText, order: readonly number[]): NumberListText {
  if (list === "") return list;
  const items = list.split(",");
  return order.map((i) => `${items[2 * i]},${items[2 * i + 1]}`).join(",");
}
