"use client";
// Wide files: which well the rows belong to, and each column's signal and unit.
import { SignalSelect, UnitSelect } from "@/components/upload-signal-select";
import { keepOrDefaultUnit, type MappingDraft } from "@/components/upload-mapping-draft";
import type { Detection } from "@/lib/ingest/types";
import type { WellChoice } from "./mapping-form";

type Wide = MappingDraft["wide"];

export function WideColumnsEditor({
  draft,
  detection: d,
  wells,
  onChange,
}: {
  draft: MappingDraft;
  detection: Detection;
  wells: WellChoice[];
  onChange: (p: Partial<Wide>) => void;
}) {
  const w = draft.wide;
  const dataColumns = d.columns.filter((c) => c !== draft.timeColumn && !(w.wellMode === "column" && c === w.wellColumn));
  const sample = (c: string) => d.preview[0]?.[d.columns.indexOf(c)] ?? "";

  return (
    <div className="space-y-4">
      <fieldset className="space-y-2">
        <legend className="field-label">Which well</legend>
        <div className="flex flex-wrap gap-x-6 gap-y-1 text-sm">
          <label className="flex items-center gap-2">
            <input type="radio" name="wellMode" checked={w.wellMode === "one"} onChange={() => onChange({ wellMode: "one" })} />
            The whole file is one well
          </label>
          <label className="flex items-center gap-2">
            <input type="radio" name="wellMode" checked={w.wellMode === "column"} onChange={() => onChange({ wellMode: "column" })} />
            A column names the well on each row
          </label>
        </div>
        {w.wellMode === "one" ? (
          <div className="max-w-md">
            <label htmlFor="one-well" className="field-label">Well for this file</label>
            <select
              id="one-well"
              className="field-input"
              value={w.wellId ?? ""}
              onChange={(e) => onChange({ wellId: e.target.value ? Number(e.target.value) : null })}
            >
              <option value="">Choose a registered well</option>
              {wells.map((x) => <option key={x.id} value={x.id}>{x.label}</option>)}
            </select>
          </div>
        ) : (
          <div className="max-w-md">
            <label htmlFor="well-column" className="field-label">Well column</label>
            <select id="well-column" className="field-input" value={w.wellColumn} onChange={(e) => onChange({ wellColumn: e.target.value })}>
              <option value="">Choose a column</option>
              {d.columns.filter((c) => c !== draft.timeColumn).map((c) => <option key={c} value={c}>{c}</option>)}
            </select>
          </div>
        )}
      </fieldset>

      <div className="overflow-x-auto rounded border border-line">
        <table className="data-table w-full">
          <caption className="sr-only">Signal and unit of each column</caption>
          <thead>
            <tr>
              <th scope="col">Column</th>
              <th scope="col">First value</th>
              <th scope="col" className="min-w-44">Signal</th>
              <th scope="col" className="min-w-32">Unit in the file</th>
            </tr>
          </thead>
          <tbody>
            {dataColumns.map((c, i) => {
              const cur = w.columns[c] ?? { signal: "" as const, unit: "" };
              const set = (next: { signal: typeof cur.signal; unit: string }) => onChange({ columns: { ...w.columns, [c]: next } });
              return (
                <tr key={c} data-testid="wide-column-row">
                  <th scope="row" className="normal-case tracking-normal text-ink">{c}</th>
                  <td className="font-mono text-xs">{sample(c)}</td>
                  <td>
                    <SignalSelect
                      id={`col-${i}-signal`}
                      label={`Signal of column ${c}`}
                      value={cur.signal}
                      emptyLabel="Not used"
                      onChange={(signal) => set({ signal, unit: signal ? keepOrDefaultUnit(signal, cur.unit) : "" })}
                    />
                  </td>
                  <td>
                    <UnitSelect id={`col-${i}-unit`} label={`Unit of column ${c}`} signal={cur.signal} value={cur.unit} onChange={(unit) => set({ ...cur, unit })} />
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}
