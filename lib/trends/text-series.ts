// A trend series whose values are still the number text the database wrote
// (number-list-text.ts), and, for evenly spaced points, whose times are still a
// start and a step. The answer is serialized straight from those
// (serialize-trend-data.ts); `v` and `t` are there for any other reader, built on
// first use and frozen (a cached answer is shared between requests). Building the
// 1,440 times of each series of a 90-day chart only to find them evenly spaced again
// cost ~0.3 ms of Node CPU per request, with the gap search (measured here).
import type { NumberListText } from "./number-list-text";
import { parseNumberList } from "./number-list-text";
import type { TrendSeries } from "./trend-types";

// Not enumerable: equality checks and JSON.stringify see an ordinary series.
const VALUE_TEXT = Symbol("bellows.trendValueText");
const EVEN_TIMES = Symbol("bellows.trendEvenTimes");

/** count points at t0, t0 + step, t0 + 2 × step, … */
export interface EvenTimes {
  t0: number;
  step: number;
  count: number;
}

type Holder = { [VALUE_TEXT]?: NumberListText; [EVEN_TIMES]?: EvenTimes };

function defineValues(s: TrendSeries, values: NumberListText): void {
  let parsed: (number | null)[] | undefined;
  Object.defineProperty(s, "v", { enumerable: true, get: () => (parsed ??= Object.freeze(parseNumberList(values)) as (number | null)[]) });
  Object.defineProperty(s, VALUE_TEXT, { enumerable: false, value: values });
}

export function textSeries(head: Omit<TrendSeries, "v">, values: NumberListText): TrendSeries {
  const s = { ...head } as TrendSeries;
  defineValues(s, values);
  return s;
}

/** A series of evenly spaced points whose values are number text. */
export function evenTextSeries(head: Omit<TrendSeries, "v" | "t">, times: EvenTimes, values: NumberListText): TrendSeries {
  let built: number[] | undefined;
  const s = { signal: head.signal, unit: head.unit } as TrendSeries;
  Object.defineProperty(s, "t", { enumerable: true, get: () => (built ??= Object.freeze(evenTimes(times)) as number[]) });
  Object.defineProperty(s, EVEN_TIMES, { enumerable: false, value: Object.freeze({ ...times }) });
  defineValues(s, values);
  return s;
}

/** The times themselves: t0 + i × step, exactly as toWireTimes and fromWireSeries (trend-wire.ts) compute them. */
export function evenTimes({ t0, step, count }: EvenTimes): number[] {
  const t = new Array<number>(count);
  for (let i = 0; i < count; i++) t[i] = t0 + i * step;
  return t;
}

/** The series' values as JSON number text, when it holds them that way. */
export function valueTextOf(s: TrendSeries): NumberListText | undefined {
  return (s as Holder)[VALUE_TEXT];
}

/** The series' times as a start and a step, when it holds them that way. */
export function evenTimesOf(s: TrendSeries): EvenTimes | undefined {
  return (s as Holder)[EVEN_TIMES];
}

