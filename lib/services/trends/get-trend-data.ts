// A well's trend for the chart: each signal reduced to what a chart of the given
// width can show (raw values when they fit, otherwise min/max per time bucket
// computed in SQL), with the valve reference lines, the inferred operating valve,
// the issues and the pad's field events over the range.
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { AppError } from "@/lib/errors";
import { CANONICAL_UNIT } from "@/lib/units/units";
import { SIGNAL_CODE, SIGNAL_QUANTITY, type Signal } from "@/lib/signals";
import { inferOperatingPoint, valveSurfacePressures } from "@/lib/gaslift/operating-point";
import type { WellDesign } from "@/lib/gaslift/types";
import { DEFAULT_WIDTH_PX, planBuckets } from "@/lib/trends/bucket-plan";
import { breakGaps, toMinMaxPoints } from "@/lib/trends/minmax-points";
import { formatOperatingValve, formatValveLabel } from "@/lib/trends/valve-label";
import type { TrendData, TrendOperatingPoint, TrendSeries, TrendValveLine } from "@/lib/trends/trend-types";
import { getWell } from "@/lib/services/wells/get-well";
import { getSamplePool } from "@/lib/services/samples/sample-db";
import { countRawValues, readMinMaxBuckets, readRawValues } from "./query-trend-series";
import { readRecentMedians, type RecentMedians } from "./read-recent-medians";
import { listFieldEventWindows, listIssueWindows } from "./list-trend-windows";

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
  const well = await getWell(actor, wellId); // 404 for another organization's well
  const { from, to } = req;
  if (!(Number.isFinite(from) && Number.isFinite(to) && from < to)) {
    throw new AppError("invalid", "The range must end after it starts", [{ path: "to", message: "must be after from" }]);
  }
  if (to - from > MAX_TREND_RANGE_MS) {
    throw new AppError("invalid", "The range is too long (at most five years)", [{ path: "from", message: "range too long" }]);
  }
  const signals = [...new Set(req.signals && req.signals.length > 0 ? req.signals : DEFAULT_TREND_SIGNALS)];
  const widthPx = req.width ?? DEFAULT_WIDTH_PX;
  const db = getSamplePool();
  const q = { wellId: well.id, codes: signals.map((s) => SIGNAL_CODE[s]), fromMs: from, toMs: to };
  const scope = { organizationId: actor.organizationId, wellId: well.id, padId: well.padId, fromMs: from, toMs: to };

  const [counts, recent, issues, fieldEvents] = await Promise.all([
    countRawValues(db, q),
    readRecentMedians(db, well.id, from, to),
    listIssueWindows(scope),
    listFieldEventWindows(scope),
  ]);
  const plan = planBuckets({ fromMs: from, toMs: to, widthPx, maxRawCount: Math.max(0, ...counts.values()) });

  let series: TrendSeries[];
  if (plan.resolution === "raw") {
    const raw = await readRawValues(db, q);
    series = signals.map((signal) => {
      const s = raw.get(SIGNAL_CODE[signal]) ?? { t: [], v: [] };
      return { signal, unit: CANONICAL_UNIT[SIGNAL_QUANTITY[signal]], ...breakGaps(s, { minGapMs: MIN_GAP_MS }) };
    });
  } else {
    const buckets = await readMinMaxBuckets(db, q, plan.bucketMs, plan.source ?? "rollup");
    series = signals.map((signal) => {
      const points = toMinMaxPoints(buckets.get(SIGNAL_CODE[signal]) ?? [], plan.bucketMs);
      // A missing bucket or two is a short outage; more breaks the line.
      return { signal, unit: CANONICAL_UNIT[SIGNAL_QUANTITY[signal]], ...breakGaps(points, { factor: 3, minGapMs: MIN_GAP_MS }) };
    });
  }

  return {
    wellId: well.id,
    from,
    to,
    resolution: plan.resolution,
    bucketMs: plan.bucketMs,
    series,
    overlays: {
      recent,
      valves: readValveLines(well.design, recent),
      operatingPoint: readOperatingPoint(well.design, recent),
      issues,
      fieldEvents,
    },
  };
}

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
