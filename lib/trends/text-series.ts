// A trend series whose values are still the number text the database wrote
// (number-list-text.ts). The answer is serialized straight from that text
// (serialize-trend-data.ts); `v` is there for any other reader, parsed on first use
// and frozen (a cached answer is shared between requests).
import type { NumberListText } from "./number-list-text";
import { parseNumberList } from "./number-list-text";
import type { TrendSeries } from "./trend-types";

// Not enumerable: equality checks and JSON.stringify see an ordinary series.
const VALUE_TEXT = Symbol("bellows.trendValueText");

type TextHolder = { [VALUE_TEXT]?: NumberListText };

export function textSeries(head: Omit<TrendSeries, "v">, values: NumberListText): TrendSeries {
  let parsed: (number | null)[] | undefined;
  const s = { ...head } as TrendSeries;
  Object.defineProperty(s, "v", { enumerable: true, get: () => (parsed ??= Object.freeze(parseNumberList(values)) as (number | null)[]) });
  Object.defineProperty(s, VALUE_TEXT, { enumerable: false, value: values });
  return s;
}

/** The series' values as JSON number text, when it holds them that way. */
export function valueTextOf(s: TrendSeries): NumberListText | undefined {
  return (s as TextHolder)[VALUE_TEXT];
}
