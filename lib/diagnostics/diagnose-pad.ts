// Diagnose the wells of one pad together: first the pad-wide field events (supply
// outages), which are reported once and masked out of every well's rules, then each
// well on its own.
import type { AlignedSeries, DiagnosisContext, FieldEvent, Finding } from "@/lib/diagnostics/types";
import type { WellDesign } from "@/lib/gaslift/types";
import type { RuleSettings } from "@/lib/diagnostics/settings";
import { detectFieldEvents } from "@/lib/diagnostics/field-events";
import { diagnoseWell } from "@/lib/diagnostics/diagnose-well";

export interface PadWellInput {
  wellId: string;
  design: WellDesign;
  series: AlignedSeries;
  settings: RuleSettings;
  context?: DiagnosisContext;
}

export interface PadDiagnosis {
  fieldEvents: FieldEvent[];
  wells: { wellId: string; findings: Finding[] }[];
}

export function diagnosePad(wells: PadWellInput[], padSettings?: RuleSettings): PadDiagnosis {
  const fieldEvents = detectFieldEvents(wells.map((w) => ({ wellId: w.wellId, series: w.series })), padSettings ?? wells[0]?.settings);
  return {
    fieldEvents,
    wells: wells.map((w) => ({
      wellId: w.wellId,
      findings: diagnoseWell({
        ...w,
        context: { ...w.context, fieldEvents: [...(w.context?.fieldEvents ?? []), ...fieldEvents] },
      }),
    })),
  };
}
