"use client";
// Long files: which columns hold the tag, value and quality, and how a tag
// becomes (well, signal): a pattern with named groups, or a list of tags.
import { SIGNAL_LABEL } from "@/lib/signals";
import { guessSignal } from "@/lib/ingest/guess-signal";
import type { Detection } from "@/lib/ingest/types";
import { SignalSelect, UnitSelect } from "@/components/upload-signal-select";
import {
  keepOrDefaultUnit,
  listAliasSignals,
  listSeenTags,
  type MappingDraft,
  type TableRow,
} from "@/components/upload-mapping-draft";

type Long = MappingDraft["long"];

/** The signal texts the pattern captures from the seen tags, in first-seen order. */
function captureSignalTexts(pattern: string, tags: string[]): string[] {
  let re: RegExp;
  try {
    re = new RegExp(pattern);
  } catch {
    return [];
  }
  const out = new Set<string>();
  for (const t of tags) {
    const s = re.exec(t.trim())?.groups?.signal?.trim();
    if (s) out.add(s.toLowerCase());
  }
  return [...out];
}

export function LongTagsEditor({ draft, detection: d, onChange }: { draft: MappingDraft; detection: Detection; onChange: (p: Partial<Long>) => void }) {
  const l = draft.long;
  const others = d.columns.filter((c) => c !== draft.timeColumn);
  const seen = listSeenTags(d, l.tagColumn);
  const columnSelect = (id: string, label: string, value: string, set: (v: string) => void, optional = false) => (
    <div>
      <label htmlFor={id} className="field-label">{label}</label>
      <select id={id} className="field-input" value={value} onChange={(e) => set(e.target.value)}>
        <option value="">{optional ? "None" : "Choose a column"}</option>
        {others.map((c) => <option key={c} value={c}>{c}</option>)}
      </select>
    </div>
  );

  function fillAliases() {
    const have = new Set(l.aliases.map((a) => a.text.trim().toLowerCase()));
    const added = captureSignalTexts(l.pattern, seen).filter((t) => !have.has(t)).map((text) => ({ text, signal: guessSignal(text) ?? ("" as const) }));
    const aliases = [...l.aliases, ...added];
    const units = { ...l.units };
    for (const s of listAliasSignals(aliases)) units[s] = units[s] ?? keepOrDefaultUnit(s, "");
    onChange({ aliases, units });
  }

  function fillEntries() {
    const have = new Set(l.entries.map((e) => e.tag.trim()));
    const added: TableRow[] = seen.filter((t) => !have.has(t)).map((tag) => ({ tag, wellKey: "", signal: "", unit: "" }));
    onChange({ entries: [...l.entries, ...added] });
  }

  const setEntry = (i: number, p: Partial<TableRow>) => onChange({ entries: l.entries.map((e, j) => (j === i ? { ...e, ...p } : e)) });

  return (
    <div className="space-y-4">
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        {columnSelect("tag-column", "Tag column", l.tagColumn, (v) => onChange({ tagColumn: v }))}
        {columnSelect("value-column", "Value column", l.valueColumn, (v) => onChange({ valueColumn: v }))}
        {columnSelect("quality-column", "Quality column", l.qualityColumn, (v) => onChange({ qualityColumn: v }), true)}
        {l.qualityColumn && (
          <div>
            <label htmlFor="good-quality" className="field-label">Quality texts that mean good (comma-separated)</label>
            <input id="good-quality" className="field-input" value={l.goodQuality} onChange={(e) => onChange({ goodQuality: e.target.value })} placeholder="Good, 192" />
          </div>
        )}
      </div>

      <fieldset className="space-y-2">
        <legend className="field-label">How a tag names its well and signal</legend>
        <div className="flex flex-wrap gap-x-6 gap-y-1 text-sm">
          <label className="flex items-center gap-2">
            <input type="radio" name="tagMode" checked={l.mode === "pattern"} onChange={() => onChange({ mode: "pattern" })} />
            A rule that fits every tag
          </label>
          <label className="flex items-center gap-2">
            <input type="radio" name="tagMode" checked={l.mode === "table"} onChange={() => onChange({ mode: "table" })} />
            A list, tag by tag
          </label>
        </div>
      </fieldset>

      {l.mode === "pattern" ? (
        <div className="space-y-3">
          <div>
            <label htmlFor="tag-pattern" className="field-label">Tag pattern (regular expression with groups well and signal)</label>
            <input id="tag-pattern" className="field-input font-mono" spellCheck={false} value={l.pattern} onChange={(e) => onChange({ pattern: e.target.value })} />
            <p className="mt-1 text-xs text-ink-faint">
              Example: <code>^(?&lt;well&gt;.+)\.(?&lt;signal&gt;[^.]+)$</code> reads “HX-0314.CSG” as well HX-0314, signal text CSG.
            </p>
          </div>
          <div className="overflow-x-auto rounded border border-line">
            <table className="data-table w-full">
              <caption className="sr-only">Signal texts in tags</caption>
              <thead>
                <tr><th scope="col">Signal text in the tag</th><th scope="col" className="min-w-44">Signal</th><th scope="col"><span className="sr-only">Remove</span></th></tr>
              </thead>
              <tbody>
                {l.aliases.map((a, i) => (
                  <tr key={i}>
                    <td>
                      <input aria-label={`Signal text ${i + 1}`} className="field-input font-mono" value={a.text}
                        onChange={(e) => onChange({ aliases: l.aliases.map((x, j) => (j === i ? { ...x, text: e.target.value } : x)) })} />
                    </td>
                    <td>
                      <SignalSelect id={`alias-${i}`} label={`Signal for text ${a.text || i + 1}`} value={a.signal} emptyLabel="Choose a signal"
                        onChange={(signal) => {
                          const aliases = l.aliases.map((x, j) => (j === i ? { ...x, signal } : x));
                          onChange({ aliases, units: signal && !l.units[signal] ? { ...l.units, [signal]: keepOrDefaultUnit(signal, "") } : l.units });
                        }} />
                    </td>
                    <td>
                      <button type="button" className="text-xs text-bad underline" onClick={() => onChange({ aliases: l.aliases.filter((_, j) => j !== i) })}>Remove</button>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <div className="flex flex-wrap gap-3 text-sm">
            <button type="button" className="rounded border border-line px-2 py-1 hover:bg-paper-sunk" onClick={() => onChange({ aliases: [...l.aliases, { text: "", signal: "" }] })}>Add a signal text</button>
            <button type="button" className="rounded border border-line px-2 py-1 hover:bg-paper-sunk" onClick={fillAliases}>Add texts found in the tags</button>
          </div>
          {listAliasSignals(l.aliases).length > 0 && (
            <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
              {listAliasSignals(l.aliases).map((s) => (
                <div key={s}>
                  <label htmlFor={`unit-${s}`} className="field-label">Unit of {SIGNAL_LABEL[s].toLowerCase()}</label>
                  <UnitSelect id={`unit-${s}`} signal={s} value={l.units[s] ?? ""} onChange={(u) => onChange({ units: { ...l.units, [s]: u } })} />
                </div>
              ))}
            </div>
          )}
        </div>
      ) : (
        <div className="space-y-2">
          <div className="overflow-x-auto rounded border border-line">
            <table className="data-table w-full">
              <caption className="sr-only">Tag list</caption>
              <thead>
                <tr><th scope="col">Tag</th><th scope="col">Well name</th><th scope="col" className="min-w-40">Signal</th><th scope="col" className="min-w-28">Unit</th><th scope="col"><span className="sr-only">Remove</span></th></tr>
              </thead>
              <tbody>
                {l.entries.map((e, i) => (
                  <tr key={i}>
                    <td><input aria-label={`Tag ${i + 1}`} className="field-input font-mono" value={e.tag} onChange={(ev) => setEntry(i, { tag: ev.target.value })} /></td>
                    <td><input aria-label={`Well of tag ${i + 1}`} className="field-input" value={e.wellKey} onChange={(ev) => setEntry(i, { wellKey: ev.target.value })} /></td>
                    <td>
                      <SignalSelect id={`entry-${i}-signal`} label={`Signal of tag ${i + 1}`} value={e.signal} emptyLabel="Choose a signal"
                        onChange={(signal) => setEntry(i, { signal, unit: signal ? keepOrDefaultUnit(signal, e.unit) : "" })} />
                    </td>
                    <td><UnitSelect id={`entry-${i}-unit`} label={`Unit of tag ${i + 1}`} signal={e.signal} value={e.unit} onChange={(unit) => setEntry(i, { unit })} /></td>
                    <td><button type="button" className="text-xs text-bad underline" onClick={() => onChange({ entries: l.entries.filter((_, j) => j !== i) })}>Remove</button></td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <div className="flex flex-wrap gap-3 text-sm">
            <button type="button" className="rounded border border-line px-2 py-1 hover:bg-paper-sunk" onClick={() => onChange({ entries: [...l.entries, { tag: "", wellKey: "", signal: "", unit: "" }] })}>Add a tag</button>
            <button type="button" className="rounded border border-line px-2 py-1 hover:bg-paper-sunk" onClick={fillEntries}>Add every tag seen ({seen.length})</button>
          </div>
        </div>
      )}
    </div>
  );
}
