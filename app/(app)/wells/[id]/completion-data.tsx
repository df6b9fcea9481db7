import type { UnitSystem } from "@/lib/units/units";
import type { WellDetail } from "@/lib/services/wells/well-dto";
import { UNIT_LABELS, formatDiameter, formatLength, formatPressure, formatTemperature } from "@/components/well-units";

const LIQUID_LABEL = { oil: "Oil", water: "Water", condensate: "Condensate" } as const;

/** The well's completion and reservoir data, in the reader's unit system. */
export function CompletionData({ well, system }: { well: WellDetail; system: UnitSystem }) {
  const u = UNIT_LABELS[system];
  const d = well.design;
  // Oil and condensate gravity is entered as °API, water as specific gravity (see WellSchema).
  const gravity = d.liquidType === "water" ? `${d.liquidGravity.toFixed(3)} SG` : `${d.liquidGravity.toFixed(1)} °API`;
  const rows: [string, string][] = [
    ["Tubing inner diameter", `${formatDiameter(d.tubingIdIn, system)} ${u.diameter}`],
    ["Tubing depth", `${formatLength(d.tubingDepthFt, system)} ${u.length}`],
    ["Perforation depth", `${formatLength(d.perfDepthFt, system)} ${u.length}`],
    ["Surface temperature", `${formatTemperature(d.surfaceTempF, system)} ${u.temperature}`],
    ["Bottom-hole temperature", `${formatTemperature(d.bottomholeTempF, system)} ${u.temperature}`],
    ["Injection gas specific gravity", d.gasSg.toFixed(3)],
    ["Produced liquid", `${LIQUID_LABEL[d.liquidType]}, ${gravity}`],
    ["Water cut", `${(d.waterCut * 100).toFixed(0)} %`],
    ["Reservoir static pressure", `${formatPressure(d.reservoirPressurePsig, system)} ${u.pressure}`],
    ["Available injection pressure", `${formatPressure(d.injectionPressurePsig, system)} ${u.pressure}`],
    ["Time zone", well.timeZone],
  ];
  return (
    <dl className="grid grid-cols-1 gap-x-6 gap-y-2 sm:grid-cols-2 lg:grid-cols-3" data-testid="completion-data">
      {rows.map(([label, value]) => (
        <div key={label} className="border-b border-line/70 pb-1">
          <dt className="text-xs text-ink-soft">{label}</dt>
          <dd className="text-sm tabular-nums">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
