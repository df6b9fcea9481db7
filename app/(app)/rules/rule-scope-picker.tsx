"use client";
// Choose the level whose settings are shown: the organization, a field or a well.
import { useRouter } from "next/navigation";
import type { RuleScope } from "@/lib/services/diagnose/rule-scope";
import { toScopeParam } from "./scope-param";

export function RuleScopePicker({ current, fields, wells }: { current: RuleScope; fields: { id: number; name: string }[]; wells: { id: number; name: string; fieldId: number }[] }) {
  const router = useRouter();
  return (
    <label className="block min-w-64">
      <span className="field-label">Settings for</span>
      <select
        className="field-input"
        value={toScopeParam(current)}
        onChange={(e) => router.push(`/rules?scope=${encodeURIComponent(e.target.value)}`)}
        data-testid="rule-scope"
      >
        <option value="org">Whole organization</option>
        {fields.map((f) => (
          <optgroup key={f.id} label={f.name}>
            <option value={`field:${f.id}`}>Field: {f.name}</option>
            {wells.filter((w) => w.fieldId === f.id).map((w) => (
              <option key={w.id} value={`well:${w.id}`}>Well: {w.name}</option>
            ))}
          </optgroup>
        ))}
      </select>
    </label>
  );
}
