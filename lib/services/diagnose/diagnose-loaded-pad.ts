// Run the engine on one pad's loaded series: pad-wide field events first (every
// well of the pad takes part), then the rules on each target well with those
// events as context, so a pad outage never becomes an issue of each well.
import { detectFieldEvents } from "@/lib/diagnostics/field-events";
import { diagnoseWell } from "@/lib/diagnostics/diagnose-well";
import type { RuleSettings } from "@/lib/diagnostics/settings";
import type { FieldEvent, Finding } from "@/lib/diagnostics/types";
import type { LoadedWellSeries } from "@/lib/services/samples/load-aligned-series";
import type { DiagnosisPad } from "./load-diagnosis-pads";

export interface PadResult {
  fieldEvents: FieldEvent[];
  wells: { wellId: number; findings: Finding[]; lastT: number }[];
}

export function diagnoseLoadedPad(
  pad: DiagnosisPad,
  loaded: LoadedWellSeries[],
  settingsFor: (wellId: number) => RuleSettings,
  padSettings: RuleSettings,
): PadResult {
  const withData = loaded.filter((l) => l.series.t.length > 1 && l.lastT !== null);
  const fieldEvents = detectFieldEvents(withData.map((l) => ({ wellId: String(l.wellId), series: l.series })), padSettings);
  const designs = new Map(pad.wells.map((w) => [w.id, w.design]));
  const wells: PadResult["wells"] = [];
  for (const l of withData) {
    if (!pad.targetIds.has(l.wellId)) continue;
    const design = designs.get(l.wellId);
    if (!design) continue;
    const findings = diagnoseWell({ wellId: String(l.wellId), design, series: l.series, settings: settingsFor(l.wellId), context: { fieldEvents } });
    wells.push({ wellId: l.wellId, findings, lastT: l.lastT as number });
  }
  return { fieldEvents, wells };
}
