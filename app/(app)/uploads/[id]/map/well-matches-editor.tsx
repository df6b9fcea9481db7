"use client";
// Well names in the file that the register does not know: match each to a
// registered well, or leave it and its rows are refused as "unknown well".
import type { WellChoice } from "./mapping-form";

export function WellMatchesEditor({
  keys,
  wells,
  matches,
  onChange,
}: {
  keys: string[];
  wells: WellChoice[];
  matches: Record<string, number>;
  onChange: (m: Record<string, number>) => void;
}) {
  if (keys.length === 0) return null;
  return (
    <fieldset className="space-y-2 rounded border border-warn/40 bg-warn/5 p-3">
      <legend className="px-1 text-sm font-semibold">Wells not in the register</legend>
      <p className="text-xs text-ink-soft">
        Match each name to a registered well. Rows of a name left unmatched are refused and listed in the rejected rows.
      </p>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
        {keys.map((k, i) => (
          <div key={k}>
            <label htmlFor={`match-${i}`} className="field-label">“{k}” is</label>
            <select
              id={`match-${i}`}
              className="field-input"
              value={matches[k] ?? ""}
              onChange={(e) => {
                const next = { ...matches };
                if (e.target.value) next[k] = Number(e.target.value);
                else delete next[k];
                onChange(next);
              }}
            >
              <option value="">Leave unmatched</option>
              {wells.map((w) => <option key={w.id} value={w.id}>{w.label}</option>)}
            </select>
          </div>
        ))}
      </div>
    </fieldset>
  );
}
