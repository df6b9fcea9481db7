"use client";
// The list's filters, kept in the URL so a view can be shared or saved.
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { RULE_KEYS } from "@/lib/diagnostics/types";
import { ISSUE_STATUSES, RULE_LABEL, STATUS_LABEL } from "@/lib/validations/issues";
import { issueQueryString } from "@/components/issue-table";

interface FieldNode { id: number; name: string; pads: { id: number; name: string }[] }

export function IssueFilters({ fields, people }: { fields: FieldNode[]; people: { id: number; name: string }[] }) {
  const sp = useSearchParams();
  const router = useRouter();
  const pathname = usePathname();
  const set = (key: string, value: string) => {
    const next = new URLSearchParams(sp.toString());
    if (value) next.set(key, value);
    else next.delete(key);
    next.delete("page");
    if (key === "field") next.delete("pad");
    router.replace(`${pathname}?${issueQueryString(next)}`, { scroll: false });
  };
  const fieldId = sp.get("field") ?? "";
  const pads = fields.filter((f) => !fieldId || String(f.id) === fieldId).flatMap((f) => f.pads);
  const isFiltered = ["field", "pad", "rule", "status", "assignee", "since"].some((k) => sp.get(k));
  return (
    <div role="search" aria-label="Filter issues" className="flex flex-wrap items-end gap-3 rounded border border-line bg-paper-raised p-3">
      <div>
        <label htmlFor="f-field" className="field-label">Field</label>
        <select id="f-field" className="field-input" value={fieldId} onChange={(e) => set("field", e.target.value)}>
          <option value="">All fields</option>
          {fields.map((f) => <option key={f.id} value={f.id}>{f.name}</option>)}
        </select>
      </div>
      <div>
        <label htmlFor="f-pad" className="field-label">Pad</label>
        <select id="f-pad" className="field-input" value={sp.get("pad") ?? ""} onChange={(e) => set("pad", e.target.value)}>
          <option value="">All pads</option>
          {pads.map((p) => <option key={p.id} value={p.id}>{p.name}</option>)}
        </select>
      </div>
      <div>
        <label htmlFor="f-rule" className="field-label">Issue type</label>
        <select id="f-rule" className="field-input" value={sp.get("rule") ?? ""} onChange={(e) => set("rule", e.target.value)}>
          <option value="">All types</option>
          {RULE_KEYS.map((r) => <option key={r} value={r}>{RULE_LABEL[r]}</option>)}
        </select>
      </div>
      <div>
        <label htmlFor="f-status" className="field-label">Status</label>
        <select id="f-status" className="field-input" value={sp.get("status") ?? ""} onChange={(e) => set("status", e.target.value)}>
          <option value="">Open (new, acknowledged, assigned, recurred)</option>
          <option value="all">Any status</option>
          {ISSUE_STATUSES.map((s) => <option key={s} value={s}>{STATUS_LABEL[s]}</option>)}
        </select>
      </div>
      <div>
        <label htmlFor="f-assignee" className="field-label">Assignee</label>
        <select id="f-assignee" className="field-input" value={sp.get("assignee") ?? ""} onChange={(e) => set("assignee", e.target.value)}>
          <option value="">Anyone</option>
          <option value="none">Nobody yet</option>
          {people.map((p) => <option key={p.id} value={p.id}>{p.name}</option>)}
        </select>
      </div>
      <div>
        <label htmlFor="f-since" className="field-label">Started on or after</label>
        <input id="f-since" type="date" className="field-input" value={sp.get("since") ?? ""} onChange={(e) => set("since", e.target.value)} />
      </div>
      {isFiltered && (
        <button type="button" className="py-1.5 text-sm text-copper-dark underline" onClick={() => router.replace(pathname)}>Clear filters</button>
      )}
    </div>
  );
}
