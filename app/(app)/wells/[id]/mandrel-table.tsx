import type { UnitSystem } from "@/lib/units/units";
import type { WellDetail } from "@/lib/services/wells/well-dto";
import { UNIT_LABELS, formatLength, formatPort, formatPressure, formatValveSize } from "@/components/well-units";

export const VALVE_KIND_LABEL = { ipo: "Unloading valve (IPO)", orifice: "Orifice", dummy: "Dummy" } as const;

/** The valve string as installed, top mandrel first. */
export function MandrelTable({ mandrels, system }: { mandrels: WellDetail["mandrels"]; system: UnitSystem }) {
  const u = UNIT_LABELS[system];
  if (mandrels.length === 0) {
    return <p className="rounded border border-dashed border-line p-4 text-sm text-ink-soft">No mandrels on file for this well.</p>;
  }
  return (
    <div className="overflow-x-auto rounded border border-line bg-paper-raised">
      <table className="data-table w-full" data-testid="mandrel-table">
        <caption className="sr-only">Mandrels and valves, top to bottom</caption>
        <thead>
          <tr>
            <th scope="col">#</th>
            <th scope="col" className="text-right">MD ({u.length})</th>
            <th scope="col" className="text-right">TVD ({u.length})</th>
            <th scope="col">Kind</th>
            <th scope="col" className="text-right">Port ({u.diameter})</th>
            <th scope="col" className="text-right">Valve size ({u.diameter})</th>
            <th scope="col" className="text-right">R</th>
            <th scope="col" className="text-right">Test-rack opening ({u.pressure})</th>
            <th scope="col">Installed</th>
          </tr>
        </thead>
        <tbody>
          {[...mandrels].sort((a, b) => a.position - b.position).map((m) => (
            <tr key={m.id} data-testid="mandrel-row">
              <td className="tabular-nums">{m.position}</td>
              <td className="text-right tabular-nums">{formatLength(m.mdFt, system)}</td>
              <td className="text-right tabular-nums">{formatLength(m.tvdFt, system)}</td>
              <td>{VALVE_KIND_LABEL[m.kind]}</td>
              <td className="text-right tabular-nums">{formatPort(m.portIn, system)}</td>
              <td className="text-right tabular-nums">{formatValveSize(m.valveOdIn, system)}</td>
              <td className="text-right tabular-nums">{m.rRatio == null ? "—" : m.rRatio.toFixed(4)}</td>
              <td className="text-right tabular-nums">{formatPressure(m.tropsig, system)}</td>
              <td className="whitespace-nowrap">{m.installedOn ?? "—"}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
