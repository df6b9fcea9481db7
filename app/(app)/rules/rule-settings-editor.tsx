"use client";
// Edit the numbers set at one level. Each box shows the value this level would
// inherit as its placeholder (empty = inherit) and the documented default beside
// it. The same parser as the server (parseRuleOverride, built on the engine's
// RuleSettingsSchema) checks the form before preview or save.
import { useMemo, useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import { parseRuleOverride, type StoredRuleOverride } from "@/lib/services/diagnose/rule-override";
import type { RuleSettingsView } from "@/lib/services/diagnose/get-rule-settings";
import type { RulePreview } from "@/lib/services/diagnose/preview-rule-settings";
import { RULE_SETTINGS_HELP } from "@/components/rule-settings-help";
import { RulePreviewTable } from "@/components/rule-preview-table";
import { previewRuleSettingsAction, saveRuleSettingsAction } from "./actions";

type Draft = Record<string, Record<string, string>>;

function toDraft(o: StoredRuleOverride): Draft {
  const d: Draft = {};
  for (const [g, values] of Object.entries(o)) for (const [k, v] of Object.entries(values ?? {})) (d[g] ??= {})[k] = String(v);
  return d;
}

function fromDraft(d: Draft): { value: Record<string, Record<string, number | string>>; isNumeric: boolean } {
  const value: Record<string, Record<string, number | string>> = {};
  let isNumeric = true;
  for (const [g, values] of Object.entries(d)) {
    for (const [k, raw] of Object.entries(values)) {
      const s = raw.trim();
      if (!s) continue;
      const n = Number(s);
      if (!Number.isFinite(n)) isNumeric = false;
      (value[g] ??= {})[k] = Number.isFinite(n) ? n : s;
    }
  }
  return { value, isNumeric };
}

function asGroups(rules: object, lifecycle: object): Record<string, Record<string, number>> {
  return { ...(rules as Record<string, Record<string, number>>), lifecycle: lifecycle as Record<string, number> };
}

export function RuleSettingsEditor({ view }: { view: RuleSettingsView }) {
  const router = useRouter();
  const [draft, setDraft] = useState<Draft>(() => toDraft(view.override));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<{ tone: "good" | "bad"; text: string } | null>(null);
  const [preview, setPreview] = useState<RulePreview | null>(null);
  const [isPending, startTransition] = useTransition();
  const [busy, setBusy] = useState<"preview" | "save" | null>(null);

  const inherited = useMemo(() => asGroups(view.inherited.rules, view.inherited.lifecycle), [view]);
  const defaults = useMemo(() => asGroups(view.defaults.rules, view.defaults.lifecycle), [view]);

  function validate() {
    const { value } = fromDraft(draft);
    const parsed = parseRuleOverride(value);
    if (!parsed.ok) {
      setErrors(Object.fromEntries(parsed.issues.map((i) => [i.path, i.message])));
      setMessage({ tone: "bad", text: "Some values are not valid; see the marked boxes." });
      return null;
    }
    setErrors({});
    return parsed.value;
  }

  function run(kind: "preview" | "save") {
    const value = validate();
    if (!value) return;
    setBusy(kind);
    setMessage(null);
    startTransition(async () => {
      if (kind === "preview") {
        const r = await previewRuleSettingsAction(view.scope, value);
        if (r.ok) setPreview(r.data);
        else setMessage({ tone: "bad", text: r.message });
      } else {
        const r = await saveRuleSettingsAction(view.scope, value);
        if (r.ok) {
          setMessage({ tone: "good", text: "Saved. New settings apply from the next diagnosis; re-run it to apply them to past data." });
          router.refresh();
        } else {
          setErrors(Object.fromEntries(r.issues.map((i) => [i.path, i.message])));
          setMessage({ tone: "bad", text: r.message });
        }
      }
      setBusy(null);
    });
  }

  const setValue = (g: string, k: string, v: string) => setDraft((d) => ({ ...d, [g]: { ...(d[g] ?? {}), [k]: v } }));

  return (
    <form className="space-y-4" onSubmit={(e) => { e.preventDefault(); run("save"); }} noValidate>
      <div className="flex flex-wrap items-center gap-3 rounded border border-line bg-paper-raised p-3">
        <p className="text-sm"><strong>{view.label}</strong>{view.updatedAt ? <span className="text-ink-soft"> · last saved {new Date(view.updatedAt).toLocaleString()}{view.updatedBy ? ` by ${view.updatedBy}` : ""}</span> : <span className="text-ink-soft"> · nothing set at this level yet</span>}</p>
        <div className="ml-auto flex gap-2">
          <button type="button" className="rounded border border-line px-3 py-1.5 text-sm hover:bg-paper-sunk disabled:opacity-50" disabled={isPending} onClick={() => run("preview")}>
            {busy === "preview" ? "Running the rules…" : "Preview against the last 30 days"}
          </button>
          <button type="button" className="rounded border border-line px-3 py-1.5 text-sm hover:bg-paper-sunk disabled:opacity-50" disabled={isPending} onClick={() => { setDraft({}); setErrors({}); }}>
            Clear this level
          </button>
          <button type="submit" className="rounded bg-copper px-3 py-1.5 text-sm font-medium text-paper disabled:opacity-50" disabled={isPending}>
            {busy === "save" ? "Saving…" : "Save"}
          </button>
        </div>
      </div>
      {message && <p role="status" className={`text-sm ${message.tone === "good" ? "text-good" : "text-bad"}`}>{message.text}</p>}
      {preview && <RulePreviewTable preview={preview} />}
      <div className="grid gap-4 lg:grid-cols-2">
        {Object.entries(RULE_SETTINGS_HELP).map(([group, help]) => (
          <fieldset key={group} className="rounded border border-line bg-paper-raised p-3" data-testid={`group-${group}`}>
            <legend className="px-1 text-sm font-semibold">{help.title}</legend>
            <p className="mb-2 text-xs text-ink-soft">{help.text}</p>
            <div className="space-y-2">
              {Object.entries(help.settings).map(([key, s]) => {
                const path = `${group}.${key}`;
                const id = `rs-${group}-${key}`;
                const def = defaults[group]?.[key];
                const inh = inherited[group]?.[key];
                return (
                  <div key={key} className="grid grid-cols-[1fr_8rem] items-start gap-2">
                    <div>
                      <label htmlFor={id} className="text-sm">{s.label} <span className="text-xs text-ink-faint">({s.unit})</span></label>
                      <p className="text-xs text-ink-soft">{s.text} Default {String(def)}{inh !== def ? `; inherited ${String(inh)}` : ""}.</p>
                    </div>
                    <div>
                      <input
                        id={id}
                        name={path}
                        inputMode="decimal"
                        className="field-input text-right"
                        placeholder={String(inh ?? "")}
                        value={draft[group]?.[key] ?? ""}
                        onChange={(e) => setValue(group, key, e.target.value)}
                        aria-invalid={errors[path] ? true : undefined}
                        aria-describedby={errors[path] ? `${id}-err` : undefined}
                      />
                      {errors[path] && <p id={`${id}-err`} className="field-error">{errors[path]}</p>}
                    </div>
                  </div>
                );
              })}
            </div>
          </fieldset>
        ))}
      </div>
    </form>
  );
}
