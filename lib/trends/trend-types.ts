// The shape of a trend answer, shared by the service, the route and the chart.
// Values are in canonical units (psig, Mscf/d, bbl/d); times are epoch ms UTC.
import type { Signal } from "@/lib/signals";
import type { Resolution } from "./bucket-plan";

export interface TrendSeries {
  signal: Signal;
  unit: string;
  t: number[];
  /** Null marks a gap in the data. */
  v: (number | null)[];
}

export interface TrendValveLine {
  position: number;
  kind: "ipo" | "orifice" | "dummy";
  surfaceOpeningPsig: number | null;
  surfaceClosingPsig: number | null;
  /** "V1 open 1,012 psig" (canonical units; the chart relabels in the reader's units). */
  openLabel: string | null;
  closeLabel: string | null;
}

export interface TrendOperatingPoint {
  position: number | null;
  openPositions: number[];
  label: string;
  notes: string[];
}

export interface TrendIssueWindow {
  id: number;
  rule: string;
  label: string;
  start: number;
  /** Null while the issue is ongoing. */
  end: number | null;
  status: string;
}

export interface TrendFieldEvent {
  id: number;
  kind: string;
  label: string;
  start: number;
  end: number | null;
  summary: string;
}

export interface TrendData {
  wellId: number;
  from: number;
  to: number;
  resolution: Resolution;
  /** 0 for raw values. */
  bucketMs: number;
  series: TrendSeries[];
  overlays: {
    /** The recent medians the valve lines and operating point were read at; null without data. */
    recent: { casingPsig: number | null; tubingPsig: number | null; injectionMscfd: number | null; windowEnd: number | null };
    valves: TrendValveLine[];
    operatingPoint: TrendOperatingPoint | null;
    issues: TrendIssueWindow[];
    fieldEvents: TrendFieldEvent[];
  };
}
