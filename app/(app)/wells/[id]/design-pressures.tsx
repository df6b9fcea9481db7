import type { UnitSystem } from "@/lib/units/units";
import type { WellDetail } from "@/lib/services/wells/well-dto";
import { DEFAULT_TUBING_GRADIENT_PSI_PER_FT, valveSurfacePressures, type ValveSurfacePressures } from "@/lib/gaslift/operating-point";
import { UNIT_LABELS, formatLength, formatPressure, formatPressureDelta } from "@/components/well-units";
import { VALVE_KIND_LABEL } from "./mandrel-table";

/**
 * Each unloading valve's surface opening and closing pressure at one surface
 * tubing pressure: the reference levels a casing-pressure trend is read
 * against (DOMAIN.md §3, IPO valve; computed by lib/gaslift/operating-point).
 */
export function DesignPressures({
  well,
  system,
  tubingPsig,
  tpInput,
  isTpIgnored,
}: {
  well: WellDetail;
  system: UnitSystem;
  tubingPsig: number;
  tpInput: string;
  isTpIgnored: boolean;
}) {
  const u = UNIT_LABELS[system];
  let rows: ValveSurfacePressures[] = [];
  let failure: string | null = null;
  try {
    rows = valveSurfacePressures(well.design, tubingPsig);
  } catch (e) {
    // A design the engineering core cannot evaluate should not take the page down.
    failure = e instanceof Error ? e.message : "the design could not be evaluated";
  }
  const byPosition = new Map(well.mandrels.map((m) => [m.position, m]));
  const drops = dropsFromValveAbove(rows);

  return (
    <div className="space-y-3">
      <form method="get" className="flex flex-wrap items-end gap-2" aria-label="Tubing pressure for the design table">
        <div>
          <label htmlFor="tp" className="field-label">Surface tubing pressure ({u.pressure})</label>
          <input id="tp" name="tp" type="number" step="any" min={0} defaultValue={tpInput} className="field-input w-36" />
        </div>
        <button type="submit" className="rounded border border-line bg-paper-raised px-3 py-1.5 text-sm hover:border-ink-faint">Recalculate</button>
        {isTpIgnored && <p className="text-xs text-bad" role="status">That tubing pressure is out of range (0–5,000 psig); the default is shown.</p>}
      </form>

      {failure ? (
        <p className="text-sm text-bad">The design pressures could not be worked out: {failure}.</p>
      ) : rows.length === 0 ? (
        <p className="text-sm text-ink-soft">No mandrels on file, so there is nothing to show.</p>
      ) : (
        <div className="overflow-x-auto rounded border border-line bg-paper-raised">
          <table className="data-table w-full" data-testid="design-pressure-table">
            <caption className="sr-only">Design surface opening and closing pressures at {formatPressure(tubingPsig, system)} {u.pressure} tubing pressure</caption>
            <thead>
              <tr>
                <th scope="col">#</th>
                <th scope="col" className="text-right">TVD ({u.length})</th>
                <th scope="col">Kind</th>
                <th scope="col" className="text-right">Surface opening ({u.pressure})</th>
                <th scope="col" className="text-right">Surface closing ({u.pressure})</th>
                <th scope="col" className="text-right">Drop from valve above ({u.pressureDelta})</th>
                <th scope="col">Note</th>
              </tr>
            </thead>
            <tbody>
              {rows.map((r, i) => {
                const m = byPosition.get(r.position);
                const drop = drops[i];
                return (
                  <tr key={r.position}>
                    <td className="tabular-nums">{r.position}</td>
                    <td className="text-right tabular-nums">{formatLength(r.tvdFt, system)}</td>
                    <td>{VALVE_KIND_LABEL[r.kind]}</td>
                    <td className="text-right tabular-nums">{formatPressure(r.surfaceOpeningPsig, system)}</td>
                    <td className="text-right tabular-nums">{formatPressure(r.surfaceClosingPsig, system)}</td>
                    <td className="text-right tabular-nums">{drop == null ? "—" : formatPressureDelta(drop, system)}</td>
                    <td className="text-xs text-ink-soft">{describeGap(r, m)}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      )}
      <p className="text-xs text-ink-soft">
        Worked for a nitrogen-charged dome on the well&apos;s straight geothermal line, a static gas column in the annulus
        and a flowing tubing gradient of {DEFAULT_TUBING_GRADIENT_PSI_PER_FT} psi/ft below the surface tubing pressure
        (our assumption for a gas-lifted column). Orifices and dummies have no opening pressure.
      </p>
    </div>
  );
}

/**
 * Fall in surface opening pressure from the nearest unloading valve above.
 * Successive unloading valves are usually set some 10–25 psi lower than the
 * one above (DOMAIN.md §1, common practice); the drop shows that step.
 */
function dropsFromValveAbove(rows: ValveSurfacePressures[]): (number | null)[] {
  let previous: number | null = null;
  return rows.map((r) => {
    if (r.surfaceOpeningPsig == null) return null;
    const drop = previous == null ? null : previous - r.surfaceOpeningPsig;
    previous = r.surfaceOpeningPsig;
    return drop;
  });
}

function describeGap(r: ValveSurfacePressures, m: WellDetail["mandrels"][number] | undefined): string {
  if (r.kind !== "ipo" || !m) return "";
  if (m.tropsig == null) return "No test-rack opening pressure on file";
  if (r.surfaceOpeningPsig == null) return "No R on file, and no port with a 1 or 1.5 in valve to estimate it";
  if (m.rRatio == null) return "R estimated from port and valve size";
  return "";
}
