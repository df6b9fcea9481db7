// The trend answer as JSON bytes, in the wire form of trend-wire.ts (series times as
// a start and steps): JSON.stringify of that form, except that a series holding its
// values as the database's number text (text-series.ts) is written from that text,
// which may spell a number differently (1e+07 for 10000000) but reads back the same.
// The series part is serialized once per series list: the service hands out the
// same frozen list while its cached answer is current
// (lib/services/trends/trend-sample-cache.ts), so a repeated chart only serializes
// its small overlays.
import type { TrendData, TrendSeries } from "./trend-types";
import { evenTimesOf, valueTextOf } from "./text-series";
import { toWireSeries, toWireTimes } from "./trend-wire";

const encoder = new TextEncoder();
const seriesBytes = new WeakMap<readonly TrendSeries[], Uint8Array>();

function encodeSeries(series: readonly TrendSeries[]): Uint8Array {
  let bytes = seriesBytes.get(series);
  if (!bytes) {
    bytes = encoder.encode(`[${series.map(seriesJson).join(",")}]`);
    // Only frozen lists can be remembered: a list that may still change is encoded each time.
    if (Object.isFrozen(series)) seriesBytes.set(series, bytes);
  }
  return bytes;
}

/** One series in its wire form, with the same key order as WireTrendSeries. */
function seriesJson(s: TrendSeries): string {
  const text = valueTextOf(s);
  if (text === undefined) return JSON.stringify(toWireSeries(s));
  const even = evenTimesOf(s);
  // Evenly spaced times go out as toWireTimes would write them, without being built.
  const { t0, dt } = even && even.count >= 3 ? { t0: even.t0, dt: even.step } : toWireTimes(s.t);
  return `{"signal":${JSON.stringify(s.signal)},"unit":${JSON.stringify(s.unit)},"t0":${JSON.stringify(t0)},"dt":${JSON.stringify(dt)},"v":[${text}]}`;
}

/** JSON.stringify of the wire form of `data` as UTF-8, reusing the encoded series of a frozen series list. */
export function serializeTrendData(data: TrendData): Uint8Array<ArrayBuffer> {
  // Same key order as TrendData (and as JSON.stringify of the object the service builds).
  const head = encoder.encode(
    `{"wellId":${JSON.stringify(data.wellId)},"from":${JSON.stringify(data.from)},"to":${JSON.stringify(data.to)},` +
      `"resolution":${JSON.stringify(data.resolution)},"bucketMs":${JSON.stringify(data.bucketMs)},"series":`,
  );
  const series = encodeSeries(data.series);
  const tail = encoder.encode(`,"overlays":${JSON.stringify(data.overlays)}}`);
  const out = new Uint8Array(head.length + series.length + tail.length);
  out.set(head, 0);
  out.set(series, head.length);
  out.set(tail, head.length + series.length);
  return out;
}
