// Types of the labelled synthetic data: one well's minute series and the windows
// where each rule (or confounder) is known to be present.
import type { RuleKey } from "@/lib/diagnostics/types";
import type { WellDesign } from "@/lib/gaslift/types";
import type { DemoWell } from "@/lib/scenario/demo-design";

/** Things that move the trends but are not a well problem (DOMAIN.md §4). */
export type ConfounderKind = "kickoff" | "setpoint_change" | "pad_outage";

export type ScenarioKind = "normal" | RuleKey | "kickoff" | "setpoint_change";

export interface ScenarioLabel {
  kind: RuleKey | ConfounderKind;
  isConfounder: boolean;
  start: number;
  /** Null when the condition lasts past the end of the data. */
  end: number | null;
}

export interface ScenarioSeries {
  t: Float64Array;
  casing: Float64Array;
  tubing: Float64Array;
  injection: Float64Array;
  gas: Float64Array;
  liquid: Float64Array;
}

export interface WellScenario {
  kind: ScenarioKind;
  design: WellDesign;
  well: DemoWell;
  series: ScenarioSeries;
  labels: ScenarioLabel[];
  /** Injection setpoint changes made in the data (what an operator's log would hold). */
  setpointChanges: { at: number; fromMscfd: number; toMscfd: number }[];
}

export interface TimeSpan {
  start: number;
  end: number;
}
