// A well's trend for the chart: each signal reduced to what a chart of the given
// width can show (raw values when they fit, otherwise min/max per time bucket
// computed in SQL), with the valve reference lines, the inferred operating valve,
// the issues and the pad's field events over the range.
import type pg from "pg";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { AppError } from "@/lib/errors";
import { CANONICAL_UNIT } from "@/lib/units/units";
import { SIGNAL_CODE, SIGNAL_QUANTITY, type Signal } from "@/lib/signals";
import { inferOperatingPoint, valveSurfacePressures } from "@/lib/gaslift/operating-point";
import type { WellDesign } from "@/lib/gaslift/types";
import { DEFAULT_WIDTH_PX, chooseBucketMs, chooseBucketSource, planBuckets, pointCap, type BucketPlan } from "@/lib/trends/bucket-plan";
import { breakGaps, gapPositions, minMaxPointTimes, timesWithGaps } from "@/lib/trends/minmax-points";
import { insertNulls } from "@/lib/trends/number-list-text";
import { evenTextSeries, evenTimesOf, textSeries, valueTextOf } from "@/lib/trends/text-series";
import { formatOperatingValve, formatValveLabel } from "@/lib/trends/valve-label";
import type { TrendData, TrendOperatingPoint, TrendSeries, TrendValveLine } from "@/lib/trends/trend-types";
import { getReadPool } from "@/lib/services/samples/sample-db";
import { countRawValues, readMinMaxBuckets, readRawValues, type MinMaxColumns, type SeriesQuery } from "./query-trend-series";
import { RECENT_MEDIAN_CODES, readRecentMedians, type RecentMedians } from "./read-recent-medians";
import { readSeriesVersions, readThroughCache } from "./trend-sample-cache";
import { readLiveMedians } from "./live-medians-cache";
import { readTrendContext } from "./read-trend-context";

/** The five signals of the chart's three panels. */
export const DEFAULT_TREND_SIGNALS: readonly Signal[] = ["casing_pressure", "tubing_pressure", "injection_rate", "gas_rate", "liquid_rate"];
/** Longest range one request may ask for (about five years). */
export const MAX_TREND_RANGE_MS = 5 * 366 * 86_400_000;
/** Raw values further apart than this are never joined by a line (a 1-hour outage breaks it). */
const MIN_GAP_MS = 60 * 60_000;

export interface TrendRequest {
  from: number;
  to: number;
  width?: number;
  signals?: readonly Signal[];
}

export async function getTrendData(actor: Actor, wellId: number, req: TrendRequest): Promise<TrendData> {
  requireCapability(actor, "wells.read");
  const { from, to } = req;
  if (!(Number.isFinite(from) && Number.isFinite(to) && from < to)) {
    throw new AppError("invalid", "The range must end after it starts", [{ path: "to", message: "must be after from" }]);
  }
  if (to - from > MAX_TREND_RANGE_MS) {
    throw new AppError("invalid", "The range is too long (at most five years)", [{ path: "from", message: "range too long" }]);
  }
  const signals = [...new Set(req.signals && req.signals.length > 0 ? req.signals : DEFAULT_TREND_SIGNALS)];
  const widthPx = req.width ?? DEFAULT_WIDTH_PX;
  const db = getReadPool();
  const q: SeriesQuery = { wellId, codes: signals.map((s) => SIGNAL_CODE[s]), fromMs: from, toMs: to };
  const scope = { organizationId: actor.organizationId, wellId, fromMs: from, toMs: to };

  // The reads are independent, so they run side by side. readTrendContext answers
  // 404 for another organization's well; the sample reads (samples carry no
  // organization) start alongside it, and their results are dropped, never
  // returned, when it does.
  const [well, { reduced, recent }] = await Promise.all([readTrendContext(db, scope), readSamplePart(db, q, signals, widthPx)]);

  return {
    wellId: well.wellId,
    from,
    to,
    resolution: reduced.plan.resolution,
    bucketMs: reduced.plan.bucketMs,
    series: reduced.series,
    overlays: {
      recent,
      valves: readValveLines(well.design, recent),
      operatingPoint: readOperatingPoint(well.design, recent),
      issues: well.issues,
      fieldEvents: well.fieldEvents,
    },
  };
}

interface SamplePart {
  reduced: { plan: BucketPlan; series: TrendSeries[] };
  recent: RecentMedians;
}

/**
 * Everything read from the samples: the reduced series, through the in-memory cache
 * of answers (trend-sample-cache.ts), and the recent medians, through the per-well
 * cache of live medians (live-medians-cache.ts). Both are keyed on the versions of
 * every series read, read first. Cached answers are shared between requests, so
 * they are frozen.
 */
async function readSamplePart(db: pg.Pool, q: SeriesQuery, signals: Signal[], widthPx: number): Promise<SamplePart> {
  const key = `${q.wellId}|${q.codes.join(",")}|${q.fromMs}|${q.toMs}|${widthPx}`;
  const version = await readSeriesVersions(db, q.wellId, [...new Set([...q.codes, ...RECENT_MEDIAN_CODES])]);
  const [reduced, recent] = await Promise.all([
    readThroughCache(key, version, async () => freezeReduced(await readReducedSeries(db, q, signals, widthPx))),
    readLiveMedians(q.wellId, version, q.fromMs, q.toMs, () => readRecentMedians(db, q.wellId, q.fromMs, q.toMs)),
  ]);
  return { reduced, recent };
}

