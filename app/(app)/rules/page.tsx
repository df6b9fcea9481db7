// Rule settings (engineers and admins): choose a level (organization, a field or a
// well), read and change each rule's numbers against their defaults, preview the
// change over the last 30 days of data, save, and re-run the diagnosis.
import { requirePageActor } from "@/lib/auth/session";
import { getRuleSettings } from "@/lib/services/diagnose/get-rule-settings";
import { listFieldTree } from "@/lib/services/wells/list-field-tree";
import { listWells } from "@/lib/services/wells/list-wells";
import { CautionNote } from "@/components/caution-note";
import { DiagnoseRerun } from "@/components/diagnose-rerun";
import { QueryProvider } from "@/components/query-provider";
import { RuleScopePicker } from "./rule-scope-picker";
import { RuleSettingsEditor } from "./rule-settings-editor";
import { parseScopeParam } from "./scope-param";

export const metadata = { title: "Rule settings" };

export default async function RulesPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const actor = await requirePageActor("rules.edit");
  const params = await searchParams;
  const scope = parseScopeParam(typeof params.scope === "string" ? params.scope : undefined);
  const [view, fields, wells] = await Promise.all([getRuleSettings(actor, scope), listFieldTree(actor), listWells(actor, {})]);
  const wellOptions = wells.map((w) => ({ id: w.id, name: w.name, fieldId: w.fieldId }));
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-xl font-semibold">Rule settings</h1>
          <p className="text-sm text-ink-soft">
            Each level overrides the one above it, number by number: organization, then field, then well. Empty boxes inherit.
          </p>
        </div>
        <RuleScopePicker current={scope} fields={fields.map((f) => ({ id: f.id, name: f.name }))} wells={wellOptions} />
      </div>
      <CautionNote compact />
      <QueryProvider>
        <section className="rounded border border-line bg-paper-raised p-4" aria-labelledby="rerun-title">
          <h2 id="rerun-title" className="mb-2 text-sm font-semibold">Re-run diagnostics</h2>
          <DiagnoseRerun fields={fields.map((f) => ({ id: f.id, name: f.name }))} wells={wellOptions} initial={scope} />
        </section>
      </QueryProvider>
      <RuleSettingsEditor key={JSON.stringify(view.scope)} view={view} />
    </div>
  );
}
