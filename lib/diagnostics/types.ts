// Plain types of the diagnostics engine: aligned minute series and a well's
// design in, findings with their evidence out. No I/O, no framework.
import type { WellDesign } from "@/lib/gaslift/types";
import type { RuleSettings } from "@/lib/diagnostics/settings";

export const RULE_KEYS = [
  "multipointing",
  "heading",
  "valve_leak",
  "liquid_loading",
  "frac_hit",
  "over_injection",
  "fast_kickoff",
  "data_quality",
] as const;

export type RuleKey = (typeof RULE_KEYS)[number];

/** A value or a gap. NaN and null both mean "no reading". */
export type SeriesValues = ArrayLike<number | null>;

/**
 * Signals of one well on a shared time axis (epoch ms, 1-minute steps).
 * Any signal may be missing, and any value may be a gap (null or NaN).
 * Units: pressures psig, gas rates Mscf/d, liquid bbl/d.
 */
export interface AlignedSeries {
  t: Float64Array | number[];
  casing?: SeriesValues;
  tubing?: SeriesValues;
  injection?: SeriesValues;
  gas?: SeriesValues;
  liquid?: SeriesValues;
}

export type SignalKey = "casing" | "tubing" | "injection" | "gas" | "liquid";
export const SIGNAL_KEYS: readonly SignalKey[] = ["casing", "tubing", "injection", "gas", "liquid"];

export interface TimeWindow {
  start: number;
  end: number;
}

export interface FieldEvent extends TimeWindow {
  kind: string;
  /** Wells that took part, when known. */
  wellIds?: string[];
}

export interface SetpointChange {
  at: number;
  fromMscfd?: number;
  toMscfd: number;
}

export interface DiagnosisContext {
  fieldEvents?: FieldEvent[];
  setpointChanges?: SetpointChange[];
}

export interface DiagnosisInput {
  wellId: string;
  design: WellDesign;
  series: AlignedSeries;
  settings: RuleSettings;
  context?: DiagnosisContext;
}

export interface Evidence {
  label: string;
  value: number;
  threshold: number;
  unit: string;
  /** The statistic and its threshold, in plain words. */
  text: string;
}

export interface Annotations {
  windows: { start: number; end: number; label: string }[];
  levels: { value: number; unit: "psig"; label: string }[];
  operatingValve?: number | null;
}

export interface ProductionAtRisk {
  value: number;
  unit: "bbl/d" | "Mscf/d";
  method: string;
}

export interface Finding {
  rule: RuleKey;
  start: number;
  /** Null when the signature is still present at the end of the data. */
  end: number | null;
  /** 0..100. */
  severity: number;
  /** 0..1. */
  confidence: number;
  evidence: Evidence[];
  summary: string;
  annotations: Annotations;
  productionAtRisk: ProductionAtRisk;
}