function freezeReduced(reduced: SamplePart["reduced"]): SamplePart["reduced"] {
  for (const s of reduced.series) {
    // A text series' values, and evenly spaced times, are built (and frozen) only if read.
    if (evenTimesOf(s) === undefined) Object.freeze(s.t);
    if (valueTextOf(s) === undefined) Object.freeze(s.v);
    Object.freeze(s);
  }
  // A frozen series list also lets serializeTrendData reuse its encoded bytes.
  Object.freeze(reduced.series);
  return Object.freeze(reduced);
}

/**
 * Each signal as the chart can show it. When the bucket is read from a rollup, the
 * rollup's counts come with the buckets, so the usual case is one query; only a
 * sparse range whose values fit under the cap is read again as raw values. Short
 * ranges (buckets under 15 minutes) count from samples_15m first, then read the
 * samples once, raw or bucketed.
 */
async function readReducedSeries(db: pg.Pool, q: SeriesQuery, signals: Signal[], widthPx: number): Promise<{ plan: BucketPlan; series: TrendSeries[] }> {
  const range = { fromMs: q.fromMs, toMs: q.toMs, widthPx };
  const bucketMs = chooseBucketMs(q.toMs - q.fromMs, pointCap(widthPx));
  const source = chooseBucketSource(bucketMs);
  if (source !== "samples") {
    const answer = await readMinMaxBuckets(db, q, bucketMs, source);
    const plan = planBuckets({ ...range, maxRawCount: maxOf(answer.counts) });
    if (plan.resolution === "minmax") return { plan, series: toBucketSeries(signals, answer.buckets, plan.bucketMs) };
    return { plan, series: toRawSeries(signals, await readRawValues(db, q)) };
  }
  const plan = planBuckets({ ...range, maxRawCount: maxOf(await countRawValues(db, q)) });
  if (plan.resolution === "raw") return { plan, series: toRawSeries(signals, await readRawValues(db, q)) };
  const answer = await readMinMaxBuckets(db, q, plan.bucketMs, "samples");
  return { plan, series: toBucketSeries(signals, answer.buckets, plan.bucketMs) };
}

function toRawSeries(signals: Signal[], raw: Map<number, { t: number[]; v: number[] }>): TrendSeries[] {
  return signals.map((signal) => {
    const s = raw.get(SIGNAL_CODE[signal]) ?? { t: [], v: [] };
    return { signal, unit: CANONICAL_UNIT[SIGNAL_QUANTITY[signal]], ...breakGaps(s, { minGapMs: MIN_GAP_MS }) };
  });
}

/** Bucketed series keep their values as the database's number text (lib/trends/text-series.ts). */
function toBucketSeries(signals: Signal[], buckets: Map<number, MinMaxColumns>, bucketMs: number): TrendSeries[] {
  return signals.map((signal) => {
    const head = { signal, unit: CANONICAL_UNIT[SIGNAL_QUANTITY[signal]] };
    const { starts, consecutive, values } = buckets.get(SIGNAL_CODE[signal]) ?? { starts: [], consecutive: true, values: "" };
    // Consecutive buckets give evenly spaced points (minMaxPointTimes) and no gap.
    if (consecutive && starts.length > 0) return evenTextSeries(head, { t0: starts[0] + bucketMs / 4, step: bucketMs / 2, count: 2 * starts.length }, values);
    const t = minMaxPointTimes(starts, bucketMs);
    // A missing bucket or two is a short outage; more breaks the line.
    const gaps = gapPositions(t, { factor: 3, minGapMs: MIN_GAP_MS });
    return textSeries({ ...head, t: timesWithGaps(t, gaps) }, insertNulls(values, gaps));
  });
}

const maxOf = (counts: Map<number, number>) => Math.max(0, ...counts.values());

/** Each valve's surface opening and closing pressure at the recent tubing pressure. */
function readValveLines(design: WellDesign, recent: RecentMedians): TrendValveLine[] {
  if (recent.tubingPsig === null || design.mandrels.length === 0) return [];
  return valveSurfacePressures(design, recent.tubingPsig).map((v) => ({
    position: v.position,
    kind: v.kind,
    surfaceOpeningPsig: v.surfaceOpeningPsig,
    surfaceClosingPsig: v.surfaceClosingPsig,
    openLabel: v.surfaceOpeningPsig === null ? null : formatValveLabel(v.position, "open", v.surfaceOpeningPsig),
    closeLabel: v.surfaceClosingPsig === null ? null : formatValveLabel(v.position, "close", v.surfaceClosingPsig),
  }));
}

function readOperatingPoint(design: WellDesign, recent: RecentMedians): TrendOperatingPoint | null {
  if (recent.tubingPsig === null || recent.casingPsig === null || design.mandrels.length === 0) return null;
  const op = inferOperatingPoint(design, {
    casingPsig: recent.casingPsig,
    tubingPsig: recent.tubingPsig,
    injectionMscfd: recent.injectionMscfd ?? undefined,
  });
  return {
    position: op.operatingPosition,
    openPositions: op.openPositions,
    label: formatOperatingValve(op.operatingPosition, op.openPositions),
    notes: op.notes,
  };
}
