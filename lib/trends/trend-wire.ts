// The trend answer as it travels: each series' times as a start and the steps
// between points instead of full epoch-ms times. Every byte is paid twice on the
// server (JSON text, then UTF-8) and again in the browser; steps are small whole
// numbers (5,400,000 ms for 3-hour buckets) where times had 13 digits. With the
// float4 min/max values (query-trend-series.ts) a 90-day answer went from 236 to
// 127 kB. Min/max points without a gap are evenly spaced, so their steps travel as
// one number, which took that answer to ~70 kB. Decoding gives back exactly the times
// the service computed (sums and multiples of whole or half milliseconds are exact
// in a double). Values are unchanged.
import type { TrendData, TrendSeries } from "./trend-types";

export interface WireTrendSeries {
  signal: TrendSeries["signal"];
  unit: string;
  /** The first point's time, epoch ms (0 when there are no points). */
  t0: number;
  /**
   * Per point, ms since the point before (0 for the first); or, when every point
   * is the same step after the one before, that step alone (as many points as v).
   */
  dt: number[] | number;
  v: (number | null)[];
}

export type WireTrendData = Omit<TrendData, "series"> & { series: WireTrendSeries[] };

/** A series' times as they travel: the first time and the steps (one number when they are all equal). */
export function toWireTimes(t: readonly number[]): Pick<WireTrendSeries, "t0" | "dt"> {
  const t0 = t.length > 0 ? t[0] : 0;
  if (t.length >= 3 && isEvenlySpaced(t)) return { t0, dt: t[1] - t[0] };
  const dt = new Array<number>(t.length);
  for (let i = 0; i < t.length; i++) dt[i] = i === 0 ? 0 : t[i] - t[i - 1];
  return { t0, dt };
}

/** Every point one step after the one before, and the times rebuilt as t0 + i × step are the same numbers. */
function isEvenlySpaced(t: readonly number[]): boolean {
  const step = t[1] - t[0];
  for (let i = 1; i < t.length; i++) if (t[i] !== t[0] + i * step) return false;
  return true;
}

export function toWireSeries(s: TrendSeries): WireTrendSeries {
  return { signal: s.signal, unit: s.unit, ...toWireTimes(s.t), v: s.v };
}

export function fromWireSeries(w: WireTrendSeries): TrendSeries {
  const { dt } = w;
  if (typeof dt === "number") {
    const t = new Array<number>(w.v.length);
    for (let i = 0; i < t.length; i++) t[i] = w.t0 + i * dt;
    return { signal: w.signal, unit: w.unit, t, v: w.v };
  }
  const t = new Array<number>(dt.length);
  let at = w.t0;
  for (let i = 0; i < dt.length; i++) {
    at += dt[i];
    t[i] = at;
  }
  return { signal: w.signal, unit: w.unit, t, v: w.v };
}

/** The answer the chart works with, from the answer as sent. */
export function decodeTrendData(w: WireTrendData): TrendData {
  return { ...w, series: w.series.map(fromWireSeries) };
}
